"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useId, useState } from "react";
import { Badge, Button, ConfirmDialog, Select, useToast } from "@/components/ui";
import { apiFetch, ApiError } from "@/lib/api-client";
import { roleLabels, roles, type Role } from "@/lib/auth/roles";
import { queryKeys } from "@/lib/query-keys";

type Member = { userId: string; name: string; email: string; role: Role };

export function MemberList({
  gardenId,
  gardenName,
  meId,
  canManage,
  initial,
}: {
  gardenId: string;
  gardenName: string;
  meId: string;
  canManage: boolean;
  initial: Member[];
}) {
  const toast = useToast();
  const router = useRouter();
  const queryClient = useQueryClient();
  const key = queryKeys.members(gardenId);
  const [removing, setRemoving] = useState<Member | null>(null);
  const { data } = useQuery({
    queryKey: key,
    queryFn: () => apiFetch<{ members: Member[] }>(`/api/gardens/${gardenId}/members`),
    initialData: { members: initial },
  });
  const reasonId = useId();
  // The server refuses to leave a garden without an owner (409 conflict:last_owner), so
  // the only owner is not offered leaving or stepping down; the reason sits beside them.
  const onlyOwner =
    data.members.filter((m) => m.role === "owner").length === 1 &&
    data.members.some((m) => m.userId === meId && m.role === "owner");
  const onError = (e: unknown) =>
    toast.show({ title: e instanceof ApiError ? e.message : "That did not work.", tone: "danger" });

  const changeRole = useMutation({
    mutationFn: ({ userId, role }: { userId: string; role: Role }) =>
      apiFetch(`/api/gardens/${gardenId}/members/${userId}`, { method: "PATCH", body: { role } }),
    onSuccess: () => {
      toast.show({ title: "Role changed.", tone: "positive" });
      return queryClient.invalidateQueries({ queryKey: key });
    },
    onError: (e) => {
      onError(e);
      return queryClient.invalidateQueries({ queryKey: key });
    },
  });
  const remove = useMutation({
    mutationFn: (userId: string) =>
      apiFetch(`/api/gardens/${gardenId}/members/${userId}`, { method: "DELETE" }),
    onSuccess: (_r, userId) => {
      setRemoving(null);
      if (userId === meId) {
        router.replace("/gardens");
        router.refresh();
        return;
      }
      toast.show({ title: "Member removed." });
      return queryClient.invalidateQueries({ queryKey: key });
    },
    onError: (e) => {
      setRemoving(null);
      onError(e);
    },
  });

  return (
    <>
      <ul className="flex flex-col divide-y divide-loam-200">
        {data.members.map((m) => {
          const mine = m.userId === meId;
          const locked = mine && onlyOwner;
          const describedBy = locked ? reasonId : undefined;
          return (
            <li key={m.userId} className="flex flex-wrap items-center gap-3 py-3">
              <span className="flex min-w-0 flex-col">
                <span className="font-semibold">
                  {m.name} {mine ? <span className="text-sm font-normal">(you)</span> : null}
                </span>
                <span className="text-sm break-all text-soil-700">{m.email}</span>
              </span>
              <span className="ml-auto flex flex-wrap items-center gap-2">
                {canManage ? (
                  <Select
                    aria-label={`Role of ${m.name}`}
                    aria-describedby={describedBy}
                    value={m.role}
                    disabled={changeRole.isPending || locked}
                    onChange={(e) =>
                      changeRole.mutate({ userId: m.userId, role: e.target.value as Role })
                    }
                  >
                    {[...roles].reverse().map((r) => (
                      <option key={r} value={r}>
                        {roleLabels[r]}
                      </option>
                    ))}
                  </Select>
                ) : (
                  <Badge>{roleLabels[m.role]}</Badge>
                )}
                {canManage || mine ? (
                  <Button
                    size="sm"
                    variant="ghost"
                    disabled={locked}
                    aria-describedby={describedBy}
                    onClick={() => setRemoving(m)}
                  >
                    {mine ? "Leave" : "Remove"}
                  </Button>
                ) : null}
              </span>
              {locked ? (
                <p id={reasonId} className="basis-full text-sm text-soil-700">
                  You are the only owner, so you cannot leave or change your own role. Make someone
                  else an owner first.
                </p>
              ) : null}
            </li>
          );
        })}
      </ul>
      <ConfirmDialog
        open={removing !== null}
        title={
          removing?.userId === meId ? `Leave ${gardenName}?` : `Remove ${removing?.name ?? ""}?`
        }
        confirmLabel={removing?.userId === meId ? "Leave garden" : "Remove member"}
        pending={remove.isPending}
        onCancel={() => setRemoving(null)}
        onConfirm={() => removing && remove.mutate(removing.userId)}
      >
        {removing?.userId === meId
          ? "You will lose access until someone invites you again."
          : "They lose access to this garden's plan and logs. Their past log entries stay."}
      </ConfirmDialog>
    </>
  );
}
