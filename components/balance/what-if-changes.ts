import type { WhatIfChange } from "@/lib/balance/types";
import { defaultRuleFor, type GapSuggestion } from "@/lib/engine";
import type { GardenNames } from "@/components/balance/garden-names";
import { amountEntryFor, type RuleShape } from "@/lib/balance/rule-amount-units";
import { roundForDisplay } from "@/lib/format-quantity";
import type { UnitSystem } from "@/lib/units";

// Turning the grower's "try this" into the what-if API's changes, and back into words.

export type TryChange = WhatIfChange;

/** The what-if changes that reproduce a gap suggestion, or null when it has none (buying castings). */
export function changesForSuggestion(s: GapSuggestion, names: GardenNames): TryChange[] | null {
  const like = s.explanation.inputs.like;
  const likeBinId = like && "ref" in like ? like.id : names.bins[0]?.id;
  switch (s.kind) {
    case "extra-trays":
      return likeBinId && s.harvestDates?.length
        ? [{ kind: "extra-trays", binId: likeBinId, harvestDates: s.harvestDates }]
        : null;
    case "second-bin":
      return likeBinId && s.startDate
        ? [{ kind: "add-bin", likeBinId, startDate: s.startDate }]
        : null;
    case "rate-cut":
      return s.cutPct && s.plantingIds
        ? s.plantingIds.flatMap((id) => {
            const amount = currentAmount(id, names);
            return amount === null
              ? []
              : [
                  {
                    kind: "planting-amount" as const,
                    plantingId: id,
                    amount: (amount * (100 - s.cutPct!)) / 100,
                  },
                ];
          })
        : null;
    default:
      return null;
  }
}

/** Today's amount per feeding of a planting in its rule's measure (SI), its own rule or its class default. */
export function currentAmount(plantingId: string, names: GardenNames): number | null {
  return currentRule(plantingId, names)?.amount ?? null;
}

/** The rule a planting is fed by today (its own, or its feeder class default, which measures volume). */
export function currentRule(
  plantingId: string,
  names: GardenNames,
): (RuleShape & { amount: number }) | null {
  const p = names.plantings.find((x) => x.id === plantingId);
  if (!p) return null;
  if (p.rule) return p.rule;
  const d = defaultRuleFor(p.feederClass);
  return { material: d.material, measure: "volume", basis: d.basis, amount: d.amount };
}

/** A change in words for the list of what is being tried. */
export function describeChange(c: TryChange, names: GardenNames, system: UnitSystem): string {
  const bin = (id: string) => names.bins.find((b) => b.id === id)?.name ?? "a bin";
  const change = c;
  switch (change.kind) {
    case "bin-trays":
      return `${bin(change.binId)}: ${change.trays} trays in the stack`;
    case "bin-rotation":
      return `${bin(change.binId)}: a tray every ${change.rotationIntervalDays} days`;
    case "bin-start":
      return `${bin(change.binId)}: started on ${change.startDate}`;
    case "planting-amount": {
      const rule = currentRule(change.plantingId, names);
      const label = names.plantings.find((p) => p.id === change.plantingId)?.label ?? "a planting";
      if (!rule) return `${label}: a new amount`;
      const entry = amountEntryFor(rule, system);
      const shown = (si: number) => `${roundForDisplay(entry.fromSi(si))} ${entry.label}`;
      return `${label}: ${shown(change.amount)} (today ${shown(rule.amount)})`;
    }
    case "add-bin":
      return `A second bin like ${bin(change.likeBinId)}, started ${change.startDate}`;
    case "extra-trays":
      return `${change.harvestDates.length} extra ${change.harvestDates.length === 1 ? "tray" : "trays"} processed in ${bin(change.binId)}`;
  }
}
