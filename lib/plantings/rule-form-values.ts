import type { FeedingRuleInput } from "@/lib/engine";
import { fromSi, type UnitName, type UnitSystem } from "@/lib/units";
import { WEEKDAYS, type RecurrenceForm, type Weekday } from "./recurrence";

// A stored rule (SI, lib/engine FeedingRuleInput) back into the rule editor's
// fields in the garden's units, so "Change feeding" opens on the rule in use,
// and the Balance's rate-cut link (?planting=…&cut=…) opens it with the amount
// already reduced (not saved).

export interface RuleFormValues {
  material: FeedingRuleInput["material"];
  method: FeedingRuleInput["method"];
  basis: FeedingRuleInput["basis"];
  amount: number | { value: number; unit: UnitName; per?: UnitName };
  recurrence: string;
  dilutionWaterParts?: number;
  teaCastingsPerWater?: number;
}

/** Two decimals: finer than a grower measures a cup or a gram. */
const round2 = (v: number) => Math.round(v * 100) / 100;

export function ruleFormValues(
  rule: FeedingRuleInput,
  system: UnitSystem,
  /** Percent to take off the amount, 0–100 (the Balance's rate cut). */
  cutPercent = 0,
): RuleFormValues {
  const us = system === "us";
  const factor = 1 - cutPercent / 100;
  const si = rule.amount * factor;
  let amount: RuleFormValues["amount"];
  if (rule.measure === "percent-of-mix") amount = round2(si);
  else if (rule.basis === "per-plant") {
    const unit: UnitName = rule.measure === "mass" ? (us ? "oz" : "g") : us ? "cup" : "mL";
    amount = { value: round2(fromSi(si, unit)), unit };
  } else if (rule.basis === "per-area" && rule.measure === "volume") {
    // Castings by volume per area read as a depth: 1 L over 1 m² is 1 mm.
    const unit: UnitName = us ? "in" : "cm";
    amount = { value: round2(fromSi(si / 1000, unit)), unit };
  } else {
    const unit: UnitName = rule.measure === "mass" ? (us ? "oz" : "g") : us ? "cup" : "mL";
    const per: UnitName = rule.basis === "per-area" ? (us ? "ft2" : "m2") : us ? "gal" : "L";
    // SI amount is per m² or per L: per one `per` unit it is si × (size of that unit in SI).
    amount = { value: round2(fromSi(si / fromSi(1, per), unit)), unit, per };
  }
  return {
    material: rule.material,
    method: rule.method,
    basis: rule.basis,
    amount,
    recurrence: rule.recurrence,
    ...(rule.dilutionWaterParts === null ? {} : { dilutionWaterParts: rule.dilutionWaterParts }),
    ...(rule.teaCastingsPerWater === null ? {} : { teaCastingsPerWater: rule.teaCastingsPerWater }),
  };
}

/** The simple recurrence form for a rule it can show; null → the raw RRULE field. */
export function recurrenceForm(rrule: string): RecurrenceForm | null {
  const parts = new Map(
    rrule
      .toUpperCase()
      .split(";")
      .map((p) => p.split("=") as [string, string]),
  );
  const known = new Set(["FREQ", "INTERVAL", "BYDAY", "BYMONTHDAY", "BYMONTH", "UNTIL"]);
  if ([...parts.keys()].some((k) => !known.has(k))) return null;
  const freq = parts.get("FREQ");
  if (freq !== "WEEKLY" && freq !== "MONTHLY") return null;
  const every = Number(parts.get("INTERVAL") ?? 1);
  const byDay = parts.get("BYDAY");
  const monthDay = parts.get("BYMONTHDAY");
  if (!Number.isInteger(every) || every < 1 || every > 12) return null;
  if (byDay && (freq !== "WEEKLY" || !WEEKDAYS.includes(byDay as Weekday))) return null;
  if (monthDay && (freq !== "MONTHLY" || !/^([1-9]|[12]\d|3[01])$/.test(monthDay))) return null;
  const until = parts.get("UNTIL");
  if (until && !/^\d{8}$/.test(until)) return null;
  const months = parts.get("BYMONTH")?.split(",").map(Number);
  if (months?.some((m) => !Number.isInteger(m) || m < 1 || m > 12)) return null;
  return {
    every,
    unit: freq === "WEEKLY" ? "weeks" : "months",
    weekday: (byDay as Weekday | undefined) ?? null,
    monthDay: monthDay ? Number(monthDay) : null,
    until: until ? `${until.slice(0, 4)}-${until.slice(4, 6)}-${until.slice(6)}` : null,
    months: months ?? null,
  };
}

/** ?planting={id}&cut={percent} from the Balance: the planting to open and the cut, or null (bad or unknown params are ignored). */
export function rateCutFromSearch(
  search: Record<string, string | string[] | undefined>,
  plantingIds: string[],
): { plantingId: string; cutPercent: number } | null {
  const planting = search.planting;
  const cut = search.cut;
  if (typeof planting !== "string" || typeof cut !== "string") return null;
  if (!plantingIds.includes(planting)) return null;
  if (!/^\d{1,2}(\.\d+)?$/.test(cut.trim())) return null;
  const cutPercent = Number(cut);
  if (!(cutPercent > 0 && cutPercent < 100)) return null;
  return { plantingId: planting, cutPercent };
}
