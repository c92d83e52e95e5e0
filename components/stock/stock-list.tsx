"use client";

import { useQuery, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { FormMessage } from "@/components/forms/form-message";
import { Badge, Button, Input, Select, Skeleton, useToast, type BadgeTone } from "@/components/ui";
import { apiFetch, ApiError } from "@/lib/api-client";
import { formatDay } from "@/lib/format";
import { formatAmount } from "@/lib/format-quantity";
import { queryKeys } from "@/lib/query-keys";
import { toSi, type UnitSystem } from "@/lib/units";

// Every lot on the shelf with its age and shelf-life status; growers take
// stock out with a reason (never below zero: the server checks).

export interface StockLot {
  id: string;
  material: "castings" | "leachate";
  producedOn: string;
  initialSi: number;
  remainingSi: number;
  ageDays: number;
  limitDays: number;
  status: "fresh" | "use-soon" | "aged-out" | "used-up";
  origin: "bin-log" | "entered";
  binName: string | null;
  manureFeedstock: boolean;
}

const statusLook: Record<StockLot["status"], { label: string; tone: BadgeTone }> = {
  fresh: { label: "Fresh", tone: "positive" },
  "use-soon": { label: "Use soon", tone: "caution" },
  "aged-out": { label: "Past its shelf life", tone: "danger" },
  "used-up": { label: "Used up", tone: "neutral" },
};

const kindOf = (m: StockLot["material"]) => (m === "castings" ? "castings-mass" : "liquid");

export function StockList({
  gardenId,
  system,
  canAdjust,
  initial,
}: {
  gardenId: string;
  system: UnitSystem;
  canAdjust: boolean;
  initial: StockLot[];
}) {
  const { data, isPending } = useQuery({
    queryKey: queryKeys.lots(gardenId),
    queryFn: () =>
      apiFetch<{ lots: StockLot[] }>(`/api/gardens/${gardenId}/lots`).then((r) => r.lots),
    initialData: initial,
  });
  const [showUsed, setShowUsed] = useState(false);
  if (isPending) return <Skeleton className="h-32" />;
  // Used-up and aged-out lots are history: hidden unless asked for, so the shelf reads at a glance.
  const shown = data.filter((l) => showUsed || (l.status !== "used-up" && l.status !== "aged-out"));
  const hidden = data.length - shown.length;
  return (
    <div className="flex flex-col gap-3">
      <label className="flex min-h-11 items-center gap-2">
        <input type="checkbox" checked={showUsed} onChange={(e) => setShowUsed(e.target.checked)} />{" "}
        Show used-up and aged-out lots{hidden && !showUsed ? ` (${hidden} hidden)` : ""}
      </label>
      {shown.length === 0 ? (
        <p className="text-soil-700">
          Nothing on the shelf. Harvests and drains you log land here.
        </p>
      ) : null}
      <ul className="flex flex-col divide-y divide-loam-200">
        {shown.map((lot) => (
          <li key={lot.id} data-testid="stock-lot" className="flex flex-col gap-2 py-3">
            <div className="flex flex-wrap items-center gap-2">
              <strong className="text-lg">
                {formatAmount(lot.remainingSi, kindOf(lot.material), system)} {lot.material}
              </strong>
              <Badge tone={statusLook[lot.status].tone}>{statusLook[lot.status].label}</Badge>
              {lot.manureFeedstock ? <Badge tone="caution">Manure-fed</Badge> : null}
            </div>
            <p className="text-soil-700">
              {lot.origin === "bin-log"
                ? `From ${lot.binName ?? "a bin"}`
                : "Bought or entered by hand"}
              , {formatDay(lot.producedOn, { month: "short", day: "numeric", year: "numeric" })} ·{" "}
              {lot.ageDays} days old (keeps {lot.limitDays}) · of{" "}
              {formatAmount(lot.initialSi, kindOf(lot.material), system)}
            </p>
            {canAdjust && lot.remainingSi > 0 ? (
              <details>
                <summary className="min-h-11 cursor-pointer font-semibold text-leaf-800">
                  Take some out
                </summary>
                <AdjustLot gardenId={gardenId} lot={lot} system={system} />
              </details>
            ) : null}
          </li>
        ))}
      </ul>
    </div>
  );
}

function AdjustLot({
  gardenId,
  lot,
  system,
}: {
  gardenId: string;
  lot: StockLot;
  system: UnitSystem;
}) {
  const unit =
    lot.material === "castings" ? (system === "us" ? "lb" : "kg") : system === "us" ? "gal" : "L";
  const [amount, setAmount] = useState("");
  const [reason, setReason] = useState("spilled");
  const [error, setError] = useState<string | null>(null);
  const [pending, setPending] = useState(false);
  const queryClient = useQueryClient();
  const toast = useToast();
  return (
    <form
      className="flex flex-wrap items-end gap-2"
      aria-label={`Take stock out of the ${lot.material} lot of ${lot.producedOn}`}
      onSubmit={async (e) => {
        e.preventDefault();
        setError(null);
        setPending(true);
        try {
          await apiFetch(`/api/gardens/${gardenId}/lots/${lot.id}`, {
            method: "PATCH",
            body: { reason, removeSi: toSi(Number(amount), unit) },
          });
          setAmount("");
          toast.show({ title: "Stock updated.", tone: "positive" });
          await queryClient.invalidateQueries({ queryKey: queryKeys.lots(gardenId) });
          await queryClient.invalidateQueries({ queryKey: queryKeys.plan(gardenId) });
        } catch (err) {
          setError(
            err instanceof ApiError
              ? (Object.values(err.fields ?? {})[0] ?? err.message)
              : "Could not save.",
          );
        } finally {
          setPending(false);
        }
      }}
    >
      <label className="flex flex-col gap-1 text-sm font-semibold">
        Take out ({unit})
        <Input
          className="w-28"
          type="number"
          inputMode="decimal"
          step="any"
          min={0}
          value={amount}
          onChange={(e) => setAmount(e.target.value)}
        />
      </label>
      <label className="flex flex-col gap-1 text-sm font-semibold">
        Why
        <Select value={reason} onChange={(e) => setReason(e.target.value)}>
          <option value="spilled">Spilled</option>
          <option value="given-away">Given away</option>
          <option value="spoiled">Spoiled</option>
          <option value="correction">Recount</option>
        </Select>
      </label>
      <Button type="submit" variant="secondary" pending={pending}>
        Update
      </Button>
      <div className="w-full">
        <FormMessage message={error} />
      </div>
    </form>
  );
}
