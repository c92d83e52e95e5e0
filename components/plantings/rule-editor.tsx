"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import type { FieldValues, UseFormReturn } from "react-hook-form";
import { FormMessage } from "@/components/forms/form-message";
import { useApiForm } from "@/components/forms/use-api-form";
import { Button } from "@/components/ui";
import { apiFetch } from "@/lib/api-client";
import type { RuleFormValues } from "@/lib/plantings/rule-form-values";
import { queryKeys } from "@/lib/query-keys";
import type { UnitSystem } from "@/lib/units";
import { feedingRuleSchema } from "@/lib/validation/feeding-rule";
import type { ruleSchema } from "@/lib/validation/scenario-rule";
import { newRuleValues, RuleFields, withAmountPer } from "./rule-fields";

/**
 * Override a crop's feeding rule (one rule): material, method, basis, amount,
 * and a recurrence built or typed. Opens on `initial` (the rule in use); a
 * recurrence the simple form cannot show opens as RRULE.
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
  /** The crop the rule belongs to: PATCHed with { rule }. */
  saveUrl: string;
  /** First day the preview's next dates count from. */
  plantedOn: string;
  today: string;
  unitSystem: UnitSystem;
  initial?: RuleFormValues;
  /** Why the form opened with these values, shown above it. */
  note?: string;
  onDone: () => void;
}) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const { form, formError, submit } = useApiForm(
    // The preprocess step (upper-casing the RRULE) hides the object shape from the form types.
    feedingRuleSchema as unknown as typeof ruleSchema,
    initial ?? newRuleValues(unitSystem),
  );

  const onSubmit = submit(async (values) => {
    await apiFetch(saveUrl, { method: "PATCH", body: { rule: withAmountPer(values, unitSystem) } });
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
      <RuleFields
        form={form as unknown as UseFormReturn<FieldValues>}
        prefix=""
        unitSystem={unitSystem}
        plantedOn={plantedOn}
        today={today}
      />
      <div className="flex flex-wrap gap-2">
        <Button type="submit" pending={form.formState.isSubmitting}>
          Save rule
        </Button>
        <Button variant="secondary" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
