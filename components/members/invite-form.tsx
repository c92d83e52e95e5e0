"use client";

import { useQueryClient } from "@tanstack/react-query";
import { FormMessage } from "@/components/forms/form-message";
import { useApiForm } from "@/components/forms/use-api-form";
import { Button, Field, Input, Select, useToast } from "@/components/ui";
import { apiFetch } from "@/lib/api-client";
import { roleDescriptions, roleLabels, roles } from "@/lib/auth/roles";
import { queryKeys } from "@/lib/query-keys";
import { inviteSchema } from "@/lib/validation/garden";

export function InviteForm({ gardenId }: { gardenId: string }) {
  const toast = useToast();
  const queryClient = useQueryClient();
  const { form, formError, submit } = useApiForm(inviteSchema, { email: "", role: "helper" });
  const { register, formState } = form;

  const onSubmit = submit(async (values) => {
    const result = await apiFetch<{ mailSent: boolean; message: string }>(
      `/api/gardens/${gardenId}/invitations`,
      {
        body: values,
      },
    );
    toast.show({ title: result.message, tone: result.mailSent ? "positive" : "danger" });
    form.reset({ email: "", role: values.role });
    await queryClient.invalidateQueries({ queryKey: queryKeys.invitations(gardenId) });
  });

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
