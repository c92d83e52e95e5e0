"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import { FormMessage } from "@/components/forms/form-message";
import { Button, Field, Input, Select, useToast } from "@/components/ui";
import { apiFetch, ApiError } from "@/lib/api-client";
import { DEFAULTS, nominalBoardNames, NOMINAL_BOARDS, trayInsideFromOuter } from "@/lib/engine";
import { formatAmount } from "@/lib/format-quantity";
import { queryKeys } from "@/lib/query-keys";
import { toSi, fromSi, type UnitSystem } from "@/lib/units";
import { binKindLabels, binKinds } from "@/lib/validation/bin";

// Create or edit a bin in the garden's units (in / lb or cm / kg); the body
// sent is SI. Blank engine parameters mean "the engine's default", shown with
// its source beside the field.

const MONTHS = ["Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep", "Oct", "Nov", "Dec"];

export interface BinFormInitial {
  id?: string;
  name: string;
  kind: (typeof binKinds)[number];
  trayCount: number;
  trayLengthM: number | null;
  trayWidthM: number | null;
  trayDepthM: number | null;
  startedOn: string;
  startingWormCount: number;
  manureFeedstock: boolean;
  indoors: boolean;
  dormantMonths: number[];
  processingDays: number | null;
  rotationDays: number | null;
  fillFraction: number | null;
  bulkDensityKgPerL: number | null;
  drainIntervalDays: number | null;
}

interface Values {
  name: string;
  kind: string;
  trayCount: string;
  sizeMode: "inside" | "outer";
  length: string;
  width: string;
  depth: string;
  board: string;
  startedOn: string;
  wormMode: "count" | "weight";
  worms: string;
  manureFeedstock: boolean;
  indoors: boolean;
  dormantMonths: string[];
  processingDays: string;
  rotationDays: string;
  fillFraction: string;
  bulkDensityKgPerL: string;
  drainIntervalDays: string;
}

const num = (s: string) => (s.trim() === "" ? null : Number(s));
const str = (n: number | null | undefined, digits = 2) =>
  n == null ? "" : String(Math.round(n * 10 ** digits) / 10 ** digits);

export function BinForm({
  gardenId,
  system,
  initial,
}: {
  gardenId: string;
  system: UnitSystem;
  initial: BinFormInitial;
}) {
  const router = useRouter();
  const toast = useToast();
  const queryClient = useQueryClient();
  const side = system === "us" ? "in" : "cm";
  const mass = system === "us" ? "lb" : "kg";
  // The engine's worms per lb, told per the garden's mass unit, in round hundreds.
  const wormsPerMass =
    Math.round((DEFAULTS.wormsPerLb.value * toSi(1, mass)) / toSi(1, "lb") / 100) * 100;
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, control, formState } = useForm<Values>({
    defaultValues: {
      name: initial.name,
      kind: initial.kind,
      trayCount: String(initial.trayCount),
      sizeMode: initial.id || initial.trayLengthM ? "inside" : "outer",
      length: str(initial.trayLengthM === null ? null : fromSi(initial.trayLengthM, side)),
      width: str(initial.trayWidthM === null ? null : fromSi(initial.trayWidthM, side)),
      depth: str(initial.trayDepthM === null ? null : fromSi(initial.trayDepthM, side)),
      board: "2x6",
      startedOn: initial.startedOn,
      wormMode: "count",
      worms: String(initial.startingWormCount),
      manureFeedstock: initial.manureFeedstock,
      indoors: initial.indoors,
      dormantMonths: initial.dormantMonths.map(String),
      processingDays: str(initial.processingDays, 0),
      rotationDays: str(initial.rotationDays, 0),
      fillFraction: str(initial.fillFraction),
      bulkDensityKgPerL: str(initial.bulkDensityKgPerL),
      drainIntervalDays: str(initial.drainIntervalDays, 0),
    },
  });
  const v = useWatch({ control });
  const outer = v.sizeMode === "outer";
  let insideText: string | null = null;
  if (outer && Number(v.length) > 0 && Number(v.width) > 0) {
    try {
      const box = trayInsideFromOuter({
        outerLengthM: toSi(Number(v.length), side),
        outerWidthM: toSi(Number(v.width), side),
        board: v.board as keyof typeof NOMINAL_BOARDS,
      });
      insideText = `Inside: ${formatAmount(box.lengthM, "tray-side", system)} × ${formatAmount(box.widthM, "tray-side", system)} × ${formatAmount(box.depthM, "tray-side", system)} deep, ${formatAmount(box.lengthM * box.widthM * box.depthM * 1000, "tray-volume", system)}`;
    } catch (e) {
      insideText = e instanceof Error ? e.message.replace(/^[^:]*: /, "") : null;
    }
  }

  const onSubmit = handleSubmit(async (values) => {
    setErrors({});
    setFormError(null);
    const len = toSi(Number(values.length), side);
    const wid = toSi(Number(values.width), side);
    const body = {
      name: values.name,
      kind: values.kind,
      trayCount: Number(values.trayCount),
      tray: outer
        ? { mode: "outer", outerLengthM: len, outerWidthM: wid, board: values.board }
        : { mode: "inside", lengthM: len, widthM: wid, depthM: toSi(Number(values.depth), side) },
      startedOn: values.startedOn,
      startingWorms:
        values.wormMode === "count"
          ? { count: Number(values.worms) }
          : { kg: toSi(Number(values.worms), mass) },
      manureFeedstock: values.manureFeedstock,
      indoors: values.indoors,
      dormantMonths: values.dormantMonths.map(Number),
      processingDays: num(values.processingDays),
      rotationDays: num(values.rotationDays),
      fillFraction: num(values.fillFraction),
      bulkDensityKgPerL: num(values.bulkDensityKgPerL),
      drainIntervalDays: num(values.drainIntervalDays),
    };
    try {
      const url = `/api/gardens/${gardenId}/bins${initial.id ? `/${initial.id}` : ""}`;
      const res = await apiFetch<{ bin: { id: string } }>(url, {
        method: initial.id ? "PATCH" : "POST",
        body,
      });
      await queryClient.invalidateQueries({ queryKey: queryKeys.bins(gardenId) });
      await queryClient.invalidateQueries({ queryKey: queryKeys.plan(gardenId) });
      toast.show({ title: initial.id ? "Bin saved." : "Bin added.", tone: "positive" });
      router.push(`/g/${gardenId}/bins/${res.bin.id}`);
      router.refresh();
    } catch (error) {
      if (error instanceof ApiError) {
        setErrors(error.fields ?? {});
        setFormError(error.message);
      } else setFormError("Something went wrong. Please try again.");
    }
  });

  const err = (prefix: string) =>
    Object.entries(errors).find(([k]) => k === prefix || k.startsWith(`${prefix}.`))?.[1];
  const dflt = (name: keyof typeof DEFAULTS, unit = "") =>
    `Blank = ${DEFAULTS[name].value}${unit} (${DEFAULTS[name].source})`;

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4" aria-label="Bin">
      <FormMessage message={formError} />
      <div className="grid gap-4 sm:grid-cols-2">
        <Field label="Name" error={err("name")} required>
          <Input required {...register("name")} />
        </Field>
        <Field label="Kind" error={err("kind")}>
          <Select {...register("kind")}>
            {binKinds.map((k) => (
              <option key={k} value={k}>
                {binKindLabels[k]}
              </option>
            ))}
          </Select>
        </Field>
        <Field label="Trays in the full stack" error={err("trayCount")}>
          <Input type="number" inputMode="numeric" min={1} max={12} {...register("trayCount")} />
        </Field>
        <Field label="Started" error={err("startedOn")}>
          <Input type="date" {...register("startedOn")} />
        </Field>
      </div>
      <fieldset className="flex flex-col gap-3 rounded-card border border-loam-200 p-3">
        <legend className="px-1 font-semibold">Tray size ({side})</legend>
        <div className="flex flex-wrap gap-4">
          <label className="flex min-h-11 items-center gap-2">
            <input type="radio" value="outer" {...register("sizeMode")} /> Outside size + board
          </label>
          <label className="flex min-h-11 items-center gap-2">
            <input type="radio" value="inside" {...register("sizeMode")} /> Inside size
          </label>
        </div>
        <div className="grid grid-cols-2 gap-3 sm:grid-cols-4">
          <Field label={outer ? "Outside length" : "Inside length"} error={err("tray")}>
            <Input type="number" inputMode="decimal" step="any" {...register("length")} />
          </Field>
          <Field label={outer ? "Outside width" : "Inside width"}>
            <Input type="number" inputMode="decimal" step="any" {...register("width")} />
          </Field>
          {outer ? (
            <Field label="Board (nominal)" hint="PS 20 dry size">
              <Select {...register("board")}>
                {nominalBoardNames.map((b) => (
                  <option key={b} value={b}>
                    {b.replace("x", "×")} ({NOMINAL_BOARDS[b].thicknessIn} ×{" "}
                    {NOMINAL_BOARDS[b].widthIn} in)
                  </option>
                ))}
              </Select>
            </Field>
          ) : (
            <Field label="Inside depth">
              <Input type="number" inputMode="decimal" step="any" {...register("depth")} />
            </Field>
          )}
        </div>
        {insideText ? (
          <p className="text-sm text-soil-700" aria-live="polite">
            {insideText}
          </p>
        ) : null}
      </fieldset>
      <div className="grid gap-4 sm:grid-cols-2">
        <Field
          label={`Starting worms (${v.wormMode === "count" ? "count" : mass})`}
          error={err("startingWorms")}
        >
          <Input type="number" inputMode="decimal" step="any" {...register("worms")} />
        </Field>
        <Field label="Worms given as">
          <Select {...register("wormMode")}>
            <option value="count">a count</option>
            <option value="weight">
              a weight ({mass}, about {wormsPerMass.toLocaleString("en-US")} worms per {mass})
            </option>
          </Select>
        </Field>
      </div>
      <div className="flex flex-col gap-2">
        <label className="flex min-h-11 items-center gap-2">
          <input type="checkbox" {...register("manureFeedstock")} /> Feedstock includes manure (its
          castings then wait out the pre-harvest interval on edible crops)
        </label>
        <label className="flex min-h-11 items-center gap-2">
          <input type="checkbox" {...register("indoors")} /> Kept indoors
        </label>
      </div>
      <fieldset>
        <legend className="font-semibold">Dormant months (no processing, no harvest)</legend>
        <div className="mt-1 grid grid-cols-4 gap-1 sm:grid-cols-6">
          {MONTHS.map((m, i) => (
            <label key={m} className="flex min-h-11 items-center gap-2">
              <input type="checkbox" value={String(i + 1)} {...register("dormantMonths")} /> {m}
            </label>
          ))}
        </div>
      </fieldset>
      <details className="rounded-card border border-loam-200 p-3">
        <summary className="min-h-11 cursor-pointer font-semibold">
          Forecast settings (optional)
        </summary>
        <div className="mt-3 grid gap-4 sm:grid-cols-2">
          <Field
            label="Days a tray processes"
            hint={dflt("processingDays", " days")}
            error={err("processingDays")}
          >
            <Input type="number" inputMode="numeric" {...register("processingDays")} />
          </Field>
          <Field
            label="Days between trays"
            hint={dflt("rotationIntervalDays", " days")}
            error={err("rotationDays")}
          >
            <Input type="number" inputMode="numeric" {...register("rotationDays")} />
          </Field>
          <Field
            label="Fill of a finished tray (0–1)"
            hint={dflt("fillFraction")}
            error={err("fillFraction")}
          >
            <Input type="number" inputMode="decimal" step="any" {...register("fillFraction")} />
          </Field>
          <Field
            label="Castings bulk density (kg/L)"
            hint={dflt("castingsBulkDensityKgPerL")}
            error={err("bulkDensityKgPerL")}
          >
            <Input
              type="number"
              inputMode="decimal"
              step="any"
              {...register("bulkDensityKgPerL")}
            />
          </Field>
          <Field
            label="Days between drains"
            hint="Blank = drain when the base has collected a week's liquid (the garden's liquid keeping time)"
            error={err("drainIntervalDays")}
          >
            <Input type="number" inputMode="numeric" {...register("drainIntervalDays")} />
          </Field>
        </div>
      </details>
      <Button type="submit" pending={formState.isSubmitting}>
        {initial.id ? "Save bin" : "Add bin"}
      </Button>
    </form>
  );
}
