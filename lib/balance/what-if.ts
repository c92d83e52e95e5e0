import type { WhatIfChange, WhatIfMonthDiff } from "@/lib/balance/types";
import type { FeedingRuleInput, GardenInputs, GardenPlan, PlantingInput } from "@/lib/engine";
import { defaultRuleFor } from "@/lib/engine";
import { amountLimit } from "@/lib/balance/rule-amount-units";
import { AppError, type FieldErrors } from "@/lib/errors";

// Applies what-if changes to a COPY of a garden's inputs (the caller's object is
// never touched, so a cached plan's inputs stay as they were) and diffs two plans.

/**
 * The rules a planting is fed by, its feeder-class default when it has none.
 * A "planting-amount" change is in the first rule's measure; every other rule
 * of the planting is scaled by the same factor (a rate cut cuts each rule).
 */
function rulesOf(p: PlantingInput): FeedingRuleInput[] {
  if (p.rules.length) return p.rules;
  const d = defaultRuleFor(p.feederClass);
  return [
    {
      material: d.material,
      method: d.method,
      basis: d.basis,
      measure: "volume",
      amount: d.amount,
      recurrence: d.recurrence,
      dilutionWaterParts: null,
      teaCastingsPerWater: null,
    },
  ];
}

/**
 * inputs with the changes applied; unknown ids and amounts beyond reason → 400 naming each field.
 * `perHarvestKg` (from today's plan) sizes extra trays like their bin's own harvests.
 */
export function applyWhatIf(
  inputs: GardenInputs,
  changes: WhatIfChange[],
  perHarvestKg: ReadonlyMap<string, number> = new Map(),
): GardenInputs {
  const next: GardenInputs = structuredClone(inputs);
  const fields: FieldErrors = {};
  changes.forEach((change, i) => {
    const at = `changes.${i}`;
    if (change.kind === "planting-amount") {
      const planting = next.plantings.find((p) => p.id === change.plantingId);
      if (!planting) {
        fields[`${at}.plantingId`] = "no such planting in this garden";
        return;
      }
      const rules = rulesOf(planting);
      const rule = rules[0]!;
      const limit = amountLimit(rule);
      if (limit && change.amount > limit.max) {
        fields[`${at}.amount`] = `must be at most ${limit.max} ${limit.unit} for this planting`;
        return;
      }
      const factor = rule.amount > 0 ? change.amount / rule.amount : 1;
      planting.rules = rules.map((r, k) =>
        k === 0 ? { ...r, amount: change.amount } : { ...r, amount: r.amount * factor },
      );
      return;
    }
    const binId = change.kind === "add-bin" ? change.likeBinId : change.binId;
    const bin = next.bins.find((b) => b.id === binId);
    if (!bin) {
      fields[`${at}.${change.kind === "add-bin" ? "likeBinId" : "binId"}`] =
        "no such bin in this garden";
      return;
    }
    switch (change.kind) {
      case "bin-trays":
        bin.trays = change.trays;
        break;
      case "bin-rotation":
        bin.rotationIntervalDays = change.rotationIntervalDays;
        break;
      case "bin-start":
        bin.startDate = change.startDate;
        break;
      case "extra-trays": {
        const amount = perHarvestKg.get(bin.id);
        if (!amount) {
          fields[`${at}.binId`] = "this bin has no forecast harvest to copy";
          return;
        }
        // Each extra tray is stock on its harvest day, like a logged harvest would be.
        change.harvestDates.forEach((madeOn, j) =>
          next.stockLots.push({
            id: `what-if-tray-${i + 1}-${j + 1}`,
            binId: bin.id,
            material: "castings",
            madeOn,
            amount,
            manureFeedstock: null,
          }),
        );
        break;
      }
      case "add-bin":
        next.bins.push({
          ...structuredClone(bin),
          id: `what-if-bin-${i + 1}`,
          name: change.name ?? `${bin.name} (what-if)`,
          startDate: change.startDate,
          trays: change.trays ?? bin.trays,
          startingWorms: change.startingWorms ?? bin.startingWorms,
          retiredOn: null,
        });
        break;
    }
  });
  if (Object.keys(fields).length)
    throw new AppError(
      "validation:what_if",
      `Please check: ${Object.keys(fields).join(", ")}.`,
      fields,
    );
  return next;
}

/** changed − current per month and pool, for the months both plans cover. */
export function diffPlans(current: GardenPlan, changed: GardenPlan): WhatIfMonthDiff[] {
  const before = new Map(current.rows.map((r) => [`${r.month}:${r.pool}`, r]));
  return changed.rows.flatMap((r) => {
    const c = before.get(`${r.month}:${r.pool}`);
    if (!c) return [];
    return [
      {
        month: r.month,
        pool: r.pool,
        supplied: r.supplied - c.supplied,
        allocated: r.allocated - c.allocated,
        closing: r.closing - c.closing,
        shortfall: r.shortfall - c.shortfall,
      },
    ];
  });
}
