import type { Metadata } from "next";
import Link from "next/link";
import { ResetPasswordForm } from "@/components/auth/reset-password-form";
import { Alert, Card, CardBody, inlineLinkStyles } from "@/components/ui";
import { getPasswordResetStatus } from "@/db/queries/password-resets";
import { hashLinkToken } from "@/lib/auth/tokens";
import { resetProblems } from "@/lib/messages";

export const metadata: Metadata = { title: "Choose a new password" };
export const dynamic = "force-dynamic";

export default async function ResetPasswordPage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | string[]>>;
}) {
  const raw = (await searchParams).token;
  const token = Array.isArray(raw) ? raw[0] : raw;
  // An old or used link gets a plain explanation up front, not a form that fails on submit.
  const status =
    token && token.length >= 20 && token.length <= 200
      ? await getPasswordResetStatus({ tokenHash: hashLinkToken(token) })
      : "invalid";
  return (
    <>
      <h1 className="text-3xl">Choose a new password</h1>
      {token && status === "ok" ? (
        <Card>
          <CardBody>
            <ResetPasswordForm token={token} />
          </CardBody>
        </Card>
      ) : (
        <Alert tone="danger">
          {token && status !== "ok"
            ? resetProblems[status]
            : "This page needs the link from your e-mail."}{" "}
          <Link className={inlineLinkStyles} href="/forgot-password">
            Ask for a new link
          </Link>
        </Alert>
      )}
    </>
  );
}
