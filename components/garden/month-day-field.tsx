"use client";

import { useId } from "react";
import { useController, type Control } from "react-hook-form";
import { Select } from "@/components/ui";
import type { CreateGardenInput } from "@/lib/validation/garden";
import { MONTH_NAMES } from "@/lib/format";

// Days in each month of a leap year, so 29 February can be chosen.
const DAYS_IN_MONTH = [31, 29, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];
const two = (n: number) => String(n).padStart(2, "0");

/**
 * A usual day of the year ("MM-DD"), picked as a month and a day: no year to
 * choose, because the plan applies it to every year it covers.
 */
export function MonthDayField({
  control,
  name,
  label,
  hint,
  error,
}: {
  control: Control<CreateGardenInput>;
  name: "lastSpringFrost" | "firstFallFrost";
  label: string;
  hint: string;
  error?: string;
}) {
  const { field } = useController({ control, name });
  const id = useId();
  const [month, day] = /^\d{2}-\d{2}$/.test(field.value ?? "")
    ? field.value.split("-").map(Number)
    : [1, 1];
  const set = (m: number, d: number) =>
    field.onChange(`${two(m)}-${two(Math.min(d, DAYS_IN_MONTH[m - 1] ?? 31))}`);
  const describedBy = [`${id}-hint`, error ? `${id}-error` : null].filter(Boolean).join(" ");
  return (
    <fieldset className="flex flex-col gap-1.5" aria-describedby={describedBy}>
      <legend className="font-semibold text-soil-900">{label}</legend>
      <p id={`${id}-hint`} className="text-sm text-soil-700">
        {hint}
      </p>
      <div className="grid grid-cols-[3fr_2fr] gap-2">
        <label className="flex flex-col gap-1 text-sm">
          Month
          <Select
            name={`${name}-month`}
            value={month}
            onChange={(e) => set(Number(e.target.value), day ?? 1)}
            onBlur={field.onBlur}
            aria-invalid={error ? true : undefined}
          >
            {MONTH_NAMES.map((m, i) => (
              <option key={m} value={i + 1}>
                {m}
              </option>
            ))}
          </Select>
        </label>
        <label className="flex flex-col gap-1 text-sm">
          Day
          <Select
            name={`${name}-day`}
            value={day}
            onChange={(e) => set(month ?? 1, Number(e.target.value))}
            onBlur={field.onBlur}
            aria-invalid={error ? true : undefined}
          >
            {Array.from({ length: DAYS_IN_MONTH[(month ?? 1) - 1] ?? 31 }, (_, i) => (
              <option key={i + 1} value={i + 1}>
                {i + 1}
              </option>
            ))}
          </Select>
        </label>
      </div>
      {error ? (
        <p id={`${id}-error`} className="text-sm font-semibold text-bloom-700">
          {error}
        </p>
      ) : null}
    </fieldset>
  );
}
