"use client";

import { useSyncExternalStore } from "react";
import type { UseFormRegisterReturn } from "react-hook-form";
import { Field, Input } from "@/components/ui";
import { timeZoneLabel, timeZoneNames } from "@/lib/time-zones";

const noZones: readonly string[] = [];
const subscribe = () => () => {};

/**
 * Every zone the runtime knows, offered as suggestions while typing ("chic" → America/Chicago):
 * a text input with a datalist works with a keyboard, a screen reader and a phone's picker.
 * The suggestions are filled in after hydration, so the server's list never has to match the browser's.
 */
export function TimeZoneField({
  registration,
  error,
}: {
  registration: UseFormRegisterReturn;
  error?: string;
}) {
  const zones = useSyncExternalStore(subscribe, timeZoneNames, () => noZones);
  return (
    <Field
      label="Time zone"
      hint="Type a city or region, e.g. Chicago. “Today” and every date in the plan follow this clock."
      error={error}
    >
      {(control) => (
        <>
          <Input
            {...control}
            {...registration}
            list="time-zone-names"
            autoComplete="off"
            autoCapitalize="none"
            spellCheck={false}
          />
          <datalist id="time-zone-names" data-testid="time-zone-names">
            {zones.map((z) => (
              <option key={z} value={z}>
                {timeZoneLabel(z)}
              </option>
            ))}
          </datalist>
        </>
      )}
    </Field>
  );
}
