"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { FormMessage } from "@/components/forms/form-message";
import { useApiForm } from "@/components/forms/use-api-form";
import { Alert, Button, Field, Input, Select, useToast } from "@/components/ui";
import { apiFetch, ApiError } from "@/lib/api-client";
import { roleDescriptions, roleLabels, roles } from "@/lib/auth/roles";
import { queryKeys } from "@/lib/query-keys";
import { inviteSchema } from "@/lib/validation/garden";

export function InviteForm({ gardenId }: { gardenId: string }) {
  const toast = useToast();
  const queryClient = useQueryClient();
  const { form, formError, submit } = useApiForm(inviteSchema, { email: "", role: "helper" });
  const { register, formState } = form;
  // The address the server said already has an open invitation: offered "Resend".
  const [alreadyInvited, setAlreadyInvited] = useState<string | null>(null);
  const [resending, setResending] = useState(false);

  const onSubmit = submit(async (values) => {
    setAlreadyInvited(null);
    try {
      const result = await apiFetch<{ mailSent: boolean; message: string }>(
        `/api/gardens/${gardenId}/invitations`,
        { body: values },
      );
      toast.show({ title: result.message, tone: result.mailSent ? "positive" : "danger" });
      form.reset({ email: "", role: values.role });
      await queryClient.invalidateQueries({ queryKey: queryKeys.invitations(gardenId) });
    } catch (error) {
      if (error instanceof ApiError && error.code === "conflict:already_invited") {
        form.setError("email", { message: error.fields?.email ?? error.message });
        setAlreadyInvited(values.email.trim().toLowerCase());
        return;
      }
      throw error;
    }
  });

  // "Resend" on the invitation already open for that address: the route renews its link
  // and counts against the same per-address mail limit as a new invitation.
  async function resend(email: string) {
    setResending(true);
    try {
      const { invitations } = await apiFetch<{ invitations: { id: string; email: string }[] }>(
        `/api/gardens/${gardenId}/invitations`,
      );
      const open = invitations.find((i) => i.email === email.trim().toLowerCase());
      if (!open) throw new ApiError(404, "not_found", "That invitation is no longer open.");
      const result = await apiFetch<{ mailSent: boolean }>(
        `/api/gardens/${gardenId}/invitations/${open.id}/resend`,
        { method: "POST" },
      );
      toast.show({
        title: result.mailSent
          ? `Invitation sent again to ${open.email}.`
          : "The e-mail still could not be sent.",
        tone: result.mailSent ? "positive" : "danger",
      });
      setAlreadyInvited(null);
      form.reset({ email: "", role: form.getValues("role") });
      await queryClient.invalidateQueries({ queryKey: queryKeys.invitations(gardenId) });
    } catch (e) {
      toast.show({
        title: e instanceof ApiError ? e.message : "That did not work.",
        tone: "danger",
      });
    } finally {
      setResending(false);
    }
  }

  return (
    <form
      onSubmit={onSubmit}
      noValidate
      className="flex flex-col gap-4"
      aria-label="Invite someone"
    >
      <FormMessage message={formError} />
      <div className="grid gap-4 sm:grid-cols-[2fr_1fr]">
        <Field label="Their e-mail" error={formState.errors.email?.message}>
          <Input type="email" inputMode="email" autoComplete="off" {...register("email")} />
        </Field>
        <Field label="Role" error={formState.errors.role?.message}>
          <Select {...register("role")}>
            {[...roles].reverse().map((r) => (
              <option key={r} value={r}>
                {roleLabels[r]}
              </option>
            ))}
          </Select>
        </Field>
      </div>
      {alreadyInvited ? (
        <Alert tone="info">
          <span className="flex flex-wrap items-center gap-3">
            <span>{alreadyInvited} already has an open invitation.</span>
            <Button
              size="sm"
              variant="secondary"
              pending={resending}
              onClick={() => resend(alreadyInvited)}
            >
              Resend invitation
            </Button>
          </span>
        </Alert>
      ) : null}
      <ul className="text-sm text-soil-700">
        {[...roles].reverse().map((r) => (
          <li key={r}>
            <strong>{roleLabels[r]}:</strong> {roleDescriptions[r]}
          </li>
        ))}
      </ul>
      <Button type="submit" pending={formState.isSubmitting}>
        Send invitation
      </Button>
    </form>
  );
}
