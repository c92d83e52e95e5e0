"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { FormMessage } from "@/components/forms/form-message";
import { useApiForm } from "@/components/forms/use-api-form";
import { Button, Field, Input, Textarea } from "@/components/ui";
import { apiFetch } from "@/lib/api-client";
import { queryKeys } from "@/lib/query-keys";
import { fromSi, type UnitSystem } from "@/lib/units";
import { createBedSchema, type BedShape } from "@/lib/validation/bed";
import { SizeField } from "./size-field";

type Errors = Record<string, { message?: string } | Record<string, { message?: string }>>;

/** The message of `name` or of its `name.value` / `name.unit` part. */
function sizeError(errors: Errors, name: string): string | undefined {
  const e = errors[name] as
    ({ message?: string } & Record<string, { message?: string } | undefined>) | undefined;
  return e?.message ?? e?.value?.message ?? e?.unit?.message;
}

/** The stored bed, for editing: sizes in SI, shown back in the garden's units. */
export interface EditableBed extends BedShape {
  id: string;
}

/** SI → the field's unit, 2 decimals (a bed is not measured finer); blank when unknown. */
function shown(si: number | null, unit: string): number {
  return si === null ? NaN : Math.round(fromSi(si, unit) * 100) / 100;
}

/** Adds a bed or container; with `bed`, edits that one (PATCH) and calls onDone. */
export function BedForm({
  gardenId,
  unitSystem,
  bed,
  onDone,
}: {
  gardenId: string;
  unitSystem: UnitSystem;
  bed?: EditableBed;
  onDone?: () => void;
}) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const us = unitSystem === "us";
  const side = us ? "ft" : "m";
  const small = us ? "in" : "cm";
  const big = us ? "gal" : "L";
  const { form, formError, submit } = useApiForm(createBedSchema, {
    name: bed?.name ?? "",
    kind: bed?.kind ?? "bed",
    indoors: bed?.indoors ?? false,
    length: { value: shown(bed?.lengthM ?? null, side), unit: side },
    width: { value: shown(bed?.widthM ?? null, side), unit: side },
    depth: { value: shown(bed?.depthM ?? null, small), unit: small },
    volume: { value: shown(bed?.containerVolumeL ?? null, big), unit: big },
    diameter: { value: NaN, unit: small },
    notes: bed?.notes ?? "",
  });
  const { register, formState, watch } = form;
  const kind = watch("kind");
  const errors = formState.errors as unknown as Errors;

  const onSubmit = submit(async (values) => {
    const saved = await apiFetch<{ bed: { id: string } }>(
      bed ? `/api/gardens/${gardenId}/beds/${bed.id}` : `/api/gardens/${gardenId}/beds`,
      { method: bed ? "PATCH" : "POST", body: values },
    );
    await queryClient.invalidateQueries({ queryKey: queryKeys.plan(gardenId) });
    await queryClient.invalidateQueries({ queryKey: queryKeys.beds(gardenId) });
    if (bed) {
      router.refresh();
      onDone?.();
    } else router.push(`/g/${gardenId}/beds/${saved.bed.id}`);
  });

  const lengths = us ? (["ft", "in"] as const) : (["m", "cm"] as const);
  return (
    <form
      onSubmit={onSubmit}
      noValidate
      className="flex flex-col gap-4"
      aria-label={bed ? `Edit ${bed.name}` : "Add a bed or container"}
    >
      <FormMessage message={formError} />
      <fieldset className={bed ? "hidden" : "flex flex-wrap gap-4"}>
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
      <div className="flex flex-wrap gap-2">
        <Button type="submit" pending={formState.isSubmitting}>
          {bed ? "Save changes" : `Add ${kind === "bed" ? "bed" : "container"}`}
        </Button>
        {bed ? (
          <Button variant="secondary" onClick={onDone}>
            Cancel
          </Button>
        ) : null}
      </div>
    </form>
  );
}
