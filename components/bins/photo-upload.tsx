"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { Alert, Button } from "@/components/ui";
import { queryKeys } from "@/lib/query-keys";

// A photo for a log entry that is already saved: if storage is down the
// entry stays and this form can simply be sent again.

export function PhotoUpload({ gardenId, eventId }: { gardenId: string; eventId: string }) {
  const [file, setFile] = useState<File | null>(null);
  const [state, setState] = useState<"idle" | "sending" | "done">("idle");
  const [error, setError] = useState<string | null>(null);
  const queryClient = useQueryClient();
  async function send() {
    if (!file) return;
    setState("sending");
    setError(null);
    const form = new FormData();
    form.set("file", file);
    form.set("eventId", eventId);
    try {
      const res = await fetch(`/api/gardens/${gardenId}/photos`, { method: "POST", body: form });
      if (!res.ok) {
        const body = (await res.json().catch(() => ({}))) as {
          error?: { message?: string; fields?: Record<string, string> };
        };
        throw new Error(
          body.error?.fields?.file
            ? `The photo ${body.error.fields.file}.`
            : (body.error?.message ?? "The photo was not saved."),
        );
      }
      setState("done");
      // The log shows the entry's photos.
      await queryClient.invalidateQueries({ queryKey: queryKeys.bins(gardenId) });
    } catch (e) {
      setError(e instanceof Error ? e.message : "The photo was not saved.");
      setState("idle");
    }
  }
  if (state === "done")
    return <p className="font-semibold text-leaf-800">Photo added to the harvest.</p>;
  return (
    <div className="flex flex-col gap-2 rounded-card border border-loam-200 p-3">
      <label className="flex flex-col gap-1.5 font-semibold">
        Add a photo of this harvest (optional, up to 10 MB)
        <input
          type="file"
          accept="image/*"
          capture="environment"
          onChange={(e) => setFile(e.target.files?.[0] ?? null)}
        />
      </label>
      {error ? (
        <Alert tone="danger" urgent>
          {error} The harvest itself is logged.
        </Alert>
      ) : null}
      <Button
        type="button"
        variant="secondary"
        disabled={!file}
        pending={state === "sending"}
        onClick={send}
      >
        {error ? "Try the photo again" : "Upload photo"}
      </Button>
    </div>
  );
}
