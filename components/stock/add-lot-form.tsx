"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { FormMessage } from "@/components/forms/form-message";
import { Button, Field, Input, Select, useToast } from "@/components/ui";
import { apiFetch, ApiError } from "@/lib/api-client";
import { queryKeys } from "@/lib/query-keys";
import { toSi, type UnitSystem } from "@/lib/units";

/** A bought bag of castings, or stock already on hand. No manure flag unless the grower says so. */
export function AddLotForm({
  gardenId,
  system,
  today,
}: {
  gardenId: string;
  system: UnitSystem;
  today: string;
}) {
  const [material, setMaterial] = useState<"castings" | "leachate">("castings");
  const [reason, setReason] = useState<"bought" | "on-hand">("bought");
  const [amount, setAmount] = useState("");
  const [on, setOn] = useState(today);
  const [manure, setManure] = useState(false);
  const [price, setPrice] = useState("");
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [message, setMessage] = useState<string | null>(null);
  const [pending, setPending] = useState(false);
  const queryClient = useQueryClient();
  const toast = useToast();
  const unit =
    material === "castings" ? (system === "us" ? "lb" : "kg") : system === "us" ? "gal" : "L";
  return (
    <form
      aria-label="Add stock"
      noValidate
      className="flex flex-col gap-3"
      onSubmit={async (e) => {
        e.preventDefault();
        setErrors({});
        setMessage(null);
        setPending(true);
        try {
          await apiFetch(`/api/gardens/${gardenId}/lots`, {
            body: {
              reason,
              material,
              producedOn: on,
              amountSi: toSi(Number(amount), unit),
              manureFeedstock: manure,
            },
          });
          setAmount("");
          toast.show({ title: "Stock added.", tone: "positive" });
          await queryClient.invalidateQueries({ queryKey: queryKeys.lots(gardenId) });
          await queryClient.invalidateQueries({ queryKey: queryKeys.plan(gardenId) });
        } catch (err) {
          if (err instanceof ApiError) {
            setErrors(err.fields ?? {});
            setMessage(err.message);
          } else setMessage("Could not save.");
        } finally {
          setPending(false);
        }
      }}
    >
      <FormMessage message={message} />
      <div className="grid gap-3 sm:grid-cols-4">
        <Field label="Where from">
          <Select value={reason} onChange={(e) => setReason(e.target.value as typeof reason)}>
            <option value="bought">Bought</option>
            <option value="on-hand">Already on hand</option>
          </Select>
        </Field>
        <Field label="What">
          <Select value={material} onChange={(e) => setMaterial(e.target.value as typeof material)}>
            <option value="castings">Castings</option>
            <option value="leachate">Leachate</option>
          </Select>
        </Field>
        <Field label={`Amount (${unit})`} error={errors.amountSi}>
          <Input
            type="number"
            inputMode="decimal"
            step="any"
            min={0}
            value={amount}
            onChange={(e) => setAmount(e.target.value)}
          />
        </Field>
        <Field label="Made or bought on" error={errors.producedOn}>
          <Input type="date" max={today} value={on} onChange={(e) => setOn(e.target.value)} />
        </Field>
      </div>
      {reason === "bought" && material === "castings" ? (
        <Field label={`Price paid per ${unit} (optional)`} error={errors.pricePerKg}>
          <Input
            className="max-w-40"
            type="number"
            inputMode="decimal"
            step="any"
            min={0}
            value={price}
            onChange={(e) => setPrice(e.target.value)}
          />
        </Field>
      ) : null}
      <label className="flex min-h-11 items-center gap-2">
        <input type="checkbox" checked={manure} onChange={(e) => setManure(e.target.checked)} /> The
        seller says it was made with manure
      </label>
      <Button type="submit" pending={pending}>
        Add stock
      </Button>
    </form>
  );
}
