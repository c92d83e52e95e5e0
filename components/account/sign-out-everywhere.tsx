"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button, ConfirmDialog } from "@/components/ui";
import { apiFetch } from "@/lib/api-client";

export function SignOutEverywhere() {
  const router = useRouter();
  const [open, setOpen] = useState(false);
  const [pending, setPending] = useState(false);
  return (
    <>
      <Button variant="secondary" onClick={() => setOpen(true)}>
        Sign out everywhere
      </Button>
      <ConfirmDialog
        open={open}
        title="Sign out on every device?"
        confirmLabel="Sign out everywhere"
        tone="danger"
        pending={pending}
        onCancel={() => setOpen(false)}
        onConfirm={async () => {
          setPending(true);
          await apiFetch("/api/session/everywhere", { method: "POST" }).catch(() => undefined);
          router.replace("/sign-in");
          router.refresh();
        }}
      >
        Phones, tablets and this browser all need to sign in again.
      </ConfirmDialog>
    </>
  );
}
