"use client";

import Link from "next/link";
import { useState } from "react";
import { FormMessage } from "@/components/forms/form-message";
import { useApiForm } from "@/components/forms/use-api-form";
import { Alert, Button, Field, inlineLinkStyles, Input } from "@/components/ui";
import { apiFetch } from "@/lib/api-client";
import { confirmResetSchema } from "@/lib/validation/auth";

export function ResetPasswordForm({ token }: { token: string }) {
  const [done, setDone] = useState<string | null>(null);
  const { form, formError, submit } = useApiForm(confirmResetSchema, { token, newPassword: "" });
  const { register, formState } = form;

  const onSubmit = submit(async (values) => {
    const result = await apiFetch<{ message: string }>("/api/password-reset/confirm", {
      body: values,
    });
    setDone(result.message);
  });

  if (done) {
    return (
      <Alert tone="info">
        {done}{" "}
        <Link className={inlineLinkStyles} href="/sign-in">
          Sign in
        </Link>
      </Alert>
    );
  }
  return (
    <form
      onSubmit={onSubmit}
      noValidate
      className="flex flex-col gap-4"
      aria-label="Choose a new password"
    >
      <FormMessage message={formError ?? formState.errors.token?.message ?? null} />
      <input type="hidden" {...register("token")} />
      <Field
        label="New password"
        hint="At least 8 characters."
        error={formState.errors.newPassword?.message}
      >
        <Input type="password" autoComplete="new-password" {...register("newPassword")} />
      </Field>
      <Button type="submit" pending={formState.isSubmitting}>
        Save new password
      </Button>
    </form>
  );
}
