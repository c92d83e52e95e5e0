"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button, Field, Input, Select } from "@/components/ui";
import { MONTHS_MAX, MONTHS_MIN } from "@/components/balance/balance-range";

const choices = Array.from({ length: MONTHS_MAX - MONTHS_MIN + 1 }, (_, i) => MONTHS_MIN + i);

/** Start month and length of the Balance; changes go into the URL so the view can be linked. */
export function RangeControl({
  basePath,
  from,
  months,
}: {
  basePath: string;
  from: string;
  months: number;
}) {
  const router = useRouter();
  const [start, setStart] = useState(from);
  const [count, setCount] = useState(months);
  return (
    <form
      className="flex flex-wrap items-end gap-3"
      aria-label="Months shown"
      onSubmit={(e) => {
        e.preventDefault();
        if (/^\d{4}-\d{2}$/.test(start)) router.push(`${basePath}?from=${start}&months=${count}`);
      }}
    >
      <Field label="From">
        <Input
          type="month"
          value={start}
          onChange={(e) => setStart(e.target.value)}
          className="w-44"
          required
        />
      </Field>
      <Field label="Months">
        <Select value={count} onChange={(e) => setCount(Number(e.target.value))} className="w-28">
          {choices.map((n) => (
            <option key={n} value={n}>
              {n}
            </option>
          ))}
        </Select>
      </Field>
      <Button type="submit" variant="secondary">
        Show
      </Button>
    </form>
  );
}
