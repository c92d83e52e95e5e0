import "server-only";
import { getGardenBalance } from "@/db/queries/garden-plan";
import { EngineInputError } from "@/lib/engine";

// A bed's next 12 months of demand per planting, with coverage: read from the
// garden's cached Balance, so the bed page and the Balance always agree.

export interface BedDemandMonth {
  month: string;
  /** As applied: kg castings, L of diluted leachate and tea. */
  castingsKg: number;
  liquidL: number;
  /** allocated ÷ need over the month's feedings, 0–100; null when nothing is due. */
  coveragePct: number | null;
}

export interface BedDemandView {
  months: string[];
  byPlanting: Record<string, BedDemandMonth[]>;
  /** The engine's reason when it could not plan (bad stored rule, say). */
  problem: string | null;
}

export async function getBedDemand({
  gardenId,
  bedId,
}: {
  gardenId: string;
  bedId: string;
}): Promise<BedDemandView> {
  let plan;
  try {
    // The default range: 12 months from this month in the garden's time zone.
    plan = (await getGardenBalance({ gardenId, months: 12 })).body.plan;
  } catch (e) {
    if (e instanceof EngineInputError) return { months: [], byPlanting: {}, problem: e.message };
    throw e;
  }
  const { months, feedings } = plan;
  const acc = new Map<string, { castingsKg: number; liquidL: number; need: number; got: number }>();
  for (const f of feedings) {
    if (f.bedId !== bedId) continue;
    const key = `${f.plantingId}|${f.date.slice(0, 7)}`;
    const a = acc.get(key) ?? { castingsKg: 0, liquidL: 0, need: 0, got: 0 };
    if (f.material === "castings") a.castingsKg += f.amount;
    else a.liquidL += f.amount;
    a.need += f.need;
    a.got += f.allocated;
    acc.set(key, a);
  }
  const byPlanting: Record<string, BedDemandMonth[]> = {};
  for (const key of acc.keys()) {
    const [plantingId] = key.split("|") as [string];
    byPlanting[plantingId] ??= months.map((month) => ({
      month,
      castingsKg: 0,
      liquidL: 0,
      coveragePct: null,
    }));
  }
  for (const [key, a] of acc) {
    const [plantingId, month] = key.split("|") as [string, string];
    const row = byPlanting[plantingId]!.find((r) => r.month === month);
    if (!row) continue;
    row.castingsKg = a.castingsKg;
    row.liquidL = a.liquidL;
    row.coveragePct = a.need > 0 ? (100 * a.got) / a.need : 100;
  }
  return { months, byPlanting, problem: null };
}
