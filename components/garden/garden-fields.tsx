"use client";

import type { FieldErrors, UseFormRegister } from "react-hook-form";
import { Field, Input, Select } from "@/components/ui";
import type { CreateGardenInput } from "@/lib/validation/garden";
import { TimeZoneField } from "./time-zone-field";

/** The fields shared by "start a garden" and the garden's settings. */
export function GardenFields({
  register,
  errors,
}: {
  register: UseFormRegister<CreateGardenInput>;
  errors: FieldErrors<CreateGardenInput>;
}) {
  return (
    <>
      <Field label="Garden name" error={errors.name?.message} required>
        <Input autoComplete="off" {...register("name")} />
      </Field>
      <div className="grid gap-4 sm:grid-cols-2">
        <TimeZoneField registration={register("timeZone")} error={errors.timeZone?.message} />
        <Field label="Units" error={errors.unitSystem?.message}>
          <Select {...register("unitSystem")}>
            <option value="us">US customary (lb, cups, gallons, ft²)</option>
            <option value="metric">Metric (kg, litres, m²)</option>
          </Select>
        </Field>
        <Field
          label="Last spring frost"
          hint="Usual date; feeding starts after it."
          error={errors.lastSpringFrost?.message}
        >
          <Input type="date" {...register("lastSpringFrost")} />
        </Field>
        <Field
          label="First fall frost"
          hint="Outdoor feeding stops here."
          error={errors.firstFallFrost?.message}
        >
          <Input type="date" {...register("firstFallFrost")} />
        </Field>
      </div>
      <Field
        label="Where is it?"
        hint="Optional, e.g. “Plot 14, Elm Road allotments”."
        error={errors.location?.message}
      >
        <Input {...register("location")} />
      </Field>
    </>
  );
}
