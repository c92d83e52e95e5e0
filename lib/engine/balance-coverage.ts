// Coverage per planting per month per material, summed from occurrences.
import { explainCoverage } from "@/lib/engine/balance-explain";
import type { OccurrenceResult, PlantingCoverage } from "@/lib/engine/balance-types";

export function summariseCoverage(occurrences: readonly OccurrenceResult[]): PlantingCoverage[] {
  const groups = new Map<
    string,
    { row: Omit<PlantingCoverage, "explanation" | "coveragePct">; count: number }
  >();
  for (const o of occurrences) {
    const month = o.date.slice(0, 7);
    const key = `${o.plantingId}\u0000${month}\u0000${o.material}`;
    let g = groups.get(key);
    if (!g) {
      g = {
        row: { plantingId: o.plantingId, month, material: o.material, need: 0, allocated: 0 },
        count: 0,
      };
      groups.set(key, g);
    }
    g.row.need += o.need;
    g.row.allocated += o.allocated;
    g.count++;
  }
  const out: PlantingCoverage[] = [];
  for (const { row, count } of groups.values()) {
    const pct = row.need > 0 ? Math.min(100, (100 * row.allocated) / row.need) : 100;
    out.push({
      ...row,
      coveragePct: pct,
      explanation: explainCoverage(
        row.material === "leachate" ? "L" : "kg",
        count,
        row.need,
        row.allocated,
        pct,
        row.material === "tea",
      ),
    });
  }
  return out;
}
