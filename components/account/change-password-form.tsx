"use client";

import { FormMessage } from "@/components/forms/form-message";
import { useApiForm } from "@/components/forms/use-api-form";
import { Button, Field, Input, useToast } from "@/components/ui";
import { apiFetch } from "@/lib/api-client";
import { changePasswordSchema } from "@/lib/validation/auth";

export function ChangePasswordForm() {
  const toast = useToast();
  const { form, formError, submit } = useApiForm(changePasswordSchema, {
    currentPassword: "",
    newPassword: "",
  });
  const { register, formState } = form;
  const onSubmit = submit(async (values) => {
    await apiFetch("/api/account/password", { body: values });
    form.reset();
    toast.show({ title: "Password changed. Other devices are signed out.", tone: "positive" });
  });
  return (
    <form
      onSubmit={onSubmit}
      noValidate
      className="flex flex-col gap-4"
      aria-label="Change password"
    >
      <FormMessage message={formError} />
      <Field label="Current password" error={formState.errors.currentPassword?.message}>
        <Input type="password" autoComplete="current-password" {...register("currentPassword")} />
      </Field>
      <Field
        label="New password"
        hint="At least 8 characters."
        error={formState.errors.newPassword?.message}
      >
        <Input type="password" autoComplete="new-password" {...register("newPassword")} />
      </Field>
      <Button type="submit" pending={formState.isSubmitting}>
        Change password
      </Button>
    </form>
  );
}
