import "server-only";
import { markGardenInputsChanged } from "@/db/queries/garden-inputs-version";
import { eq } from "drizzle-orm";
import { getDb } from "@/db";
import { gardens, memberships } from "@/db/schema";
import { forgetCheckedSessionsAndRoles } from "@/lib/auth/gate-cache";
import type { CreateGardenInput, UpdateGardenInput } from "@/lib/validation/garden";

const gardenColumns = {
  id: gardens.id,
  name: gardens.name,
  timeZone: gardens.timeZone,
  unitSystem: gardens.unitSystem,
  lastSpringFrost: gardens.lastSpringFrost,
  firstFallFrost: gardens.firstFallFrost,
  location: gardens.location,
  castingsPricePerKg: gardens.castingsPricePerKg,
  currency: gardens.currency,
};

export type GardenDto = {
  id: string;
  name: string;
  timeZone: string;
  unitSystem: "us" | "metric";
  lastSpringFrost: string;
  firstFallFrost: string;
  location: string | null;
  castingsPricePerKg: number | null;
  currency: string;
};

export async function getGardenById({ gardenId }: { gardenId: string }): Promise<GardenDto | null> {
  const db = await getDb();
  const [row] = await db
    .select(gardenColumns)
    .from(gardens)
    .where(eq(gardens.id, gardenId))
    .limit(1);
  return row ?? null;
}

/** The creator becomes the garden's first owner, in the same transaction. */
export async function createGarden({
  input,
  ownerId,
}: {
  input: CreateGardenInput;
  ownerId: string;
}): Promise<GardenDto> {
  const db = await getDb();
  return db.transaction(async (tx) => {
    const [garden] = await tx
      .insert(gardens)
      .values({ ...input, location: input.location ?? null })
      .returning(gardenColumns);
    await tx.insert(memberships).values({ gardenId: garden!.id, userId: ownerId, role: "owner" });
    return garden!;
  });
}

export async function updateGarden({
  gardenId,
  input,
}: {
  gardenId: string;
  input: UpdateGardenInput;
}): Promise<GardenDto | null> {
  const db = await getDb();
  const [row] = await db
    .update(gardens)
    .set({ ...input, updatedAt: new Date() })
    .where(eq(gardens.id, gardenId))
    .returning(gardenColumns);
  markGardenInputsChanged(gardenId); // settings feed the plan (units, zone, frost dates, prices)
  return row ?? null;
}

/** Everything in the garden goes with it (ON DELETE CASCADE on every garden_id). */
export async function deleteGarden({ gardenId }: { gardenId: string }): Promise<void> {
  const db = await getDb();
  await db.delete(gardens).where(eq(gardens.id, gardenId));
  markGardenInputsChanged(gardenId);
  forgetCheckedSessionsAndRoles(); // its memberships went with it
}
