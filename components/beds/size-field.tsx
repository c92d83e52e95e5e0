"use client";

import type { UseFormRegister } from "react-hook-form";
import { Field, Input, Select } from "@/components/ui";
import { unitLabel, type UnitName } from "@/lib/units";

/** A size as value + unit: two controls under one label, errors on either. */
export function SizeField({
  name,
  label,
  hint,
  units,
  register,
  error,
}: {
  name: string;
  label: string;
  hint?: string;
  units: UnitName[];
  // The parent's form type varies; the names are checked by the server schema.
  // eslint-disable-next-line @typescript-eslint/no-explicit-any
  register: UseFormRegister<any>;
  error?: string;
}) {
  return (
    <Field label={label} hint={hint} error={error}>
      {(control) => (
        <div className="flex gap-2">
          <Input
            {...control}
            type="number"
            inputMode="decimal"
            step="any"
            min="0"
            className="min-w-0 flex-1"
            {...register(`${name}.value`, { valueAsNumber: true })}
          />
          <Select
            aria-label={`${label}: unit`}
            className="w-28 shrink-0"
            {...register(`${name}.unit`)}
          >
            {units.map((u) => (
              <option key={u} value={u}>
                {unitLabel(u)}
              </option>
            ))}
          </Select>
        </div>
      )}
    </Field>
  );
}
