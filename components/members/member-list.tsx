"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
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
        {data.members.map((m) => (
          <li key={m.userId} className="flex flex-wrap items-center gap-3 py-3">
            <span className="flex flex-col">
              <span className="font-semibold">
                {m.name}{" "}
                {m.userId === meId ? <span className="text-sm font-normal">(you)</span> : null}
              </span>
              <span className="text-sm text-soil-700">{m.email}</span>
            </span>
            <span className="ml-auto flex flex-wrap items-center gap-2">
              {canManage ? (
                <Select
                  aria-label={`Role of ${m.name}`}
                  value={m.role}
                  disabled={changeRole.isPending}
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
              {canManage || m.userId === meId ? (
                <Button size="sm" variant="ghost" onClick={() => setRemoving(m)}>
                  {m.userId === meId ? "Leave" : "Remove"}
                </Button>
              ) : null}
            </span>
          </li>
        ))}
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
