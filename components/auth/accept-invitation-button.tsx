"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { FormMessage } from "@/components/forms/form-message";
import { Button } from "@/components/ui";
import { apiFetch, ApiError } from "@/lib/api-client";

export function AcceptInvitationButton({
  token,
  gardenName,
}: {
  token: string;
  gardenName: string;
}) {
  const router = useRouter();
  const [pending, setPending] = useState(false);
  const [error, setError] = useState<string | null>(null);

  async function accept() {
    setPending(true);
    setError(null);
    try {
      const { gardenId } = await apiFetch<{ gardenId: string }>("/api/invitations/accept", {
        body: { token },
      });
      router.replace(`/g/${gardenId}`);
      router.refresh();
    } catch (e) {
      setError(e instanceof ApiError ? e.message : "Could not accept the invitation.");
      setPending(false);
    }
  }

  return (
    <div className="flex flex-col gap-3">
      <FormMessage message={error} />
      <Button onClick={accept} pending={pending}>
        Join {gardenName}
      </Button>
    </div>
  );
}
