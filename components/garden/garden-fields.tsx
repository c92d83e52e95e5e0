"use client";

import type { FieldErrors, UseFormRegister } from "react-hook-form";
import { Field, Input, Select } from "@/components/ui";
import type { CreateGardenInput } from "@/lib/validation/garden";

// A short list covers most growers; anything Intl knows is accepted by the API.
const commonZones = [
  "America/New_York",
  "America/Chicago",
  "America/Denver",
  "America/Los_Angeles",
  "America/Anchorage",
  "Pacific/Honolulu",
  "America/Toronto",
  "America/Vancouver",
  "Europe/London",
  "Europe/Dublin",
  "Europe/Berlin",
  "Australia/Sydney",
  "Pacific/Auckland",
  "UTC",
];

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
        <Field
          label="Time zone"
          hint="“Today” and every date in the plan follow this clock."
          error={errors.timeZone?.message}
        >
          <Select {...register("timeZone")}>
            {commonZones.map((z) => (
              <option key={z} value={z}>
                {z.replace(/_/g, " ")}
              </option>
            ))}
          </Select>
        </Field>
        <Field label="Units" error={errors.unitSystem?.message}>
          <Select {...register("unitSystem")}>
            {/* Short enough to show whole in a 375 px wide phone's closed select. */}
            <option value="us">US customary (lb, gal, ft²)</option>
            <option value="metric">Metric (kg, L, m²)</option>
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
