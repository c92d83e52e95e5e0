"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { FormMessage } from "@/components/forms/form-message";
import { useApiForm } from "@/components/forms/use-api-form";
import { Button, Field, Input, Textarea } from "@/components/ui";
import { apiFetch } from "@/lib/api-client";
import { queryKeys } from "@/lib/query-keys";
import type { UnitSystem } from "@/lib/units";
import { createBedSchema } from "@/lib/validation/bed";
import { SizeField } from "./size-field";

type Errors = Record<string, { message?: string } | Record<string, { message?: string }>>;

/** The message of `name` or of its `name.value` / `name.unit` part. */
function sizeError(errors: Errors, name: string): string | undefined {
  const e = errors[name] as
    ({ message?: string } & Record<string, { message?: string } | undefined>) | undefined;
  return e?.message ?? e?.value?.message ?? e?.unit?.message;
}

export function BedForm({ gardenId, unitSystem }: { gardenId: string; unitSystem: UnitSystem }) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const us = unitSystem === "us";
  const side = us ? "ft" : "m";
  const { form, formError, submit } = useApiForm(createBedSchema, {
    name: "",
    kind: "bed",
    indoors: false,
    length: { value: NaN, unit: side },
    width: { value: NaN, unit: side },
    depth: { value: NaN, unit: us ? "in" : "cm" },
    volume: { value: NaN, unit: us ? "gal" : "L" },
    diameter: { value: NaN, unit: us ? "in" : "cm" },
  });
  const { register, formState, watch } = form;
  const kind = watch("kind");
  const errors = formState.errors as unknown as Errors;

  const onSubmit = submit(async (values) => {
    const { bed } = await apiFetch<{ bed: { id: string } }>(`/api/gardens/${gardenId}/beds`, {
      body: values,
    });
    await queryClient.invalidateQueries({ queryKey: queryKeys.plan(gardenId) });
    await queryClient.invalidateQueries({ queryKey: queryKeys.beds(gardenId) });
    router.push(`/g/${gardenId}/beds/${bed.id}`);
  });

  const lengths = us ? (["ft", "in"] as const) : (["m", "cm"] as const);
  return (
    <form
      onSubmit={onSubmit}
      noValidate
      className="flex flex-col gap-4"
      aria-label="Add a bed or container"
    >
      <FormMessage message={formError} />
      <fieldset className="flex flex-wrap gap-4">
        <legend className="mb-1.5 font-semibold text-soil-900">What is it?</legend>
        {(["bed", "container"] as const).map((k) => (
          <label key={k} className="inline-flex min-h-11 items-center gap-2">
            <input type="radio" value={k} className="size-5" {...register("kind")} />
            {k === "bed" ? "A bed (fed per area)" : "A container (fed per volume)"}
          </label>
        ))}
      </fieldset>
      <Field label="Name" error={errors.name?.message as string | undefined} required>
        <Input
          autoComplete="off"
          placeholder={kind === "bed" ? "Raised bed 1" : "Porch pot"}
          {...register("name")}
        />
      </Field>
      {kind === "bed" ? (
        <div className="grid gap-4 sm:grid-cols-3">
          <SizeField
            name="length"
            label="Length"
            units={[...lengths]}
            register={register}
            error={sizeError(errors, "length")}
          />
          <SizeField
            name="width"
            label="Width"
            units={[...lengths]}
            register={register}
            error={sizeError(errors, "width")}
          />
          <SizeField
            name="depth"
            label="Depth (optional)"
            units={us ? ["in", "ft"] : ["cm", "m"]}
            register={register}
            error={sizeError(errors, "depth")}
          />
        </div>
      ) : (
        <div className="grid gap-4 sm:grid-cols-3">
          <SizeField
            name="volume"
            label="Volume"
            hint="Or give diameter and depth."
            units={us ? ["gal", "qt"] : ["L"]}
            register={register}
            error={sizeError(errors, "volume")}
          />
          <SizeField
            name="diameter"
            label="Diameter"
            units={us ? ["in"] : ["cm"]}
            register={register}
            error={sizeError(errors, "diameter")}
          />
          <SizeField
            name="depth"
            label="Depth"
            units={us ? ["in"] : ["cm"]}
            register={register}
            error={sizeError(errors, "depth")}
          />
        </div>
      )}
      <label className="inline-flex min-h-11 items-center gap-2">
        <input type="checkbox" className="size-5" {...register("indoors")} />
        Indoors (fed all year, frost dates ignored)
      </label>
      <Field label="Notes" error={errors.notes?.message as string | undefined}>
        <Textarea rows={2} {...register("notes")} />
      </Field>
      <Button type="submit" pending={formState.isSubmitting} className="self-start">
        Add {kind === "bed" ? "bed" : "container"}
      </Button>
    </form>
  );
}
