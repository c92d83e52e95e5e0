import type { Metadata } from "next";
import Link from "next/link";
import { ResetPasswordForm } from "@/components/auth/reset-password-form";
import { Alert, Card, CardBody } from "@/components/ui";

export const metadata: Metadata = { title: "Choose a new password" };

export default async function ResetPasswordPage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | string[]>>;
}) {
  const raw = (await searchParams).token;
  const token = Array.isArray(raw) ? raw[0] : raw;
  return (
    <>
      <h1 className="text-3xl">Choose a new password</h1>
      {token ? (
        <Card>
          <CardBody>
            <ResetPasswordForm token={token} />
          </CardBody>
        </Card>
      ) : (
        <Alert tone="danger">
          This page needs the link from your e-mail.{" "}
          <Link className="underline" href="/forgot-password">
            Ask for a new link
          </Link>
        </Alert>
      )}
    </>
  );
}
