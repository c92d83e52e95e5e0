"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { Badge, Button, EmptyState, useToast } from "@/components/ui";
import { apiFetch, ApiError } from "@/lib/api-client";
import { roleLabels, type Role } from "@/lib/auth/roles";
import { formatDateTime } from "@/lib/format";
import { queryKeys } from "@/lib/query-keys";

type Invitation = {
  id: string;
  email: string;
  role: Role;
  expiresAt: string;
  mailStatus: "pending" | "sent" | "failed";
};

export function InvitationList({
  gardenId,
  timeZone,
  initial,
}: {
  gardenId: string;
  /** The garden's zone: the expiry reads as in the invitation e-mail. */
  timeZone: string;
  initial: Invitation[];
}) {
  const toast = useToast();
  const queryClient = useQueryClient();
  const key = queryKeys.invitations(gardenId);
  const { data } = useQuery({
    queryKey: key,
    queryFn: () => apiFetch<{ invitations: Invitation[] }>(`/api/gardens/${gardenId}/invitations`),
    initialData: { invitations: initial },
  });
  const act = useMutation({
    mutationFn: ({
      id,
      action,
    }: {
      id: string;
      action: "resend" | "withdraw";
    }): Promise<{ mailSent?: boolean }> =>
      action === "resend"
        ? apiFetch(`/api/gardens/${gardenId}/invitations/${id}/resend`, { method: "POST" })
        : apiFetch(`/api/gardens/${gardenId}/invitations/${id}`, { method: "DELETE" }),
    onSuccess: (result, { action }) => {
      if (action === "resend") {
        const sent = result.mailSent === true;
        toast.show({
          title: sent ? "Invitation sent again." : "The e-mail still could not be sent.",
          tone: sent ? "positive" : "danger",
        });
      } else toast.show({ title: "Invitation withdrawn." });
      return queryClient.invalidateQueries({ queryKey: key });
    },
    onError: (e) =>
      toast.show({
        title: e instanceof ApiError ? e.message : "That did not work.",
        tone: "danger",
      }),
  });

  if (data.invitations.length === 0) {
    return (
      <EmptyState
        title="No open invitations"
        text="Invitations you send wait here until they are accepted."
      />
    );
  }
  return (
    <ul className="flex flex-col divide-y divide-loam-200">
      {data.invitations.map((inv) => (
        <li key={inv.id} className="flex flex-wrap items-center gap-2 py-3">
          <span className="font-semibold">{inv.email}</span>
          <Badge>{roleLabels[inv.role]}</Badge>
          {inv.mailStatus === "failed" ? <Badge tone="danger">E-mail not sent</Badge> : null}
          <span className="text-sm text-soil-700">
            until {formatDateTime(inv.expiresAt, timeZone)}
          </span>
          <span className="ml-auto flex gap-2">
            <Button
              size="sm"
              variant="secondary"
              pending={
                act.isPending && act.variables?.id === inv.id && act.variables.action === "resend"
              }
              onClick={() => act.mutate({ id: inv.id, action: "resend" })}
            >
              Resend
            </Button>
            <Button
              size="sm"
              variant="ghost"
              onClick={() => act.mutate({ id: inv.id, action: "withdraw" })}
            >
              Withdraw
            </Button>
          </span>
        </li>
      ))}
    </ul>
  );
}
