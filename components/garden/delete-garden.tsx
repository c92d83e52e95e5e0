"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button, ConfirmDialog, useToast } from "@/components/ui";
import { apiFetch, ApiError } from "@/lib/api-client";

export function DeleteGarden({ gardenId, gardenName }: { gardenId: string; gardenName: string }) {
  const router = useRouter();
  const toast = useToast();
  const [open, setOpen] = useState(false);
  const [pending, setPending] = useState(false);

  async function confirm() {
    setPending(true);
    try {
      await apiFetch(`/api/gardens/${gardenId}`, {
        method: "DELETE",
        body: { confirmName: gardenName },
      });
      router.replace("/gardens");
      router.refresh();
    } catch (e) {
      toast.show({
        title: e instanceof ApiError ? e.message : "The garden was not deleted.",
        tone: "danger",
      });
      setPending(false);
      setOpen(false);
    }
  }

  return (
    <>
      <Button variant="danger" onClick={() => setOpen(true)}>
        Delete this garden
      </Button>
      <ConfirmDialog
        open={open}
        title={`Delete ${gardenName}?`}
        confirmLabel="Delete for everyone"
        confirmText={gardenName}
        pending={pending}
        onCancel={() => setOpen(false)}
        onConfirm={confirm}
      >
        This removes its beds, plantings, bins, stock and logs for every member. It cannot be
        undone.
      </ConfirmDialog>
    </>
  );
}
