"use client";

import { useState } from "react";
import { useQuery } from "@tanstack/react-query";
import { Alert, Button, Field, Input, Select } from "@/components/ui";
import type { GardenNames } from "@/components/balance/garden-names";
import { monthLabel } from "@/components/balance/month-label";
import { currentRule, describeChange, type TryChange } from "@/components/balance/what-if-changes";
import { apiFetch, ApiError } from "@/lib/api-client";
import { amountEntryFor, largestEntry } from "@/lib/balance/rule-amount-units";
import type { WhatIfBody } from "@/lib/balance/types";
import { formatPoolAmount, roundForDisplay } from "@/lib/format-quantity";
import { queryKeys } from "@/lib/query-keys";
import type { UnitSystem } from "@/lib/units";

// Try a change and see the balance recomputed beside today's. The API writes
// nothing, so every member (viewers too) may use it.

type Kind = "bin-trays" | "bin-rotation" | "bin-start" | "planting-amount";

const kindLabels: Record<Kind, string> = {
  "bin-trays": "Trays in a bin's stack",
  "bin-rotation": "Days between trays",
  "bin-start": "A bin's start date",
  "planting-amount": "A planting's amount per feeding",
};

export function WhatIfPanel({
  gardenId,
  range,
  names,
  system,
  changes,
  onChangesChange,
}: {
  gardenId: string;
  range: { from: string; months: number };
  names: GardenNames;
  system: UnitSystem;
  changes: TryChange[];
  onChangesChange: (changes: TryChange[]) => void;
}) {
  const [kind, setKind] = useState<Kind>("bin-trays");
  const [target, setTarget] = useState("");
  const [value, setValue] = useState("");
  const [valueError, setValueError] = useState<string | undefined>();
  const result = useQuery({
    queryKey: queryKeys.whatIf(gardenId, range.from, range.months, changes),
    queryFn: () =>
      apiFetch<WhatIfBody>(`/api/gardens/${gardenId}/what-if`, {
        method: "POST",
        body: { from: range.from, months: range.months, changes },
      }),
    enabled: changes.length > 0,
    retry: false,
  });
  const targets =
    kind === "planting-amount"
      ? names.plantings.map((p) => ({ id: p.id, name: p.label }))
      : names.bins;
  const targetId = targets.some((t) => t.id === target) ? target : (targets[0]?.id ?? "");
  // A planting's amount is entered in the garden's units, as its rule measures it.
  const rule = kind === "planting-amount" ? currentRule(targetId, names) : null;
  const entry = rule ? amountEntryFor(rule, system) : null;

  function add() {
    const n = Number(value);
    let change: TryChange | null = null;
    if (kind === "bin-trays") change = { kind, binId: targetId, trays: n };
    else if (kind === "bin-rotation") change = { kind, binId: targetId, rotationIntervalDays: n };
    else if (kind === "bin-start") change = { kind, binId: targetId, startDate: value };
    else if (entry && rule && Number.isFinite(n)) {
      // The API refuses the same bound (400 naming the field); say it here in the garden's units.
      const most = largestEntry(rule, entry);
      if (most !== null && entry.toSi(n) > entry.toSi(most)) {
        setValueError(`At most ${most} ${entry.label}.`);
        return;
      }
      change = { kind, plantingId: targetId, amount: entry.toSi(n) };
    }
    if (change && targetId && value) onChangesChange([...changes, change]);
    setValue("");
    setValueError(undefined);
  }

  return (
    <section
      aria-labelledby="what-if-heading"
      className="flex min-w-0 flex-col gap-3"
      data-testid="what-if"
    >
      <h2 id="what-if-heading" className="text-xl">
        What if…
      </h2>
      <Alert tone="info" title="Nothing here is saved">
        Try changes freely: the balance is worked out again with them, and your garden stays exactly
        as it is.
      </Alert>
      <form
        className="grid gap-3 sm:grid-cols-4 sm:items-end"
        onSubmit={(e) => {
          e.preventDefault();
          add();
        }}
      >
        <Field label="Change">
          <Select value={kind} onChange={(e) => setKind(e.target.value as Kind)}>
            {(Object.keys(kindLabels) as Kind[]).map((k) => (
              <option key={k} value={k}>
                {kindLabels[k]}
              </option>
            ))}
          </Select>
        </Field>
        <Field label={kind === "planting-amount" ? "Planting" : "Bin"}>
          <Select value={targetId} onChange={(e) => setTarget(e.target.value)}>
            {targets.map((t) => (
              <option key={t.id} value={t.id}>
                {t.name}
              </option>
            ))}
          </Select>
        </Field>
        <Field
          label={kind === "bin-start" ? "Date" : entry ? `Amount (${entry.label})` : "Number"}
          hint={
            entry && rule
              ? `Today ${roundForDisplay(entry.fromSi(rule.amount))} ${entry.label}`
              : undefined
          }
          error={valueError}
        >
          <Input
            type={kind === "bin-start" ? "date" : "number"}
            inputMode={kind === "bin-start" ? undefined : entry ? "decimal" : "numeric"}
            min={kind === "bin-start" ? undefined : entry ? 0 : 1}
            step={entry ? "any" : undefined}
            value={value}
            onChange={(e) => setValue(e.target.value)}
            required
          />
        </Field>
        <Button type="submit" variant="secondary">
          Add change
        </Button>
      </form>
      {changes.length > 0 ? (
        <div className="flex min-w-0 flex-col gap-2">
          <ul className="flex flex-col gap-1" aria-label="Changes being tried">
            {changes.map((c, i) => (
              <li key={i} className="flex flex-wrap items-center gap-2">
                <span>{describeChange(c, names, system)}</span>
                <Button
                  variant="ghost"
                  size="sm"
                  onClick={() => onChangesChange(changes.filter((_, j) => j !== i))}
                >
                  Remove
                </Button>
              </li>
            ))}
          </ul>
          <Button
            variant="ghost"
            size="sm"
            className="self-start"
            onClick={() => onChangesChange([])}
          >
            Clear all changes
          </Button>
        </div>
      ) : null}
      {result.isFetching ? (
        <p aria-live="polite">Working out the balance with these changes…</p>
      ) : null}
      {result.error ? (
        <Alert tone="danger" title="That change could not be tried">
          {result.error instanceof ApiError ? errorText(result.error) : "Something went wrong."}
        </Alert>
      ) : null}
      {result.data && changes.length > 0 ? <Comparison body={result.data} system={system} /> : null}
    </section>
  );
}

function Comparison({ body, system }: { body: WhatIfBody; system: UnitSystem }) {
  const today = body.current.plan.rows.filter((r) => r.pool === "castings");
  const changed = body.changed.plan.rows.filter((r) => r.pool === "castings");
  const total = (rows: typeof today) => rows.reduce((s, r) => s + r.shortfall, 0);
  const kg = (si: number) => formatPoolAmount(si, "castings", system);
  return (
    <div className="flex flex-col gap-2" data-testid="what-if-result">
      <p className="font-semibold" data-testid="what-if-summary">
        Castings short over these months: today {kg(total(today))}, with the changes{" "}
        {kg(total(changed))}.
      </p>
      <div
        className="max-w-full overflow-x-auto rounded-card border border-loam-200 bg-white"
        tabIndex={0}
        role="region"
        aria-label="Today beside the changes"
      >
        <table className="w-full text-sm">
          <thead className="bg-loam-100">
            <tr>
              <th scope="col" className="px-3 py-2 text-left">
                Month
              </th>
              <th scope="col" className="px-3 py-2 text-right">
                Short today
              </th>
              <th scope="col" className="px-3 py-2 text-right">
                Short with changes
              </th>
              <th scope="col" className="px-3 py-2 text-right">
                Closing with changes
              </th>
            </tr>
          </thead>
          <tbody className="divide-y divide-loam-200">
            {changed.map((r, i) => (
              <tr key={r.month} data-month={r.month}>
                <td className="px-3 py-2">{monthLabel(r.month)}</td>
                <td className="px-3 py-2 text-right">{kg(today[i]?.shortfall ?? 0)}</td>
                <td className="px-3 py-2 text-right" data-col="changed-shortfall">
                  {kg(r.shortfall)}
                </td>
                <td className="px-3 py-2 text-right">{kg(r.closing)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}

/** The API's message, or for a 400 what it said about each field, naming the change. */
function errorText(error: ApiError): string {
  const fields = Object.entries(error.fields ?? {});
  if (fields.length === 0) return error.message;
  return fields
    .map(([path, message]) => {
      const at = /^changes\.(\d+)\./.exec(path);
      return `${at ? `Change ${Number(at[1]) + 1}` : path}: ${message}.`;
    })
    .join(" ");
}
