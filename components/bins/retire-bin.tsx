"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button, ConfirmDialog, useToast } from "@/components/ui";
import { apiFetch, ApiError } from "@/lib/api-client";
import { queryKeys } from "@/lib/query-keys";

/** Retiring keeps the bin's log and lots; the forecast stops at today. */
export function RetireBin({
  gardenId,
  binId,
  name,
}: {
  gardenId: string;
  binId: string;
  name: string;
}) {
  const [open, setOpen] = useState(false);
  const [pending, setPending] = useState(false);
  const router = useRouter();
  const toast = useToast();
  const queryClient = useQueryClient();
  return (
    <>
      <Button variant="secondary" onClick={() => setOpen(true)}>
        Retire this bin
      </Button>
      <ConfirmDialog
        open={open}
        title={`Retire ${name}?`}
        confirmLabel="Retire bin"
        pending={pending}
        onCancel={() => setOpen(false)}
        onConfirm={async () => {
          setPending(true);
          try {
            await apiFetch(`/api/gardens/${gardenId}/bins/${binId}`, { method: "DELETE" });
            await queryClient.invalidateQueries({ queryKey: queryKeys.bins(gardenId) });
            await queryClient.invalidateQueries({ queryKey: queryKeys.plan(gardenId) });
            toast.show({ title: `${name} retired.`, tone: "positive" });
            router.push(`/g/${gardenId}/bins/${binId}`);
            router.refresh();
          } catch (error) {
            toast.show({
              title: error instanceof ApiError ? error.message : "Could not retire the bin.",
              tone: "danger",
            });
          } finally {
            setPending(false);
            setOpen(false);
          }
        }}
      >
        Its log and stock stay; Castline stops forecasting it from today.
      </ConfirmDialog>
    </>
  );
}
