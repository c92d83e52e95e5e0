"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import { CautionLine } from "@/components/cautions/caution-note";
import { FormMessage } from "@/components/forms/form-message";
import { Alert, Button, Field, Input, Select, Textarea, useToast } from "@/components/ui";
import { apiFetch, ApiError } from "@/lib/api-client";
import { liftingCaution } from "@/lib/cautions";
import { PhotoUpload } from "./photo-upload";
import { queryKeys } from "@/lib/query-keys";
import { fahrenheitToCelsius, temperatureLabel, toSi, type UnitSystem } from "@/lib/units";
import {
  binEventKindLabels,
  foodKinds,
  foodWarnings,
  type BinEventKind,
} from "@/lib/validation/bin-event";

// The helper's quick form: what happened, when, how much (in the garden's
// units). The body sent is SI; the server checks dates, capacity and worms.

interface Values {
  kind: BinEventKind;
  on: string;
  amount: string;
  harvestBy: "weight" | "volume";
  foods: string[];
  temperature: string;
  moisture: string;
  worms: string;
  target: string;
  note: string;
}

export interface MoveTarget {
  gardenId: string;
  binId: string;
  label: string;
}

export function LogEntryForm({
  gardenId,
  binId,
  system,
  today,
  targets,
  onLogged,
}: {
  gardenId: string;
  binId: string;
  system: UnitSystem;
  today: string;
  targets: MoveTarget[];
  /** Called with the new entry's id (the photo form attaches to it). */
  onLogged?: (result: { eventId: string | null; kind: BinEventKind }) => void;
}) {
  const us = system === "us";
  const units = {
    mass: us ? "lb" : "kg",
    liquid: us ? "gal" : "L",
    volume: us ? "gal" : "L",
  } as const;
  const router = useRouter();
  const toast = useToast();
  const queryClient = useQueryClient();
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [formError, setFormError] = useState<string | null>(null);
  const [overCapacity, setOverCapacity] = useState(false);
  const [warnings, setWarnings] = useState<string[]>([]);
  const [harvestId, setHarvestId] = useState<string | null>(null);
  const { register, handleSubmit, control, reset, formState } = useForm<Values>({
    // Every field has a value, mounted or not: the submit reads them all.
    defaultValues: {
      kind: "food-added",
      on: today,
      amount: "",
      harvestBy: "weight",
      foods: [],
      temperature: "",
      moisture: "",
      worms: "",
      target: "",
      note: "",
    },
  });
  const kind = useWatch({ control, name: "kind" });
  const harvestBy = useWatch({ control, name: "harvestBy" });
  const foods = useWatch({ control, name: "foods" }) ?? [];
  const risky = foods.filter((f) => f in foodWarnings);

  const onSubmit = handleSubmit(async (v) => {
    setErrors({});
    setFormError(null);
    // A field of another kind is unmounted and may read as undefined.
    const n = (s: string | undefined) => (!s?.trim() ? undefined : Number(s));
    const base = { kind: v.kind, on: v.on, note: v.note?.trim() || null };
    const tempC = n(v.temperature);
    const body =
      v.kind === "food-added"
        ? { ...base, foodKg: toSi(Number(v.amount), units.mass), foods: v.foods }
        : v.kind === "tray-harvested"
          ? v.harvestBy === "weight"
            ? { ...base, castingsKg: toSi(Number(v.amount), units.mass) }
            : { ...base, castingsL: toSi(Number(v.amount), units.volume) }
          : v.kind === "liquid-drained"
            ? { ...base, litres: toSi(Number(v.amount), units.liquid) }
            : v.kind === "observation"
              ? {
                  ...base,
                  temperatureC:
                    tempC === undefined ? null : us ? fahrenheitToCelsius(tempC) : tempC,
                  moisturePercent: n(v.moisture) ?? null,
                  wormCount: n(v.worms) ?? null,
                }
              : v.kind === "worms-moved"
                ? {
                    ...base,
                    worms: { count: Number(v.worms) },
                    to: v.target ? JSON.parse(v.target) : null,
                  }
                : base;
    try {
      const confirm = overCapacity && v.kind === "tray-harvested" ? "?confirm" : "";
      const res = await apiFetch<{ eventId: string | null; warnings: string[] }>(
        `/api/gardens/${gardenId}/bins/${binId}/events${confirm}`,
        { body },
      );
      setWarnings(res.warnings);
      setHarvestId(v.kind === "tray-harvested" ? res.eventId : null);
      setOverCapacity(false);
      toast.show({ title: `${binEventKindLabels[v.kind]}: logged.`, tone: "positive" });
      reset({ ...v, amount: "", foods: [], temperature: "", moisture: "", worms: "", note: "" });
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: ["gardens", gardenId, "bins"] }),
        queryClient.invalidateQueries({ queryKey: queryKeys.lots(gardenId) }),
        queryClient.invalidateQueries({ queryKey: queryKeys.plan(gardenId) }),
      ]);
      onLogged?.({ eventId: res.eventId, kind: v.kind });
      router.refresh();
    } catch (error) {
      if (error instanceof ApiError) {
        setErrors(error.fields ?? {});
        setFormError(error.message);
        if (error.code === "validation:over_capacity") setOverCapacity(true);
      } else setFormError("Something went wrong. Please try again.");
    }
  });

  const err = (...names: string[]) =>
    Object.entries(errors).find(([k]) => names.some((n) => k === n || k.startsWith(`${n}.`)))?.[1];
  const amountLabel =
    kind === "food-added"
      ? `Food (${units.mass})`
      : kind === "tray-harvested"
        ? `Castings (${harvestBy === "weight" ? units.mass : units.volume})`
        : `Liquid (${units.liquid})`;

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-3" aria-label="Log bin work">
      <FormMessage message={formError} />
      <div className="grid gap-3 sm:grid-cols-2">
        <Field label="What happened" error={err("kind")}>
          <Select {...register("kind")}>
            {Object.entries(binEventKindLabels).map(([k, label]) => (
              <option key={k} value={k}>
                {label}
              </option>
            ))}
          </Select>
        </Field>
        <Field label="On" error={err("on")}>
          <Input type="date" max={today} {...register("on")} />
        </Field>
      </div>
      {kind === "tray-harvested" ? (
        <>
          <Field label="Measured by">
            <Select {...register("harvestBy")}>
              <option value="weight">weight</option>
              <option value="volume">volume</option>
            </Select>
          </Field>
          <CautionLine caution={liftingCaution(system)} />
        </>
      ) : null}
      {kind === "food-added" || kind === "tray-harvested" || kind === "liquid-drained" ? (
        <Field label={amountLabel} error={err("foodKg", "castingsKg", "castingsL", "litres")}>
          <Input type="number" inputMode="decimal" step="any" min={0} {...register("amount")} />
        </Field>
      ) : null}
      {overCapacity ? (
        <label className="flex min-h-11 items-center gap-2 font-semibold">
          <input type="checkbox" checked readOnly /> It really was that much: send again to log it
        </label>
      ) : null}
      {kind === "food-added" ? (
        <fieldset>
          <legend className="font-semibold">What went in</legend>
          <div className="mt-1 grid grid-cols-2 gap-1 sm:grid-cols-3">
            {foodKinds.map((f) => (
              <label key={f} className="flex min-h-11 items-center gap-2">
                <input type="checkbox" value={f} {...register("foods")} /> {f}
              </label>
            ))}
          </div>
          {risky.length ? (
            <Alert tone="caution" className="mt-2" title="Not great for worms">
              <ul>
                {risky.map((f) => (
                  <li key={f}>{foodWarnings[f as keyof typeof foodWarnings]}</li>
                ))}
              </ul>
            </Alert>
          ) : null}
        </fieldset>
      ) : null}
      {kind === "observation" ? (
        <div className="grid grid-cols-2 gap-3 sm:grid-cols-3">
          <Field label={`Temperature (${temperatureLabel(system)})`} error={err("temperatureC")}>
            <Input type="number" inputMode="decimal" step="any" {...register("temperature")} />
          </Field>
          <Field label="Moisture (%)" error={err("moisturePercent")}>
            <Input type="number" inputMode="decimal" step="any" {...register("moisture")} />
          </Field>
          <Field label="Worms counted" error={err("wormCount")}>
            <Input type="number" inputMode="numeric" {...register("worms")} />
          </Field>
        </div>
      ) : null}
      {kind === "worms-moved" ? (
        <div className="grid gap-3 sm:grid-cols-2">
          <Field label="Worms (count)" error={err("worms")}>
            <Input type="number" inputMode="numeric" min={1} {...register("worms")} />
          </Field>
          <Field label="To" error={err("to")}>
            <Select {...register("target")}>
              <option value="">Out (given away, sold, lost)</option>
              {targets.map((t) => (
                <option
                  key={t.binId}
                  value={JSON.stringify({ gardenId: t.gardenId, binId: t.binId })}
                >
                  {t.label}
                </option>
              ))}
            </Select>
          </Field>
        </div>
      ) : null}
      <Field label="Note (optional)" error={err("note")}>
        <Textarea rows={2} {...register("note")} />
      </Field>
      {warnings.length ? (
        <Alert tone="caution" urgent title="Logged, with a word of caution">
          <ul>
            {warnings.map((w) => (
              <li key={w}>{w}</li>
            ))}
          </ul>
        </Alert>
      ) : null}
      <Button type="submit" pending={formState.isSubmitting}>
        Log it
      </Button>
      {harvestId ? <PhotoUpload key={harvestId} gardenId={gardenId} eventId={harvestId} /> : null}
    </form>
  );
}
