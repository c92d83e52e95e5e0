"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button, ConfirmDialog, useToast } from "@/components/ui";
import { apiFetch, ApiError } from "@/lib/api-client";
import { queryKeys } from "@/lib/query-keys";
import type { UnitSystem } from "@/lib/units";
import { BedForm, type EditableBed } from "./bed-form";

/**
 * A grower's controls on the bed page: edit its size and notes, or take it out
 * of the plan. The API removes a bed nothing logged refers to and archives one
 * with logged feedings (kept for the record); neither can be undone through it,
 * so the confirm says which will happen.
 */
export function BedActions({
  gardenId,
  bed,
  unitSystem,
  hasLog,
}: {
  gardenId: string;
  bed: EditableBed;
  unitSystem: UnitSystem;
  /** Some planting here has logged feedings: the bed is archived, not removed. */
  hasLog: boolean;
}) {
  const router = useRouter();
  const toast = useToast();
  const queryClient = useQueryClient();
  const [editing, setEditing] = useState(false);
  const [confirming, setConfirming] = useState(false);
  const [busy, setBusy] = useState(false);
  const what = bed.kind === "bed" ? "bed" : "container";

  async function takeOut() {
    setBusy(true);
    try {
      const result = await apiFetch<{ removed?: true; archivedOn?: string }>(
        `/api/gardens/${gardenId}/beds/${bed.id}`,
        { method: "DELETE" },
      );
      await queryClient.invalidateQueries({ queryKey: queryKeys.plan(gardenId) });
      await queryClient.invalidateQueries({ queryKey: queryKeys.beds(gardenId) });
      toast.show({
        title: result.removed
          ? `${bed.name} removed.`
          : `${bed.name} archived: kept with its log, out of the plan.`,
        tone: "positive",
      });
      router.push(`/g/${gardenId}/beds`);
    } catch (e) {
      toast.show({
        title: e instanceof ApiError ? e.message : "That did not work.",
        tone: "danger",
      });
      setBusy(false);
      setConfirming(false);
    }
  }

  if (editing)
    return (
      <BedForm
        gardenId={gardenId}
        unitSystem={unitSystem}
        bed={bed}
        onDone={() => setEditing(false)}
      />
    );
  return (
    <div className="flex flex-wrap gap-2">
      <Button variant="secondary" size="sm" onClick={() => setEditing(true)}>
        Edit {what}
      </Button>
      <Button variant="ghost" size="sm" onClick={() => setConfirming(true)}>
        {hasLog ? `Archive ${what}…` : `Remove ${what}…`}
      </Button>
      <ConfirmDialog
        open={confirming}
        onCancel={() => setConfirming(false)}
        onConfirm={takeOut}
        pending={busy}
        title={hasLog ? `Archive ${bed.name}?` : `Remove ${bed.name}?`}
        confirmLabel={hasLog ? `Archive ${what}` : `Remove ${what}`}
      >
        {hasLog
          ? `Its plantings have logged feedings, so it is kept for the record: what still grows in it ends today and the plan stops feeding it. This cannot be undone here.`
          : `Nothing logged refers to it, so it is removed with its plantings and their own rules. This cannot be undone.`}
      </ConfirmDialog>
    </div>
  );
}
