import "server-only";
import { and, count, eq, gte, isNull, or, sql } from "drizzle-orm";
import { getDb } from "@/db";
import { beds, bins, memberships, plantings } from "@/db/schema";

// "Today" is the database's current_date (UTC on PGlite): a day's difference
// at midnight in the garden's zone only moves a planting between the counts.
const today = sql`current_date`;

/** Counts for the garden overview, in one round of small queries. Archived rows are not counted. */
export async function getGardenSummary({ gardenId }: { gardenId: string }) {
  const db = await getDb();
  const [bedRows, binRows, plantingRows, memberRows] = await Promise.all([
    db
      .select({ kind: beds.kind, n: count() })
      .from(beds)
      .where(and(eq(beds.gardenId, gardenId), isNull(beds.archivedOn)))
      .groupBy(beds.kind),
    db
      .select({ n: count() })
      .from(bins)
      .where(
        and(eq(bins.gardenId, gardenId), or(isNull(bins.retiredOn), gte(bins.retiredOn, today))),
      ),
    db
      .select({ n: count() })
      .from(plantings)
      // Current and planned: not ended before today (ended_on is the planned last day).
      .where(
        and(
          eq(plantings.gardenId, gardenId),
          isNull(plantings.archivedOn),
          or(isNull(plantings.endedOn), gte(plantings.endedOn, today)),
        ),
      ),
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
