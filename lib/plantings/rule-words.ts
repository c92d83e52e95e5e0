import type { FeedingRuleInput } from "@/lib/engine";
import { formatAmount } from "@/lib/format-quantity";
import { displayUnits, toSi, unitLabel, type UnitSystem } from "@/lib/units";
import { describeRrule } from "./recurrence";

// A feeding rule in the words a grower would say it: "1 cup castings per plant,
// top-dressed, every month". Amounts only through lib/format-quantity.ts.

const METHOD_WORDS: Record<FeedingRuleInput["method"], string> = {
  "top-dress": "top-dressed",
  "side-dress": "side-dressed",
  "soil-mix": "mixed into the soil",
  drench: "as a soil drench",
};

const MATERIAL_WORDS: Record<FeedingRuleInput["material"], string> = {
  castings: "castings",
  leachate: "diluted leachate",
  tea: "worm tea",
};

export function describeAmount(rule: FeedingRuleInput, system: UnitSystem): string {
  const material = MATERIAL_WORDS[rule.material];
  const kind =
    rule.measure === "mass"
      ? "castings-mass"
      : rule.material === "castings"
        ? "castings-volume"
        : "liquid";
  switch (rule.basis) {
    case "per-plant":
      return `${formatAmount(rule.amount, kind, system)} ${material} per plant`;
    case "per-area": {
      // 1 L over 1 m² is a 1 mm layer: castings by volume per area read as a depth.
      if (rule.measure === "volume" && rule.material === "castings")
        return `${material} ${formatAmount(rule.amount / 1000, "depth", system)} deep`;
      const area = displayUnits(system).area;
      return `${formatAmount(rule.amount * toSi(1, area), kind, system)} ${material} per ${unitLabel(area)}`;
    }
    case "per-container-volume": {
      const vol = toSi(1, system === "us" ? "gal" : "L");
      return `${formatAmount(rule.amount * vol, kind, system)} ${material} per ${system === "us" ? "gallon" : "litre"} of pot`;
    }
    case "percent-of-mix":
      return `${rule.amount} % ${material} in the potting mix`;
  }
}

/** The whole rule in one line. */
export function describeRule(rule: FeedingRuleInput, system: UnitSystem): string {
  let when: string;
  try {
    when = describeRrule(rule.recurrence);
  } catch {
    when = `on the rule ${rule.recurrence}`;
  }
  return `${describeAmount(rule, system)}, ${METHOD_WORDS[rule.method]}, ${when}`;
}
