"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button, useToast } from "@/components/ui";
import { RuleEditor } from "@/components/plantings/rule-editor";
import { apiFetch, ApiError } from "@/lib/api-client";
import type { RuleFormValues } from "@/lib/plantings/rule-form-values";
import { queryKeys } from "@/lib/query-keys";
import type { UnitSystem } from "@/lib/units";

export interface CropView {
  id: string;
  name: string;
  facts: string;
  ruleWords: string;
  ruleSource: "crop" | "default";
  ruleValues: RuleFormValues;
}

/** One crop of the garden's list; growers change its default feeding for this garden. */
export function CropItem({
  gardenId,
  crop,
  canEdit,
  today,
  unitSystem,
}: {
  gardenId: string;
  crop: CropView;
  canEdit: boolean;
  today: string;
  unitSystem: UnitSystem;
}) {
  const router = useRouter();
  const toast = useToast();
  const queryClient = useQueryClient();
  const [editing, setEditing] = useState(false);
  const url = `/api/gardens/${gardenId}/crops/${crop.id}`;

  async function useDefault() {
    try {
      await apiFetch(url, { method: "PATCH", body: { rule: null } });
      await queryClient.invalidateQueries({ queryKey: queryKeys.plan(gardenId) });
      toast.show({ title: `${crop.name}: back to the feeder-class default.`, tone: "positive" });
      router.refresh();
    } catch (e) {
      toast.show({
        title: e instanceof ApiError ? e.message : "That did not work.",
        tone: "danger",
      });
    }
  }

  return (
    <li className="flex flex-col gap-2 rounded-card border border-loam-300 bg-white p-4">
      <h3 className="text-lg font-semibold">{crop.name}</h3>
      <p className="text-sm text-soil-700">{crop.facts}</p>
      <p>
        <strong>Fed:</strong> {crop.ruleWords}{" "}
        <span className="text-sm text-soil-700">
          (
          {crop.ruleSource === "crop"
            ? "this garden's rule"
            : "feeder-class default, common practice"}
          )
        </span>
      </p>
      {canEdit && !editing ? (
        <div className="flex flex-wrap gap-2">
          <Button variant="secondary" size="sm" onClick={() => setEditing(true)}>
            Change default feeding
          </Button>
          {crop.ruleSource === "crop" ? (
            <Button variant="ghost" size="sm" onClick={useDefault}>
              Use the feeder-class default
            </Button>
          ) : null}
        </div>
      ) : null}
      {editing ? (
        <RuleEditor
          gardenId={gardenId}
          saveUrl={url}
          plantedOn={today}
          today={today}
          unitSystem={unitSystem}
          initial={crop.ruleValues}
          onDone={() => setEditing(false)}
        />
      ) : null}
    </li>
  );
}
