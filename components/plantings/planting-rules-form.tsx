"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useEffect, useId, useRef, useState } from "react";
import { useFieldArray, type FieldValues, type UseFormReturn } from "react-hook-form";
import { z } from "zod";
import { FormMessage } from "@/components/forms/form-message";
import { useApiForm } from "@/components/forms/use-api-form";
import { Button } from "@/components/ui";
import { apiFetch } from "@/lib/api-client";
import type { RuleFormValues } from "@/lib/plantings/rule-form-values";
import { queryKeys } from "@/lib/query-keys";
import type { UnitSystem } from "@/lib/units";
import { feedingRuleSchema, MAX_RULES } from "@/lib/validation/feeding-rule";
import type { ruleSchema } from "@/lib/validation/scenario-rule";
import { newRuleValues, RuleFields, withAmountPer } from "./rule-fields";

/** A rule as the form opens on it: its fields, and its plain words when they are still true. */
export interface RuleItem {
  words?: string;
  values: RuleFormValues;
}

// The same rule schema the API parses `rules` with; at least one (no rules of its
// own is "Use the crop's feedings", a button of its own).
const rulesFormSchema = z.object({
  rules: z
    .array(feedingRuleSchema as unknown as typeof ruleSchema)
    .min(1, "Add a feeding, or use the crop's feedings.")
    .max(MAX_RULES, `At most ${MAX_RULES} feedings.`),
});

/**
 * All of a planting's feeding rules in one form: each listed in plain words,
 * opened to edit, removed (with undo), or a new one added. Saving PATCHes
 * `rules: [...]`, so one save never drops the others.
 */
export function PlantingRulesForm({
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
  /** The planting: PATCHed with { rules }. */
  saveUrl: string;
  plantedOn: string;
  today: string;
  unitSystem: UnitSystem;
  initial: RuleItem[];
  /** Why the form opened with these values (the rate cut), shown above it. */
  note?: string;
  onDone: () => void;
}) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const { form, formError, submit } = useApiForm(rulesFormSchema, {
    rules: initial.map((r) => r.values),
  });
  const anyForm = form as unknown as UseFormReturn<FieldValues>;
  const { fields, append, remove, insert } = useFieldArray({
    control: anyForm.control,
    name: "rules",
  });
  // Plain words for the rules as saved, by field id. A rule being edited, a new one,
  // or one whose amount the rate cut changed has none: its fields show instead.
  const [wordsById, setWordsById] = useState(
    () => new Map(fields.map((f, i) => [f.id, initial[i]?.words])),
  );
  const [removed, setRemoved] = useState<{ index: number; item: RuleFormValues } | null>(null);
  const errors = form.formState.errors.rules as
    (Record<number, unknown> & { message?: string; root?: { message?: string } }) | undefined;

  // Keyboard users land on the fields they opened (the Edit button is gone then).
  const focusTo = useRef<string | null>(null);
  const domId = useId();
  useEffect(() => {
    if (!focusTo.current) return;
    document.getElementById(focusTo.current)?.querySelector<HTMLElement>("select, input")?.focus();
    focusTo.current = null;
  });

  function removeAt(index: number) {
    const item = form.getValues(`rules.${index}`) as RuleFormValues;
    remove(index);
    setRemoved({ index, item });
  }

  const onSubmit = submit(async (values) => {
    await apiFetch(saveUrl, {
      method: "PATCH",
      body: { rules: values.rules.map((r) => withAmountPer(r, unitSystem)) },
    });
    await queryClient.invalidateQueries({ queryKey: queryKeys.plan(gardenId) });
    router.refresh();
    onDone();
  });

  const listError = errors?.message ?? errors?.root?.message;

  return (
    <form
      onSubmit={onSubmit}
      noValidate
      className="flex min-w-0 flex-col gap-4 rounded-card border border-loam-300 bg-loam-50 p-3"
      aria-label="Change feedings"
    >
      <FormMessage message={formError} />
      {note ? <p className="font-semibold text-soil-900">{note}</p> : null}
      <ol className="flex flex-col gap-3">
        {fields.map((field, index) => {
          const hasError = Boolean(errors?.[index]);
          const words = wordsById.get(field.id);
          const isOpen = hasError || !words;
          const title = `Feeding ${index + 1}`;
          // DOM ids from useId and the position: field ids are random, so the server's differ.
          const headingId = `${domId}-${index}-title`;
          const fieldsId = `${domId}-${index}-fields`;
          return (
            <li
              key={field.id}
              className="flex min-w-0 flex-col gap-3 rounded-card border border-loam-300 bg-white p-3"
              aria-labelledby={headingId}
            >
              <div className="flex flex-wrap items-baseline justify-between gap-2">
                <h4 id={headingId} className="font-semibold">
                  {title}
                </h4>
                <div className="flex flex-wrap gap-2">
                  {!isOpen ? (
                    <Button
                      variant="secondary"
                      size="sm"
                      onClick={() => {
                        // Once opened its saved words may stop being true: the fields show it.
                        setWordsById((was) => new Map(was).set(field.id, undefined));
                        focusTo.current = fieldsId;
                      }}
                    >
                      Edit {title.toLowerCase()}
                    </Button>
                  ) : null}
                  <Button variant="ghost" size="sm" onClick={() => removeAt(index)}>
                    Remove {title.toLowerCase()}
                  </Button>
                </div>
              </div>
              {words && !isOpen ? <p className="text-soil-900">{words}</p> : null}
              {isOpen ? (
                <div
                  id={fieldsId}
                  tabIndex={-1}
                  className="flex min-w-0 flex-col gap-4 outline-none"
                >
                  <RuleFields
                    form={anyForm}
                    prefix={`rules.${index}.`}
                    unitSystem={unitSystem}
                    plantedOn={plantedOn}
                    today={today}
                  />
                </div>
              ) : null}
            </li>
          );
        })}
      </ol>
      {listError ? (
        <p role="alert" className="text-sm font-semibold text-bloom-700">
          {listError}
        </p>
      ) : null}
      {removed ? (
        <p role="status" className="flex flex-wrap items-center gap-2 text-soil-900">
          Feeding removed (not saved yet).
          <Button
            variant="ghost"
            size="sm"
            onClick={() => {
              insert(Math.min(removed.index, fields.length), removed.item);
              setRemoved(null);
            }}
          >
            Undo remove
          </Button>
        </p>
      ) : null}
      <div className="flex flex-wrap gap-2">
        {fields.length < MAX_RULES ? (
          <Button
            variant="secondary"
            onClick={() => {
              append(newRuleValues(unitSystem));
              setRemoved(null);
            }}
          >
            Add a feeding
          </Button>
        ) : null}
        <Button type="submit" pending={form.formState.isSubmitting}>
          Save feedings
        </Button>
        <Button variant="secondary" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
