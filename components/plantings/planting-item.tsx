"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Badge, Button, useToast } from "@/components/ui";
import { apiFetch, ApiError } from "@/lib/api-client";
import { queryKeys } from "@/lib/query-keys";
import type { UnitSystem } from "@/lib/units";
import { PlantingRulesForm, type RuleItem } from "./planting-rules-form";

export interface PlantingView {
  id: string;
  title: string;
  dates: string;
  priority: "high" | "normal" | "low";
  plantedOn: string;
  ruleSource: "planting" | "crop" | "default";
  /** Every rule in use, in order: plain words and the form's fields. */
  rules: RuleItem[];
}

const SOURCE_WORDS = {
  planting: "this planting's own feedings",
  crop: "the crop's feedings for this garden",
  default: "feeder-class default, common practice",
};

/** One planting: what it is, how it is fed; growers can change or reset its feedings, or remove it. */
export function PlantingItem({
  gardenId,
  planting,
  canEdit,
  today,
  unitSystem,
  rateCut,
}: {
  gardenId: string;
  planting: PlantingView;
  canEdit: boolean;
  today: string;
  unitSystem: UnitSystem;
  /** The Balance's rate-cut link: open the editor on every rule reduced (not saved). */
  rateCut?: { percent: number; rules: RuleItem[] };
}) {
  const router = useRouter();
  const toast = useToast();
  const queryClient = useQueryClient();
  const [editing, setEditing] = useState(Boolean(rateCut && canEdit));
  const [confirming, setConfirming] = useState(false);
  const [busy, setBusy] = useState(false);
  const url = `/api/gardens/${gardenId}/plantings/${planting.id}`;

  async function act(init: { method: string; body?: unknown }, done: string) {
    setBusy(true);
    try {
      await apiFetch(url, init);
      await queryClient.invalidateQueries({ queryKey: queryKeys.plan(gardenId) });
      toast.show({ title: done, tone: "positive" });
      router.refresh();
    } catch (e) {
      toast.show({
        title: e instanceof ApiError ? e.message : "That did not work.",
        tone: "danger",
      });
    } finally {
      setBusy(false);
      setConfirming(false);
    }
  }

  return (
    <li className="flex flex-col gap-2 rounded-card border border-loam-300 bg-white p-4">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h3 className="text-lg font-semibold">{planting.title}</h3>
        {planting.priority !== "normal" ? (
          <Badge tone={planting.priority === "high" ? "positive" : "neutral"}>
            {planting.priority === "high" ? "High priority" : "Low priority"}
          </Badge>
        ) : null}
      </div>
      <p className="text-sm text-soil-700">{planting.dates}</p>
      {/* While editing, the form lists the same rules: once is enough. */}
      <div hidden={editing}>
        <p>
          <strong>Fed:</strong>{" "}
          <span className="text-sm text-soil-700">({SOURCE_WORDS[planting.ruleSource]})</span>
        </p>
        <ul className="list-disc pl-5">
          {planting.rules.map((r, i) => (
            <li key={i}>{r.words}</li>
          ))}
        </ul>
      </div>
      {canEdit && !editing ? (
        <div className="flex flex-wrap gap-2">
          <Button variant="secondary" size="sm" onClick={() => setEditing(true)}>
            Change feedings
          </Button>
          {planting.ruleSource === "planting" ? (
            <Button
              variant="ghost"
              size="sm"
              pending={busy}
              onClick={() =>
                act({ method: "PATCH", body: { rules: [] } }, "Back to the crop's feedings.")
              }
            >
              Use the crop&apos;s feedings
            </Button>
          ) : null}
          {confirming ? (
            <Button
              variant="danger"
              size="sm"
              pending={busy}
              onClick={() =>
                act({ method: "DELETE" }, "Planting removed (or ended, if it has logged feedings).")
              }
            >
              Yes, remove {planting.title}
            </Button>
          ) : (
            <Button variant="ghost" size="sm" onClick={() => setConfirming(true)}>
              Remove…
            </Button>
          )}
        </div>
      ) : null}
      {editing ? (
        <PlantingRulesForm
          gardenId={gardenId}
          saveUrl={url}
          plantedOn={planting.plantedOn}
          today={today}
          unitSystem={unitSystem}
          initial={rateCut?.rules ?? planting.rules}
          note={
            rateCut
              ? `Every amount cut by ${rateCut.percent} %, as the Balance suggests. Not saved until you press Save feedings.`
              : undefined
          }
          onDone={() => setEditing(false)}
        />
      ) : null}
    </li>
  );
}
