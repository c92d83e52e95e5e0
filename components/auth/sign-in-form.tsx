"use client";

import Link from "next/link";
import { useRouter } from "next/navigation";
import { FormMessage } from "@/components/forms/form-message";
import { useApiForm } from "@/components/forms/use-api-form";
import { Button, Field, Input, textLinkStyles } from "@/components/ui";
import { apiFetch } from "@/lib/api-client";
import { safeNextPath } from "@/lib/safe-next";
import { signInSchema } from "@/lib/validation/auth";

export function SignInForm({ next }: { next: string }) {
  const router = useRouter();
  const { form, formError, submit } = useApiForm(signInSchema, { email: "", password: "" });
  const { register, formState } = form;

  const onSubmit = submit(async (values) => {
    await apiFetch("/api/session", { body: values });
    // Checked again here: this is the line that navigates.
    router.replace(safeNextPath(next));
    router.refresh();
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4" aria-label="Sign in">
      <FormMessage message={formError} />
      <Field label="E-mail" error={formState.errors.email?.message}>
        <Input type="email" autoComplete="email" inputMode="email" {...register("email")} />
      </Field>
      <Field label="Password" error={formState.errors.password?.message}>
        <Input type="password" autoComplete="current-password" {...register("password")} />
      </Field>
      <Button type="submit" pending={formState.isSubmitting}>
        Sign in
      </Button>
      {/* Each link is its own 44 px tall target (WCAG 2.2 SC 2.5.8 asks 24 px at least). */}
      <p className="flex flex-wrap items-center gap-x-4 text-sm text-soil-700">
        <Link className={textLinkStyles} href="/forgot-password">
          Forgot your password?
        </Link>
        <span>
          New here?{" "}
          <Link className={textLinkStyles} href={`/sign-up?next=${encodeURIComponent(next)}`}>
            Make an account
          </Link>
        </span>
      </p>
    </form>
  );
}
