import type { BedInput, PlantingInput } from "@/lib/engine/demand/types";
import { dflt } from "@/lib/engine/core/defaults";
import { EngineInputError, requireNonNegative, requirePositive } from "@/lib/engine/core/errors";
import type { FeedingRule } from "@/lib/engine/demand/feeding-rules";
import { fmt, plural } from "@/lib/engine/core/format";
import type { Explanation } from "@/lib/engine/core/types";

/**
 * Amount of one application in SI (castings kg, leachate L undiluted, tea L),
 * with the arithmetic in words. The same for every date of a planting, so the
 * caller computes it once and shares the explanation object.
 */
export interface RuleAmount {
  amount: number;
  explanation: Explanation;
  warnings: string[];
}

const MATERIALS: readonly string[] = ["castings", "leachate", "tea"];
const METHODS: readonly string[] = ["top-dress", "side-dress", "soil-mix", "drench"];

/** The explanation of an amount nobody asked to explain (ruleAmount with `explain` false). */
const NOT_EXPLAINED: Explanation = Object.freeze({ text: "" });
const NO_WARNINGS: string[] = Object.freeze([]) as unknown as string[];

/**
 * `explain` false skips the words (a plan builds its own explanations of amounts); field names
 * are built only for an input that fails, since a plan asks this for every rule of every planting.
 */
export function ruleAmount(
  rule: FeedingRule,
  planting: PlantingInput,
  bed: BedInput,
  density: number,
  field: string,
  explain = true,
): RuleAmount {
  if (!MATERIALS.includes(rule.material)) {
    throw new EngineInputError(`${field}.rule.material`, `must be castings, leachate or tea`);
  }
  if (!METHODS.includes(rule.method)) {
    throw new EngineInputError(
      `${field}.rule.method`,
      `must be top-dress, side-dress, soil-mix or drench`,
    );
  }
  const per = requireNonNegative(
    rule.amount,
    field,
    rule.basis === "percent-of-mix" ? 100 : 1000,
    ".rule.amount",
  );
  const unit =
    rule.amountUnit ??
    (rule.material === "castings" && rule.basis !== "percent-of-mix" ? "L" : "L");
  if (unit !== "L" && unit !== "kg")
    throw new EngineInputError(`${field}.rule.amountUnit`, `must be "L" or "kg"`);
  if (unit === "kg" && rule.material !== "castings") {
    throw new EngineInputError(
      `${field}.rule.amountUnit`,
      "only castings can be measured in kg; liquids are litres",
    );
  }
  let warnings: string[] | undefined;
  let base: number;
  // What the amount is made of, in words only when the text is read (a plan expands thousands of
  // rules and reads none of these texts): data here, words in howText.
  let how: HowWords;
  switch (rule.basis) {
    case "per-plant": {
      const n = requirePositive(planting.plantCount, field, 100_000, ".plantCount");
      base = per * n;
      how = { basis: "per-plant", count: n, per, unit };
      break;
    }
    case "per-area": {
      const area = planting.areaM2 ?? bed.areaM2;
      const a = requirePositive(area, field, 10_000, ".areaM2");
      base = per * a;
      how = { basis: "per-area", count: a, per, unit };
      if (rule.material === "castings" && unit === "L" && per > 12.7 + 1e-9) {
        (warnings ??= []).push(`top-dressing ${fmt(per, 1)} mm deep is more than ½ in (12.7 mm)`);
      }
      break;
    }
    case "per-container-volume":
    case "percent-of-mix": {
      const v = requirePositive(
        planting.containerVolumeL ?? bed.containerVolumeL,
        field,
        2000,
        ".containerVolumeL",
      );
      if (rule.basis === "percent-of-mix") {
        if (rule.material !== "castings") {
          throw new EngineInputError(
            `${field}.rule.basis`,
            "percent-of-mix applies to castings only",
          );
        }
        base = (per / 100) * v;
        how = { basis: "percent-of-mix", count: v, per, unit };
        if (per > dflt("pottingMixWarnAbovePercent")) {
          (warnings ??= []).push(
            `${fmt(per, 1)} % castings is above the 20 % by volume Atiyeh et al. (2000) recommend`,
          );
        }
      } else {
        base = per * v;
        how = { basis: "per-container-volume", count: v, per, unit };
      }
      break;
    }
    default:
      throw new EngineInputError(`${field}.rule.basis`, `unknown basis "${String(rule.basis)}"`);
  }

  if (rule.material === "castings") {
    const kg = unit === "kg" ? base : base * density;
    if (!explain)
      return { amount: kg, explanation: NOT_EXPLAINED, warnings: warnings ?? NO_WARNINGS };
    return {
      amount: kg,
      explanation: lazyText(
        () =>
          unit === "kg"
            ? `${howText(how)} = ${fmt(kg, 3)} kg castings`
            : `${howText(how)} × ${fmt(density, 2)} kg/L = ${fmt(kg, 3)} kg castings`,
        { amountPer: per, bulkDensityKgPerL: density },
      ),
      warnings: warnings ?? [],
    };
  }
  if (rule.material === "leachate") {
    const parts = requireNonNegative(
      rule.dilutionWaterParts ?? dflt("leachateDilutionWaterParts"),
      field,
      1000,
      ".rule.dilutionWaterParts",
    );
    const undiluted = base / (1 + parts);
    if (!explain)
      return { amount: undiluted, explanation: NOT_EXPLAINED, warnings: warnings ?? NO_WARNINGS };
    return {
      amount: undiluted,
      explanation: lazyText(
        () =>
          parts > 0
            ? `${howText(how)} of solution ÷ ${1 + parts} (1 part leachate to ${parts} water) = ${fmt(undiluted, 3)} L leachate`
            : `${howText(how)} = ${fmt(undiluted, 3)} L leachate, undiluted`,
        { solutionL: base, waterParts: parts },
      ),
      warnings: warnings ?? [],
    };
  }
  if (!explain)
    return { amount: base, explanation: NOT_EXPLAINED, warnings: warnings ?? NO_WARNINGS };
  return {
    amount: base,
    explanation: lazyText(() => `${howText(how)} = ${fmt(base, 3)} L tea`),
    warnings: warnings ?? [],
  };
}

interface HowWords {
  basis: FeedingRule["basis"];
  /** Plants, m², or litres of container or mix. */
  count: number;
  per: number;
  unit: string;
}

function howText({ basis, count, per, unit }: HowWords): string {
  switch (basis) {
    case "per-plant":
      return `${plural(count, "plant")} × ${fmt(per, 3)} ${unit}`;
    case "per-area":
      return `${fmt(count, 2)} m² × ${fmt(per, 3)} ${unit}/m²`;
    case "percent-of-mix":
      return `${fmt(per, 1)} % of ${fmt(count, 1)} L mix`;
    default:
      return `${fmt(count, 1)} L container × ${fmt(per, 3)} ${unit}/L`;
  }
}

/** An explanation whose `text` is built on first read (an enumerable getter, so JSON keeps it). */
function lazyText(build: () => string, inputs?: Explanation["inputs"]): Explanation {
  let text: string | undefined;
  if (inputs === undefined)
    return {
      get text() {
        return (text ??= build());
      },
    };
  return {
    get text() {
      return (text ??= build());
    },
    inputs,
  };
}
