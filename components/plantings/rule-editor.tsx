"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { FormMessage } from "@/components/forms/form-message";
import { useApiForm } from "@/components/forms/use-api-form";
import { Button, Field, Input, Select } from "@/components/ui";
import { apiFetch } from "@/lib/api-client";
import { buildRrule, WEEKDAYS, type RecurrenceForm } from "@/lib/plantings/recurrence";
import { recurrenceForm, type RuleFormValues } from "@/lib/plantings/rule-form-values";
import { queryKeys } from "@/lib/query-keys";
import type { UnitSystem } from "@/lib/units";
import { feedingRuleSchema } from "@/lib/validation/feeding-rule";
import type { ruleSchema } from "@/lib/validation/scenario-rule";
import { RecurrencePreview } from "./recurrence-preview";

const AMOUNT_UNITS: Record<
  string,
  { us: string[]; metric: string[]; per?: { us: string; metric: string } }
> = {
  "per-plant": { us: ["cup", "fl-oz", "oz", "lb"], metric: ["mL", "L", "g", "kg"] },
  "per-area": { us: ["in"], metric: ["cm", "mm"] },
  "per-container-volume": { us: ["cup"], metric: ["mL"], per: { us: "gal", metric: "L" } },
};

/**
 * Override a planting's feeding rule: material, method, basis, amount, and a
 * recurrence built or typed. Opens on `initial` (the rule in use, or the
 * Balance's rate cut of it); a recurrence the simple form cannot show opens as RRULE.
 */
export function RuleEditor({
  gardenId,
  saveUrl,
  plantedOn,
  today,
  unitSystem,
  initial,
  note,
  onDone,
}: {
  gardenId: string;
  /** The planting or crop the rule belongs to: PATCHed with { rule }. */
  saveUrl: string;
  /** First day the preview's next dates count from. */
  plantedOn: string;
  today: string;
  unitSystem: UnitSystem;
  initial?: RuleFormValues;
  /** Why the form opened with these values (the rate cut), shown above it. */
  note?: string;
  onDone: () => void;
}) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const simple = initial ? recurrenceForm(initial.recurrence) : null;
  const [raw, setRaw] = useState(Boolean(initial && !simple));
  const [rec, setRec] = useState<RecurrenceForm>(
    simple ?? { every: 1, unit: "months", monthDay: null, weekday: null },
  );
  const us = unitSystem === "us";
  const { form, formError, submit } = useApiForm(
    // The preprocess step (upper-casing the RRULE) hides the object shape from the form types.
    feedingRuleSchema as unknown as typeof ruleSchema,
    initial ?? {
      material: "castings",
      method: "top-dress",
      basis: "per-plant",
      amount: { value: 1, unit: us ? "cup" : "mL" },
      recurrence: buildRrule(rec),
    },
  );
  const { register, formState, watch, setValue } = form;
  const basis = watch("basis") as string;
  const units = AMOUNT_UNITS[basis] ?? AMOUNT_UNITS["per-plant"]!;
  const errors = formState.errors as Record<
    string,
    { message?: string } & Record<string, { message?: string }>
  >;

  function changeRec(next: Partial<RecurrenceForm>) {
    const merged = { ...rec, ...next };
    setRec(merged);
    setValue("recurrence", buildRrule(merged), { shouldValidate: true });
  }

  const onSubmit = submit(async (values) => {
    const v = values as { amount: { per?: string } };
    if (units.per) v.amount.per = us ? units.per.us : units.per.metric;
    else delete v.amount.per;
    await apiFetch(saveUrl, {
      method: "PATCH",
      body: { rule: values },
    });
    await queryClient.invalidateQueries({ queryKey: queryKeys.plan(gardenId) });
    router.refresh();
    onDone();
  });

  return (
    <form
      onSubmit={onSubmit}
      noValidate
      className="flex flex-col gap-4 rounded-card border border-loam-300 bg-loam-50 p-3"
      aria-label="Change feeding rule"
    >
      <FormMessage message={formError} />
      {note ? <p className="font-semibold text-soil-900">{note}</p> : null}
      <div className="grid gap-3 sm:grid-cols-3">
        <Field label="Material" error={errors.material?.message}>
          <Select {...register("material")}>
            <option value="castings">Castings</option>
            <option value="tea">Worm tea</option>
            <option value="leachate">Diluted leachate</option>
          </Select>
        </Field>
        <Field label="Method" error={errors.method?.message}>
          <Select {...register("method")}>
            <option value="top-dress">Top-dress</option>
            <option value="side-dress">Side-dress</option>
            <option value="soil-mix">Mix into soil</option>
            <option value="drench">Soil drench</option>
          </Select>
        </Field>
        <Field label="Amount is" error={errors.basis?.message}>
          <Select {...register("basis")}>
            <option value="per-plant">Per plant</option>
            <option value="per-area">A layer over the bed</option>
            <option value="per-container-volume">Per {us ? "gallon" : "litre"} of pot</option>
          </Select>
        </Field>
      </div>
      <Field
        label="Amount"
        error={
          errors.amount?.message ?? errors.amount?.value?.message ?? errors.amount?.unit?.message
        }
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
              {...register("amount.value", { valueAsNumber: true })}
            />
            <Select
              aria-label="Amount: unit"
              className="w-28 shrink-0"
              {...register("amount.unit")}
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
      <fieldset className="flex flex-col gap-3">
        <legend className="font-semibold text-soil-900">How often</legend>
        {raw ? (
          <Field
            label="RRULE (RFC 5545)"
            hint="e.g. FREQ=WEEKLY;INTERVAL=2;BYDAY=SA — lower case is fine"
            error={errors.recurrence?.message}
          >
            <Input autoComplete="off" spellCheck={false} {...register("recurrence")} />
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
          rule={(watch("recurrence") as string) ?? ""}
          anchor={plantedOn}
          today={today}
        />
      </fieldset>
      <div className="flex flex-wrap gap-2">
        <Button type="submit" pending={formState.isSubmitting}>
          Save rule
        </Button>
        <Button variant="secondary" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
