// The engine explains every figure as { kind, inputs, parts } with SI values.
// This turns one explanation into plain sentences in the garden's units, so a
// grower can see where a number came from. Pure: no React, no I/O.
import type { ExplainValue, Explanation } from "@/lib/engine";
import { formatDay } from "@/lib/format";
import {
  formatAmount,
  formatDensity,
  formatTagged,
  roundForDisplay,
  type SiTag,
} from "@/lib/format-quantity";
import { displayUnits, fromSi, toSi, unitLabel, type UnitSystem } from "@/lib/units";

export interface ExplainContext {
  system: UnitSystem;
  /** The name of a bin, bed, planting or lot; fall back to a neutral word when unknown. */
  nameOf?: (ref: "bin" | "bed" | "planting" | "lot", id: string) => string | undefined;
}

/** One explanation as sentences, its parts (sub-steps) as nested lists. */
export interface ExplainedText {
  sentences: string[];
  parts: ExplainedText[];
}

const refWords = { bin: "a bin", bed: "a bed", planting: "a planting", lot: "a lot" } as const;

/** One input in words, e.g. "44 lb", "Aug 14, 2026", "Bin A". */
export function explainValue(value: ExplainValue | undefined, ctx: ExplainContext): string {
  if (!value) return "—";
  if ("unit" in value) return formatTagged(value.value, value.unit as SiTag, ctx.system);
  if ("date" in value)
    return formatDay(value.date, { month: "short", day: "numeric", year: "numeric" });
  if ("ref" in value) return ctx.nameOf?.(value.ref, value.id) ?? refWords[value.ref];
  if ("text" in value)
    return /^\d{4}-\d{2}$/.test(value.text)
      ? formatDay(`${value.text}-01`, { month: "long", year: "numeric" })
      : value.text;
  return unitDefaults[value.default]?.(ctx.system) ?? value.source;
}

/**
 * Engine defaults whose wording carries a unit: said in the garden's units here,
 * since the engine's own source text is in US units (e.g. "1 ft² per lb food per week").
 */
const unitDefaults: Partial<Record<string, (system: UnitSystem) => string>> = {
  surfaceFt2PerLbFoodPerWeek: (system) => {
    const { area, castingsMass: mass } = displayUnits(system);
    const m2PerKg = toSi(1, "ft2") / toSi(1, "lb"); // 1 ft² per lb (NIST HB 44 factors)
    const shown = roundForDisplay(fromSi(m2PerKg * toSi(1, mass), area));
    return `${shown} ${unitLabel(area)} of tray surface per ${unitLabel(mass)} of food a week`;
  },
};

function num(value: ExplainValue | undefined): number {
  return value && "unit" in value ? value.value : NaN;
}

type Sentences = (v: (key: string) => string, e: Explanation, ctx: ExplainContext) => string[];

const poolMonth: Sentences = (v, e) => {
  const castings = v("pool") === "castings";
  const what = castings ? "Castings" : "Leachate";
  const made = castings ? "harvested" : "collected or drained";
  const lost = castings ? "past its shelf life" : "older than it keeps";
  const short = num(e.inputs.shortfall) > 0;
  return [
    `${what}: ${v("opening")} on the shelf at the start, plus ${v("supplied")} ${made}, minus ${v("allocated")} fed and ${v("agedOut")} ${lost}, leaves ${v("closing")} at the end.`,
    short
      ? `The plantings wanted ${v("demand")}; ${v("shortfall")} of that could not be served.`
      : `The plantings wanted ${v("demand")}, and all of it was served.`,
  ];
};

const templates: Partial<Record<Explanation["kind"], Sentences>> = {
  "pool-month": poolMonth,
  "castings-forecast": (v, e, ctx) => [
    `Each harvest from ${v("bin")} is one tray of ${formatAmount(num(e.inputs.trayVolume), "tray-volume", ctx.system)}, ${formatTagged(num(e.inputs.fillFraction) * 100, "percent", ctx.system)} full, at ${formatDensity(num(e.inputs.bulkDensity), ctx.system)}.`,
    num(e.inputs.calibrationHarvests) > 0
      ? `Scaled by ${v("calibrationFactor")} from ${v("calibrationHarvests")} logged harvests: ${v("perHarvest")} a harvest.`
      : `No logged harvests to calibrate against yet: ${v("perHarvest")} a harvest.`,
  ],
  "harvest-logged": (v) => [`${v("bin")}: a harvest of ${v("castings")} was logged.`],
  "harvest-forecast": (v, e) => [
    e.inputs.amount
      ? `${v("bin")}: the bottom tray is due for harvest, about ${v("amount")}.`
      : `${v("bin")}: add a tray on top.`,
  ],
  "harvest-due-not-logged": (v) => [
    `${v("bin")}: the tray due on ${v("due")} has not been logged as harvested.`,
    `It is counted at the forecast ${v("castings")} from ${v("countedOn")} until you log the harvest.`,
  ],
  "leachate-rate": (v) => [
    `${v("bin")} collects about ${v("rate")} (${v("from")}, from ${v("drainsUsed")} logged drains).`,
  ],
  "leachate-collected": (v) => [`${v("bin")}: drain the base, about ${v("amount")}.`],
  "drain-logged": (v) => [`${v("bin")}: a drain of ${v("liquid")} was logged.`],
  "liquid-aged-out": (v) => [
    `${v("amount")} of leachate was older than ${v("maxAge")} in ${v("month")} and is counted as discarded.`,
  ],
  "castings-aged-out": (v) => [
    `${v("amount")} of castings from ${v("lot")} passed its ${v("shelfLife")} shelf life on ${v("on")} and is counted as aged out.`,
  ],
  "lot-opening": (v) => [`A lot of ${v("amount")} made on ${v("madeOn")}.`],
  "application-logged": (v) => [
    `${v("planting")}: ${v("applied")} was logged as applied, drawing ${v("drawn")} from stock.`,
  ],
  "demand-amount": (v, e) => [
    `${v("planting")}: ${v("amount")} a feeding (${basisWords(v("basis"))}, ${v("plants")} ${num(e.inputs.plants) === 1 ? "plant" : "plants"}).`,
  ],
  "tea-brewed": (v, e, ctx) => [
    `${v("tea")} of tea brewed at ${formatTagged(num(e.inputs.castingsPerWater) * 100, "percent", ctx.system)} castings to water takes ${v("castings")} of castings from the shelf.`,
  ],
  coverage: (v) => [
    `${v("planting")}: wanted ${v("need")}, got ${v("allocated")} (${v("coverage")}).`,
  ],
  "pre-harvest-block": (v) => [
    `${v("planting")}: ${v("feedings")} feedings from ${v("first")} on would need stock from a bin fed manure, and none of its clean stock was left, so ${v("manureStockRefused")} was held back.`,
    `Rule: ${v("rule")}.`,
  ],
  "pre-harvest-clean-lots": (v) => [
    `${v("planting")} is inside its pre-harvest interval, so only stock from bins without manure may be used: wanted ${v("need")}, got ${v("fromCleanLots")} of clean stock; ${v("manureStockRefused")} of manure-fed stock was held back.`,
  ],
  "capacity-intake": (v, e) => [
    `${v("bin")}: in ${v("month")} the plan needs the worms to eat ${v("foodNeeded")}, more than the ${v("limit")} that ${v("worms")} worms can eat (${v("months")} ${num(e.inputs.months) === 1 ? "month" : "months"} over).`,
  ],
  "capacity-surface": (v) => [
    `${v("bin")}: in ${v("month")} the plan needs ${v("foodNeeded")} of food, more than the tray surface handles (${v("limit")}; ${v("rule")}).`,
  ],
  surplus: (v) => [
    `${v("agedOut")} aged out and ${v("leftAtEnd")} is left at the end: castings the plan does not use, at ${v("price")}.`,
  ],
  "output-value": (v) => [`${v("harvested")} harvested in these months, at ${v("price")}.`],
  "gap-extra-trays": (v) => [
    `Process ${v("trays")} more ${v("trays") === "1" ? "tray" : "trays"} like those in ${v("like")} (${v("perTray")} each), the first started by ${v("firstStartBy")}.`,
  ],
  "gap-second-bin": (v) => [`Start a second bin like ${v("like")} by ${v("startBy")}.`],
  "gap-rate-cut": (v) => [
    `Feed the ${v("plantings")} lower-priority plantings ${v("cut")} less; the top priority keeps its full amount.`,
  ],
  "gap-start-bin": (v) => [
    `Start a bin of ${v("trays")} trays with ${v("worms")} worms on ${v("startOn")}; its first harvest comes ${v("firstHarvest")}.`,
    `Short after that: ${v("stillShort")}.`,
  ],
  "gap-buy-castings": (v) => [
    `Buy ${v("castings")} of castings by ${v("by")}, at ${v("price")}: ${v("cost")}.`,
  ],
  "gap-unavailable": (v) => [`Not possible: ${v("why")}.`],
  "mix-above-limit": (v) => [
    `${v("planting")}: the potting mix would hold more castings than ${v("limit")} (${v("note")}).`,
  ],
};

function basisWords(basis: string): string {
  const words: Record<string, string> = {
    "per-plant": "per plant",
    "per-area": "by bed area",
    "per-container-volume": "by container size",
    "percent-of-mix": "share of the potting mix",
  };
  return words[basis] ?? basis;
}

/** Any explanation as plain sentences in the garden's units, parts nested. */
export function explain(e: Explanation, ctx: ExplainContext): ExplainedText {
  const v = (key: string) => explainValue(e.inputs[key], ctx);
  const template = templates[e.kind];
  const sentences = template
    ? template(v, e, ctx)
    : Object.keys(e.inputs).map((key) => `${labelOf(key)}: ${v(key)}.`);
  return { sentences, parts: (e.parts ?? []).map((p) => explain(p, ctx)) };
}

/** "manureStockRefused" → "Manure stock refused". */
function labelOf(key: string): string {
  const words = key.replace(/([A-Z])/g, " $1").toLowerCase();
  return words.charAt(0).toUpperCase() + words.slice(1);
}
