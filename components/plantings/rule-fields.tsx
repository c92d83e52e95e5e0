"use client";

import { useId, useState } from "react";
import { get, type FieldValues, type UseFormReturn } from "react-hook-form";
import { Button, Field, Input, Select } from "@/components/ui";
import { buildRrule, WEEKDAYS, type RecurrenceForm } from "@/lib/plantings/recurrence";
import { recurrenceForm } from "@/lib/plantings/rule-form-values";
import type { UnitSystem } from "@/lib/units";
import { RecurrencePreview } from "./recurrence-preview";

export const AMOUNT_UNITS: Record<
  string,
  { us: string[]; metric: string[]; per?: { us: string; metric: string } }
> = {
  "per-plant": { us: ["cup", "fl-oz", "oz", "lb"], metric: ["mL", "L", "g", "kg"] },
  "per-area": { us: ["in"], metric: ["cm", "mm"] },
  "per-container-volume": { us: ["cup"], metric: ["mL"], per: { us: "gal", metric: "L" } },
};

/** The `per` unit an amount needs for its basis (per gallon/litre of pot), set before sending. */
export function withAmountPer<R extends { basis: string; amount: unknown }>(
  rule: R,
  unitSystem: UnitSystem,
): R {
  const a = rule.amount;
  if (!a || typeof a !== "object") return rule;
  const { per: _old, ...rest } = a as { per?: string };
  const per = AMOUNT_UNITS[rule.basis]?.per;
  return {
    ...rule,
    amount: per ? { ...rest, per: unitSystem === "us" ? per.us : per.metric } : rest,
  };
}

/** A new feeding's first values: a cup (or 250 mL) of castings per plant, monthly. */
export function newRuleValues(unitSystem: UnitSystem) {
  return {
    material: "castings" as const,
    method: "top-dress" as const,
    basis: "per-plant" as const,
    amount: { value: 1, unit: unitSystem === "us" ? "cup" : "mL" },
    recurrence: "FREQ=MONTHLY",
  };
}

/**
 * One feeding rule's fields — material, method, basis, amount, and a
 * recurrence built or typed — registered under `prefix` ("" for a form that is
 * one rule, "rules.1." for the second of several), so errors land on their inputs.
 */
export function RuleFields({
  form,
  prefix,
  unitSystem,
  plantedOn,
  today,
}: {
  form: UseFormReturn<FieldValues>;
  prefix: string;
  unitSystem: UnitSystem;
  /** First day the preview's next dates count from. */
  plantedOn: string;
  today: string;
}) {
  const { register, formState, watch, setValue, getValues } = form;
  const at = (name: string) => `${prefix}${name}`;
  const initialRrule = (getValues(at("recurrence")) as string | undefined) ?? "";
  const simple = initialRrule ? recurrenceForm(initialRrule) : null;
  const [raw, setRaw] = useState(Boolean(initialRrule && !simple));
  const [rec, setRec] = useState<RecurrenceForm>(
    simple ?? { every: 1, unit: "months", monthDay: null, weekday: null },
  );
  const us = unitSystem === "us";
  const basis = watch(at("basis")) as string;
  const units = AMOUNT_UNITS[basis] ?? AMOUNT_UNITS["per-plant"]!;
  const error = (name: string) =>
    (get(formState.errors, at(name)) as { message?: string } | undefined)?.message;
  const recurrenceErrorId = `${useId()}-recurrence-error`;
  // The simple form's recurrence error belongs to its first control ("Every").
  const recurrenceAria = error("recurrence")
    ? { "aria-invalid": true as const, "aria-describedby": recurrenceErrorId }
    : {};

  function changeRec(next: Partial<RecurrenceForm>) {
    const merged = { ...rec, ...next };
    setRec(merged);
    setValue(at("recurrence"), buildRrule(merged), { shouldValidate: true, shouldDirty: true });
  }

  return (
    <>
      <div className="grid gap-3 sm:grid-cols-3">
        <Field label="Material" error={error("material")}>
          <Select {...register(at("material"))}>
            <option value="castings">Castings</option>
            <option value="tea">Worm tea</option>
            <option value="leachate">Diluted leachate</option>
          </Select>
        </Field>
        <Field label="Method" error={error("method")}>
          <Select {...register(at("method"))}>
            <option value="top-dress">Top-dress</option>
            <option value="side-dress">Side-dress</option>
            <option value="soil-mix">Mix into soil</option>
            <option value="drench">Soil drench</option>
          </Select>
        </Field>
        <Field label="Amount is" error={error("basis")}>
          <Select {...register(at("basis"))}>
            <option value="per-plant">Per plant</option>
            <option value="per-area">A layer over the bed</option>
            <option value="per-container-volume">Per {us ? "gallon" : "litre"} of pot</option>
          </Select>
        </Field>
      </div>
      <Field
        label="Amount"
        error={error("amount") ?? error("amount.value") ?? error("amount.unit")}
      >
        {(control) => (
          <div className="flex gap-2">
            <Input
              {...control}
              type="number"
              step="any"
              min="0"
              inputMode="decimal"
              className="min-w-0 flex-1"
              {...register(at("amount.value"), { valueAsNumber: true })}
            />
            <Select
              aria-label="Amount: unit"
              className="w-28 shrink-0"
              {...register(at("amount.unit"))}
            >
              {(us ? units.us : units.metric).map((u) => (
                <option key={u} value={u}>
                  {u === "fl-oz" ? "fl oz" : u}
                </option>
              ))}
            </Select>
          </div>
        )}
      </Field>
      <fieldset className="flex min-w-0 flex-col gap-3">
        <legend className="font-semibold text-soil-900">How often</legend>
        {raw ? (
          <Field
            label="RRULE (RFC 5545)"
            hint="e.g. FREQ=WEEKLY;INTERVAL=2;BYDAY=SA — lower case is fine"
            error={error("recurrence")}
          >
            <Input autoComplete="off" spellCheck={false} {...register(at("recurrence"))} />
          </Field>
        ) : (
          <div className="flex flex-wrap items-end gap-3">
            <label className="flex flex-col gap-1.5">
              Every
              <Input
                type="number"
                min="1"
                max="12"
                className="w-20"
                {...recurrenceAria}
                value={rec.every}
                onChange={(e) => changeRec({ every: Math.max(1, Number(e.target.value) || 1) })}
              />
            </label>
            <label className="flex flex-col gap-1.5">
              <span className="sr-only">Unit</span>
              <Select
                className="w-32"
                value={rec.unit}
                onChange={(e) => changeRec({ unit: e.target.value as "weeks" | "months" })}
              >
                <option value="weeks">weeks</option>
                <option value="months">months</option>
              </Select>
            </label>
            {rec.unit === "weeks" ? (
              <label className="flex flex-col gap-1.5">
                on
                <Select
                  className="w-36"
                  value={rec.weekday ?? ""}
                  onChange={(e) =>
                    changeRec({ weekday: (e.target.value || null) as RecurrenceForm["weekday"] })
                  }
                >
                  <option value="">planting&apos;s weekday</option>
                  {WEEKDAYS.map((d) => (
                    <option key={d} value={d}>
                      {d}
                    </option>
                  ))}
                </Select>
              </label>
            ) : (
              <label className="flex flex-col gap-1.5">
                on day
                <Input
                  type="number"
                  min="1"
                  max="31"
                  className="w-20"
                  placeholder="—"
                  value={rec.monthDay ?? ""}
                  onChange={(e) =>
                    changeRec({ monthDay: e.target.value ? Number(e.target.value) : null })
                  }
                />
              </label>
            )}
            <label className="flex flex-col gap-1.5">
              until
              <Input
                type="date"
                className="w-44"
                value={rec.until ?? ""}
                onChange={(e) => changeRec({ until: e.target.value || null })}
              />
            </label>
            {error("recurrence") ? (
              <p id={recurrenceErrorId} className="basis-full text-sm font-semibold text-bloom-700">
                {error("recurrence")}
              </p>
            ) : null}
          </div>
        )}
        <p className="text-sm text-soil-700">
          Outdoor beds are fed only in the growing season (last spring frost to first fall frost),
          from the planting date to its end.
        </p>
        <Button variant="ghost" size="sm" className="self-start" onClick={() => setRaw(!raw)}>
          {raw ? "Use the simple form" : "Type an RRULE instead"}
        </Button>
        <RecurrencePreview
          rule={(watch(at("recurrence")) as string) ?? ""}
          anchor={plantedOn}
          today={today}
        />
      </fieldset>
    </>
  );
}
