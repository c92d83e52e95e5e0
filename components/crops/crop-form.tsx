"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { FormMessage } from "@/components/forms/form-message";
import { useApiForm } from "@/components/forms/use-api-form";
import { Button, Field, Input, Select } from "@/components/ui";
import { apiFetch } from "@/lib/api-client";
import { queryKeys } from "@/lib/query-keys";
import { createCropSchema } from "@/lib/validation/crop";

/** A garden's own crop: name, feeder class (which default rule it gets), days to harvest, edible part. */
export function CropForm({ gardenId }: { gardenId: string }) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const { form, formError, submit } = useApiForm(createCropSchema, {
    name: "",
    feederClass: "medium",
    edible: true,
    edibleTouchesSoil: false,
    daysToHarvest: null,
  });
  const { register, formState } = form;
  const errors = formState.errors;

  const onSubmit = submit(async (values) => {
    await apiFetch(`/api/gardens/${gardenId}/crops`, { body: values });
    await queryClient.invalidateQueries({ queryKey: queryKeys.crops(gardenId) });
    form.reset();
    router.refresh();
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4" aria-label="Add a crop">
      <FormMessage message={formError} />
      <div className="grid gap-4 sm:grid-cols-3">
        <Field label="Name" error={errors.name?.message} required>
          <Input autoComplete="off" placeholder="Ground cherry" {...register("name")} />
        </Field>
        <Field label="Feeder class" error={errors.feederClass?.message}>
          <Select {...register("feederClass")}>
            <option value="heavy">Heavy</option>
            <option value="medium">Medium</option>
            <option value="light">Light</option>
          </Select>
        </Field>
        <Field label="Days to harvest" hint="Optional" error={errors.daysToHarvest?.message}>
          <Input
            type="number"
            min="1"
            inputMode="numeric"
            {...register("daysToHarvest", {
              setValueAs: (v: string) => (v === "" || v === null ? null : Number(v)),
            })}
          />
        </Field>
      </div>
      <label className="inline-flex min-h-11 items-center gap-2">
        <input type="checkbox" className="size-5" {...register("edible")} />
        Edible
      </label>
      <label className="inline-flex min-h-11 items-center gap-2">
        <input type="checkbox" className="size-5" {...register("edibleTouchesSoil")} />
        The edible part touches the soil (longer pre-harvest interval for manure-fed stock)
      </label>
      <Button type="submit" pending={formState.isSubmitting} className="self-start">
        Add crop
      </Button>
    </form>
  );
}
