"use client";

import type { Control, FieldErrors, UseFormRegister } from "react-hook-form";
import { Field, Input, Select } from "@/components/ui";
import type { CreateGardenInput } from "@/lib/validation/garden";
import { MonthDayField } from "./month-day-field";
import { TimeZoneField } from "./time-zone-field";

/** The fields shared by "start a garden" and the garden's settings. */
export function GardenFields({
  register,
  control,
  errors,
}: {
  register: UseFormRegister<CreateGardenInput>;
  control: Control<CreateGardenInput>;
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
            {/* Short enough to show whole in a 375 px wide phone's closed select. */}
            <option value="us">US customary (lb, gal, ft²)</option>
            <option value="metric">Metric (kg, L, m²)</option>
          </Select>
        </Field>
        <MonthDayField
          control={control}
          name="lastSpringFrost"
          label="Last spring frost"
          hint="The usual day; feeding starts after it each year."
          error={errors.lastSpringFrost?.message}
        />
        <MonthDayField
          control={control}
          name="firstFallFrost"
          label="First fall frost"
          hint="The usual day; outdoor feeding stops here each year."
          error={errors.firstFallFrost?.message}
        />
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
