"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { FormMessage } from "@/components/forms/form-message";
import { useApiForm } from "@/components/forms/use-api-form";
import { Alert, Button, Field, Input, Select } from "@/components/ui";
import { apiFetch } from "@/lib/api-client";
import { parseQuickEntry } from "@/lib/plantings/quick-entry";
import { queryKeys } from "@/lib/query-keys";
import { quickPlantingSchema } from "@/lib/validation/planting";

/** "6 tomato, 4 pepper" in one field: one planting per part, all or nothing. */
export function QuickPlantForm({
  gardenId,
  bedId,
  today,
}: {
  gardenId: string;
  bedId: string;
  today: string;
}) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const [warnings, setWarnings] = useState<string[]>([]);
  const { form, formError, submit } = useApiForm(quickPlantingSchema, {
    bedId,
    plantedOn: today,
    quick: "",
    priority: "normal",
    confirmCrowded: false,
  });
  const { register, formState, watch } = form;
  const quickError = formState.errors.quick?.message;
  const crowded = typeof quickError === "string" && quickError.includes("confirm");
  const preview = parseQuickEntry(watch("quick") ?? "");

  const onSubmit = submit(async (values) => {
    const result = await apiFetch<{ warnings: { message: string }[] }>(
      `/api/gardens/${gardenId}/plantings`,
      { body: values },
    );
    setWarnings(result.warnings.map((w) => w.message));
    form.reset({ ...values, quick: "", confirmCrowded: false });
    await queryClient.invalidateQueries({ queryKey: queryKeys.plan(gardenId) });
    await queryClient.invalidateQueries({ queryKey: queryKeys.plantings(gardenId) });
    router.refresh();
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4" aria-label="Add plants">
      <FormMessage message={formError} />
      {warnings.length ? <Alert tone="caution">{warnings.join(" ")}</Alert> : null}
      <input type="hidden" {...register("bedId")} />
      <Field
        label="What did you plant?"
        hint="Counts and crops, separated by commas, e.g. 6 tomato, 4 pepper"
        error={quickError}
        required
      >
        <Input autoComplete="off" placeholder="6 tomato, 4 pepper" {...register("quick")} />
      </Field>
      {preview.parts.length ? (
        <p className="text-sm text-soil-700" aria-live="polite">
          Will add: {preview.parts.map((p) => `${p.count} × ${p.name}`).join(", ")}
        </p>
      ) : null}
      <div className="grid gap-4 sm:grid-cols-2">
        <Field label="Planted on" error={formState.errors.plantedOn?.message}>
          <Input type="date" {...register("plantedOn")} />
        </Field>
        <Field label="Priority when stock is short" error={formState.errors.priority?.message}>
          <Select {...register("priority")}>
            <option value="high">High: fed first, never cut</option>
            <option value="normal">Normal</option>
            <option value="low">Low: cut first</option>
          </Select>
        </Field>
      </div>
      {crowded ? (
        <label className="inline-flex min-h-11 items-center gap-2">
          <input type="checkbox" className="size-5" {...register("confirmCrowded")} />
          Plant them anyway
        </label>
      ) : null}
      <Button type="submit" pending={formState.isSubmitting} className="self-start">
        Add plants
      </Button>
    </form>
  );
}
