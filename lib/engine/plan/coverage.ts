// Coverage per planting and month, and demand per bed and month, summed from the plan's sorted
// feedings. A stage of computePlan of its own (see feedings.ts).
import type { Material } from "@/lib/engine/core/types";
import type { PlantingRefs } from "@/lib/engine/plan/feedings";
import type { GardenInputs } from "@/lib/engine/plan/inputs";
import type { BedDemand, PlannedFeeding, PlantingCoverage } from "@/lib/engine/plan/results";
import type { MonthSpan } from "@/lib/engine/core/dates";

const MATERIAL_COUNT = 3;

/** castings 0, leachate 1, tea 2: a coverage slot's material and a bed's sum column. */
function materialIndex(material: Material): number {
  return material === "castings" ? 0 : material === "leachate" ? 1 : 2;
}

export function coverageAndBeds(
  inputs: GardenInputs,
  planSpans: readonly MonthSpan[],
  feedings: readonly PlannedFeeding[],
  days: Int32Array,
  plantingOf: Int32Array,
  refs: PlantingRefs,
): { coverage: PlantingCoverage[]; beds: BedDemand[] } {
  // Coverage per planting and month; demand per bed and month. The feedings are sorted by day, so a
  // month index walks forward with them; slots are numbered (planting, month, material) and
  // (bed, month) instead of string keys, sums are kept in typed arrays, and each row object is
  // made once at the end. Coverage keeps the order each slot was first seen.
  const monthCount = planSpans.length;
  const covOfSlot = new Int32Array(inputs.plantings.length * monthCount * MATERIAL_COUNT).fill(-1);
  const bedOfPlanting = new Int32Array(inputs.plantings.length).fill(-1);
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
    const p = plantingOf[k]!;
    const material = materialIndex(f.material);
    const slotKey = (p * monthCount + mi) * MATERIAL_COUNT + material;
    let c = covOfSlot[slotKey]!;
    if (c < 0) {
      c = covFirst.length;
      covOfSlot[slotKey] = c;
      covFirst.push(k);
      covMonth.push(mi);
    }
    covNeed[c]! += f.need;
    covGot[c]! += f.allocated;
    // The bed's slot, looked up by id once per planting (beds in the order first seen).
    let b = bedOfPlanting[p]!;
    if (b < 0) {
      let known = bedIndex.get(f.bedId);
      if (known === undefined) {
        known = bedSums.length;
        bedIndex.set(f.bedId, known);
        bedSums.push(new Float64Array(monthCount * BED_FIELDS).fill(NaN));
      }
      b = bedOfPlanting[p] = known;
    }
    const sums = bedSums[b]!;
    const at = mi * BED_FIELDS;
    if (Number.isNaN(sums[at]!)) sums.fill(0, at, at + BED_FIELDS);
    sums[at + material]! += f.amount;
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
  bedIndex.forEach((b, bedId) => {
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
  });

  return { coverage, beds: bedDemand };
}
