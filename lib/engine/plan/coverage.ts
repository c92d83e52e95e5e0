// Coverage per planting and month, and demand per bed and month, summed from the plan's sorted
// feedings. A stage of computePlan of its own (see feedings.ts).
import type { Material } from "@/lib/engine/core/types";
import type { PlantingRefs } from "@/lib/engine/plan/feedings";
import type { GardenInputs } from "@/lib/engine/plan/inputs";
import type { BedDemand, PlannedFeeding, PlantingCoverage } from "@/lib/engine/plan/results";
import type { MonthSpan } from "@/lib/engine/core/dates";

export function coverageAndBeds(
  inputs: GardenInputs,
  planSpans: readonly MonthSpan[],
  feedings: readonly PlannedFeeding[],
  days: Int32Array,
  refs: PlantingRefs,
): { coverage: PlantingCoverage[]; beds: BedDemand[] } {
  // Coverage per planting and month; demand per bed and month. The feedings are sorted by day, so a
  // month index walks forward with them; slots are numbered (planting, month, material) and
  // (bed, month) instead of string keys, sums are kept in typed arrays, and each row object is
  // made once at the end. Coverage keeps the order each slot was first seen.
  const MATERIALS: Material[] = ["castings", "leachate", "tea"];
  const monthCount = planSpans.length;
  const plantingIndex = new Map(inputs.plantings.map((p, i) => [p.id, i]));
  const covOfSlot = new Int32Array(inputs.plantings.length * monthCount * MATERIALS.length).fill(
    -1,
  );
  const covFirst: number[] = []; // index in feedings of each coverage row's first feeding
  const covMonth: number[] = [];
  const covNeed = new Float64Array(feedings.length);
  const covGot = new Float64Array(feedings.length);
  const bedIndex = new Map<string, number>();
  const bedSums: Float64Array[] = []; // per bed: (castings, leachate, tea, need, got) × month
  const BED_FIELDS = 5;
  let mi = 0;
  for (let k = 0; k < feedings.length; k++) {
    const f = feedings[k]!;
    const day = days[k]!;
    while (day >= planSpans[mi]!.endDay) mi++;
    const slotKey =
      (plantingIndex.get(f.plantingId)! * monthCount + mi) * MATERIALS.length +
      MATERIALS.indexOf(f.material);
    let c = covOfSlot[slotKey]!;
    if (c < 0) {
      c = covFirst.length;
      covOfSlot[slotKey] = c;
      covFirst.push(k);
      covMonth.push(mi);
    }
    covNeed[c]! += f.need;
    covGot[c]! += f.allocated;
    let b = bedIndex.get(f.bedId);
    if (b === undefined) {
      b = bedSums.length;
      bedIndex.set(f.bedId, b);
      bedSums.push(new Float64Array(monthCount * BED_FIELDS).fill(NaN));
    }
    const sums = bedSums[b]!;
    const at = mi * BED_FIELDS;
    if (Number.isNaN(sums[at]!)) sums.fill(0, at, at + BED_FIELDS);
    sums[at + MATERIALS.indexOf(f.material)]! += f.amount;
    sums[at + 3]! += f.need;
    sums[at + 4]! += f.allocated;
  }
  const coverage: PlantingCoverage[] = new Array<PlantingCoverage>(covFirst.length);
  for (let c = 0; c < covFirst.length; c++) {
    const f = feedings[covFirst[c]!]!;
    const need = covNeed[c]!;
    const allocated = covGot[c]!;
    const pct = need > 0 ? (100 * allocated) / need : 100;
    const unit = f.material === "leachate" ? "L" : "kg";
    coverage[c] = {
      plantingId: f.plantingId,
      month: planSpans[covMonth[c]!]!.month,
      material: f.material,
      need,
      allocated,
      coveragePct: pct,
      explanation: {
        kind: "coverage",
        inputs: {
          planting: refs.of(f.plantingId),
          need: { unit, value: need },
          allocated: { unit, value: allocated },
          coverage: { unit: "percent", value: pct },
        },
      },
    };
  }
  // Months of a bed in month order (NaN marks a month with no feeding of the bed).
  const bedDemand: BedDemand[] = [];
  for (const [bedId, b] of bedIndex) {
    const sums = bedSums[b]!;
    const months: BedDemand["months"] = [];
    for (let m = 0; m < monthCount; m++) {
      const at = m * BED_FIELDS;
      if (Number.isNaN(sums[at]!)) continue;
      const need = sums[at + 3]!;
      months.push({
        month: planSpans[m]!.month,
        castingsKg: sums[at]!,
        leachateL: sums[at + 1]!,
        teaL: sums[at + 2]!,
        coveragePct: need > 0 ? (100 * sums[at + 4]!) / need : 100,
      });
    }
    bedDemand.push({ bedId, months });
  }

  return { coverage, beds: bedDemand };
}
