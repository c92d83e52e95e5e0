"use client";

import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { FormMessage } from "@/components/forms/form-message";
import { useApiForm } from "@/components/forms/use-api-form";
import { Alert, Button, Field, Input, textLinkStyles } from "@/components/ui";
import { apiFetch } from "@/lib/api-client";
import { safeNextPath } from "@/lib/safe-next";
import { signUpSchema } from "@/lib/validation/auth";
import { PASSWORD_MIN } from "@/lib/validation/password";

export function SignUpForm({ next }: { next: string }) {
  const router = useRouter();
  const [done, setDone] = useState<string | null>(null);
  const { form, formError, submit } = useApiForm(signUpSchema, {
    name: "",
    email: "",
    password: "",
  });
  const { register, formState } = form;

  // The answer is the same whether or not the address already had an account (so the
  // form cannot be used to find out). A new address is signed in at once; a known one
  // gets an e-mail instead, and this form says so.
  const onSubmit = submit(async (values) => {
    const result = await apiFetch<{ message: string }>("/api/account", { body: values });
    const signedIn = await fetch("/api/account", { credentials: "same-origin" });
    if (signedIn.ok) {
      // Checked again here: this is the line that navigates.
      router.replace(safeNextPath(next));
      router.refresh();
    } else {
      setDone(result.message);
    }
  });

  if (done) return <Alert tone="info">{done}</Alert>;

  return (
    <form
      onSubmit={onSubmit}
      noValidate
      className="flex flex-col gap-4"
      aria-label="Make an account"
    >
      <FormMessage message={formError} />
      <Field label="Your name" error={formState.errors.name?.message}>
        <Input autoComplete="name" {...register("name")} />
      </Field>
      <Field label="E-mail" error={formState.errors.email?.message}>
        <Input type="email" autoComplete="email" inputMode="email" {...register("email")} />
      </Field>
      <Field
        label="Password"
        hint={`At least ${PASSWORD_MIN} characters. A few unrelated words make a strong one; pasting from a password manager is fine.`}
        error={formState.errors.password?.message}
      >
        <Input type="password" autoComplete="new-password" {...register("password")} />
      </Field>
      <Button type="submit" pending={formState.isSubmitting}>
        Make my account
      </Button>
      <p className="text-sm text-soil-700">
        Already have one?{" "}
        <Link className={textLinkStyles} href={`/sign-in?next=${encodeURIComponent(next)}`}>
          Sign in
        </Link>
      </p>
    </form>
  );
}
