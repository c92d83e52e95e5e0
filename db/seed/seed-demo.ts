import { count } from "drizzle-orm";
import type { Db, DbOrTx } from "@/db";
import { insertGardenScenario } from "@/db/queries/garden-scenario";
import { gardens, memberships, users } from "@/db/schema";
import { hashPassword } from "@/lib/auth/password";
import { demoGarden, demoMembers, neighbourGarden } from "./demo-garden";
import { ensureStarterCrops } from "./starter-crops";

/**
 * Loads the demo gardens when the database has no gardens yet, through the same
 * scenario import as any garden file. Runs inside the server process (never a
 * second process on the data directory) and in one transaction, so a crash
 * mid-seed leaves nothing behind and the next start retries.
 */
export async function seedDemoGarden(db: Db): Promise<{ created: boolean }> {
  await ensureStarterCrops(db);
  // Hash outside the transaction: argon2 is slow and the transaction should be short.
  const hashes = await Promise.all(demoMembers.map((m) => hashPassword(m.password)));
  return db.transaction(async (tx) => {
    const [existing] = await tx.select({ n: count() }).from(gardens);
    if ((existing?.n ?? 0) > 0) return { created: false };

    const userIds: Record<string, string> = {};
    for (const [i, member] of demoMembers.entries()) {
      const [user] = await tx
        .insert(users)
        .values({ email: member.email, name: member.name, passwordHash: hashes[i]! })
        .onConflictDoUpdate({ target: users.email, set: { name: member.name } })
        .returning({ id: users.id });
      userIds[member.role] = user!.id;
    }
    const { gardenId } = await insertGardenScenario(tx, {
      scenario: demoGarden.scenario,
      ownerId: userIds.owner!,
      location: demoGarden.location,
    });
    // The importer is the owner; the other demo accounts join in their roles.
    await tx
      .insert(memberships)
      .values(
        demoMembers
          .filter((m) => m.role !== "owner")
          .map((m) => ({ gardenId, userId: userIds[m.role]!, role: m.role })),
      );
    await insertNeighbourGarden(tx, userIds, hashes[0]!);
    return { created: true };
  });
}

async function insertNeighbourGarden(
  tx: DbOrTx,
  userIds: Record<string, string>,
  passwordHash: string,
) {
  const { owner, memberRoles } = neighbourGarden;
  // Not a published demo account: it gets a hash nobody is told the password of.
  const [neighbour] = await tx
    .insert(users)
    .values({ ...owner, passwordHash: `${passwordHash}x` })
    .returning({ id: users.id });
  const { gardenId } = await insertGardenScenario(tx, {
    scenario: neighbourGarden.scenario,
    ownerId: neighbour!.id,
    location: neighbourGarden.location,
  });
  await tx.insert(memberships).values([
    { gardenId, userId: userIds.owner!, role: memberRoles.owner },
    { gardenId, userId: userIds.grower!, role: memberRoles.grower },
  ]);
}
