import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { Card, CardBody, CardHeader, CardTitle, EmptyState } from "@/components/ui";
import { getLocalOutbox } from "@/services/mail";
import { isOutboxEnabled } from "@/services/mailer";

export const metadata: Metadata = { title: "Local outbox" };
export const dynamic = "force-dynamic";

// Mail caught by the built-in SMTP catcher, for trying invitations and resets
// on a laptop. Switched off in production (see services/mailer.ts).
export default async function OutboxPage() {
  if (!isOutboxEnabled()) notFound();
  const messages = (await getLocalOutbox()) ?? [];
  return (
    <main className="mx-auto flex max-w-3xl flex-col gap-4 px-4 py-6">
      <h1 className="text-3xl">Local outbox</h1>
      <p className="text-soil-700">
        E-mail sent while no SMTP server is configured lands here instead of anyone&apos;s inbox.
        Newest first; kept in memory until the server restarts.
      </p>
      {messages.length === 0 ? (
        <EmptyState
          title="No mail yet"
          text="Invite someone or ask for a password reset, then reload this page."
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
    </main>
  );
}
