"use client";

import { useState } from "react";
import { FormMessage } from "@/components/forms/form-message";
import { useApiForm } from "@/components/forms/use-api-form";
import { Alert, Button, Field, Input } from "@/components/ui";
import { apiFetch } from "@/lib/api-client";
import { requestResetSchema } from "@/lib/validation/auth";

export function ForgotPasswordForm() {
  const [done, setDone] = useState<string | null>(null);
  const { form, formError, submit } = useApiForm(requestResetSchema, { email: "" });
  const { register, formState } = form;

  const onSubmit = submit(async (values) => {
    const result = await apiFetch<{ message: string }>("/api/password-reset", { body: values });
    setDone(result.message);
  });

  if (done) return <Alert tone="info">{done}</Alert>;
  return (
    <form
      onSubmit={onSubmit}
      noValidate
      className="flex flex-col gap-4"
      aria-label="Reset password"
    >
      <FormMessage message={formError} />
      <Field label="E-mail" error={formState.errors.email?.message}>
        <Input type="email" autoComplete="email" inputMode="email" {...register("email")} />
      </Field>
      <Button type="submit" pending={formState.isSubmitting}>
        Send me a link
      </Button>
    </form>
  );
}
