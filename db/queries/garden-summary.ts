import "server-only";
import { and, count, eq, isNull } from "drizzle-orm";
import { getDb } from "@/db";
import { beds, bins, memberships, plantings } from "@/db/schema";

/** Counts for the garden overview, in one round of small queries. */
export async function getGardenSummary({ gardenId }: { gardenId: string }) {
  const db = await getDb();
  const [bedRows, binRows, plantingRows, memberRows] = await Promise.all([
    db
      .select({ kind: beds.kind, n: count() })
      .from(beds)
      .where(eq(beds.gardenId, gardenId))
      .groupBy(beds.kind),
    db
      .select({ n: count() })
      .from(bins)
      .where(and(eq(bins.gardenId, gardenId), isNull(bins.retiredOn))),
    db
      .select({ n: count() })
      .from(plantings)
      .where(and(eq(plantings.gardenId, gardenId), isNull(plantings.endedOn))),
    db.select({ n: count() }).from(memberships).where(eq(memberships.gardenId, gardenId)),
  ]);
  return {
    beds: bedRows.find((r) => r.kind === "bed")?.n ?? 0,
    containers: bedRows.find((r) => r.kind === "container")?.n ?? 0,
    bins: binRows[0]?.n ?? 0,
    activePlantings: plantingRows[0]?.n ?? 0,
    members: memberRows[0]?.n ?? 0,
  };
}
