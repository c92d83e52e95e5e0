// Coverage per planting per month per material, summed from occurrences.
import { explainCoverage } from "@/lib/engine/balance/explain";
import type { OccurrenceResult, PlantingCoverage } from "@/lib/engine/balance/types";
import type { Material } from "@/lib/engine/core/types";

interface Group {
  plantingId: string;
  month: string;
  material: Material;
  need: number;
  allocated: number;
  count: number;
}

export function summariseCoverage(occurrences: readonly OccurrenceResult[]): PlantingCoverage[] {
  // Nested maps rather than one joined string key: this runs over every application.
  const byPlanting = new Map<string, Map<string, Group>>();
  const groups: Group[] = [];
  for (const o of occurrences) {
    let inner = byPlanting.get(o.plantingId);
    if (!inner) {
      inner = new Map();
      byPlanting.set(o.plantingId, inner);
    }
    const month = o.date.slice(0, 7);
    const key = month + o.material;
    let g = inner.get(key);
    if (!g) {
      g = {
        plantingId: o.plantingId,
        month,
        material: o.material,
        need: 0,
        allocated: 0,
        count: 0,
      };
      inner.set(key, g);
      groups.push(g);
    }
    g.need += o.need;
    g.allocated += o.allocated;
    g.count++;
  }
  return groups.map((g) => {
    const pct = g.need > 0 ? Math.min(100, (100 * g.allocated) / g.need) : 100;
    return {
      plantingId: g.plantingId,
      month: g.month,
      material: g.material,
      need: g.need,
      allocated: g.allocated,
      coveragePct: pct,
      explanation: explainCoverage(
        g.material === "leachate" ? "L" : "kg",
        g.count,
        g.need,
        g.allocated,
        pct,
        g.material === "tea",
      ),
    };
  });
}
