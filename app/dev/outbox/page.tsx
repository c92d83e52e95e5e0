import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { Card, CardBody, CardHeader, CardTitle, EmptyState, textLinkStyles } from "@/components/ui";
import { getPageUser } from "@/lib/auth/page-session";
import { isOutboxEnabled, readOutboxFor } from "@/services/mailer";

export const metadata: Metadata = { title: "Local outbox" };
export const dynamic = "force-dynamic";

// Mail caught by the built-in SMTP catcher, for trying invitations and resets on a
// laptop or in the demo. Switched off in production and whenever SMTP_HOST is set (see
// services/mailer.ts). A signed-in person sees only mail to their own address; a
// signed-out visitor sees none.
export default async function OutboxPage() {
  if (!isOutboxEnabled()) notFound();
  const user = await getPageUser();
  const messages = await readOutboxFor(user?.email ?? null);
  return (
    <main className="mx-auto flex max-w-3xl flex-col gap-4 px-4 py-6">
      <h1 className="text-3xl">Local outbox</h1>
      <p className="text-soil-700">
        E-mail sent while no SMTP server is configured lands here instead of anyone&apos;s inbox.
        You see only mail to your own address. Newest first; kept in memory until the server
        restarts.
      </p>
      {!user ? (
        <EmptyState
          title="Sign in to read your mail"
          text="Mail is shown only to the account it was sent to. Invited? Sign up with the invited address first, then come back here."
        />
      ) : messages.length === 0 ? (
        <EmptyState
          title="No mail for you yet"
          text={`Nothing addressed to ${user.email} so far. Reload this page after an invitation or reset is sent.`}
        />
      ) : (
        messages.map((m) => (
          <Card key={m.id} data-testid="outbox-message">
            <CardHeader>
              <CardTitle as="h2">{m.subject}</CardTitle>
              <p className="text-sm text-soil-700">
                To {m.to.join(", ")} · {new Date(m.receivedAt).toLocaleString()}
              </p>
            </CardHeader>
            <CardBody>
              <pre className="whitespace-pre-wrap break-words font-body text-sm">{m.text}</pre>
            </CardBody>
          </Card>
        ))
      )}
      {!user ? (
        <p className="text-sm">
          <Link className={textLinkStyles} href="/sign-in?next=%2Fdev%2Foutbox">
            Sign in
          </Link>
        </p>
      ) : null}
    </main>
  );
}
