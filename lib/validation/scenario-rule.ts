import { z } from "zod";
import { EngineInputError } from "@/lib/engine";
import { parseRecurrence } from "@/lib/engine";
import {
  basisSchema,
  materialSchema,
  methodSchema,
  recurrenceSchema,
} from "@/lib/validation/engine-inputs";
import { isUnitName, quantityOf, unitNames } from "@/lib/units";

// A planting's feeding rule in a scenario file: the engine's rule, with the
// amount given in the grower's units and the RRULE checked by the same parser
// the engine expands it with.

/** Rule amount: per plant a volume (or castings mass); per area a depth, or a volume (castings: or mass) `per` area; per container volume a volume (castings: or mass) `per` volume; percent of mix a plain number. */
const ruleAmountSchema = z.union([
  z.number().finite().nonnegative().max(100),
  z
    .object({
      value: z.number().finite().nonnegative().max(10_000),
      unit: z.string(),
      per: z.string().optional(),
    })
    .strict(),
]);

export const ruleSchema = z
  .object({
    material: materialSchema,
    method: methodSchema,
    basis: basisSchema,
    amount: ruleAmountSchema,
    recurrence: recurrenceSchema,
    dilutionWaterParts: z.number().finite().nonnegative().max(1000).optional(),
    /** Tea: this rule's recipe, volume of castings per volume of water; absent = the garden's. */
    teaCastingsPerWater: z.number().finite().positive().max(2).optional(),
  })
  .strict()
  .superRefine((rule, ctx) => {
    try {
      parseRecurrence(rule.recurrence, "recurrence");
    } catch (e) {
      const message =
        e instanceof EngineInputError ? e.message.replace(/^recurrence: /, "") : String(e);
      ctx.addIssue({ code: "custom", path: ["recurrence"], message });
    }
    checkRuleAmount(rule, ctx);
  });

function checkRuleAmount(rule: z.infer<typeof ruleSchema>, ctx: z.RefinementCtx): void {
  const issue = (message: string, path: (string | number)[] = ["amount"]) =>
    ctx.addIssue({ code: "custom", path, message });
  const a = rule.amount;
  if (rule.basis === "percent-of-mix") {
    if (typeof a !== "number") issue("for percent-of-mix give a plain percentage 0–100");
    if (rule.material !== "castings") issue("percent-of-mix applies to castings only", ["basis"]);
    return;
  }
  if (typeof a === "number") return; // SI as the engine takes it (L per plant, L per m², L per L)
  const castings = rule.material === "castings";
  const kinds: Record<string, string[]> = {
    "per-plant": castings ? ["volume", "mass"] : ["volume"],
    "per-area": castings ? ["length", "volume", "mass"] : ["length", "volume"],
    "per-container-volume": castings ? ["volume", "mass"] : ["volume"],
  };
  if (!isUnitName(a.unit)) {
    return issue(`unknown unit ${JSON.stringify(a.unit)}; use one of ${unitNames.join(", ")}`, [
      "amount",
      "unit",
    ]);
  }
  const kind = quantityOf(a.unit);
  if (!kinds[rule.basis]?.includes(kind)) {
    return issue(`a ${kind} unit does not fit basis ${rule.basis}`, ["amount", "unit"]);
  }
  // A depth (per-area) and anything per plant stand alone; the rest are "per" an area or volume.
  const needsPer =
    rule.basis === "per-container-volume" || (rule.basis === "per-area" && kind !== "length");
  if (needsPer) {
    const want = rule.basis === "per-area" ? "area" : "volume";
    if (!isUnitName(a.per) || quantityOf(a.per) !== want) {
      issue(`needs "per": a ${want} unit (e.g. ${want === "area" ? "ft2" : "gal"})`, [
        "amount",
        "per",
      ]);
    }
  } else if (a.per !== undefined) {
    issue(`"per" has no meaning here`, ["amount", "per"]);
  }
  if (rule.basis === "per-area" && kind === "length" && rule.material !== "castings")
    issue("a depth applies to castings only", ["amount", "unit"]);
}
