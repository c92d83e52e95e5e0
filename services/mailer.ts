import { logError } from "@/lib/log";
import { getEnv } from "@/lib/env";
import {
  createMailer,
  ensureLocalSmtpServer,
  getLocalOutbox,
  mailerConfigFromEnv,
  type Mailer,
  type OutgoingMail,
  type ReceivedMail,
} from "@/services/mail";

// The app's one mailer, chosen by configuration: real SMTP when SMTP_HOST is
// set, otherwise our local catcher whose messages show on /dev/outbox.

let mailer: Mailer | undefined;

export function getMailer(): Mailer {
  mailer ??= createMailer(mailerConfigFromEnv(getEnv()));
  return mailer;
}

export function usesLocalMail(): boolean {
  return !getEnv().SMTP_HOST;
}

/**
 * The outbox page shows mail caught locally; never in production unless asked for, and
 * never at all when a real SMTP server is configured (CASTLINE_OUTBOX cannot override that).
 */
export function isOutboxEnabled(): boolean {
  const env = getEnv();
  if (!usesLocalMail()) return false;
  if (env.CASTLINE_OUTBOX !== undefined) return env.CASTLINE_OUTBOX;
  return env.NODE_ENV !== "production" || env.CASTLINE_DEMO;
}

/**
 * The caught mail one person may read: only messages to their own address, and nothing
 * for a signed-out visitor. Otherwise anyone could ask for a reset of someone else's
 * password and read the link here (the one asking is the attacker, so "the browser that
 * asked" is no safeguard). Other recipients of a message are not shown.
 */
export async function readOutboxFor(email: string | null): Promise<ReceivedMail[]> {
  if (!email || !isOutboxEnabled()) return [];
  const own = email.trim().toLowerCase();
  const messages = (await getLocalOutbox()) ?? [];
  return messages
    .filter((m) => m.to.some((to) => to.toLowerCase() === own))
    .map((m) => ({ ...m, to: [own] }));
}

export async function startLocalMailIfNeeded(): Promise<void> {
  const config = mailerConfigFromEnv(getEnv());
  if (config.driver !== "local") return;
  try {
    const server = await ensureLocalSmtpServer(config.port);
    console.log(`[castline] local mail catcher on ${server.host}:${server.port}`);
  } catch (error) {
    // Mail is not worth refusing to start over: sends will fail and offer "resend".
    console.warn("[castline] local mail catcher did not start", error);
  }
}

/** Sends and reports instead of throwing, so callers can save first and offer "resend". */
export async function trySend(
  message: OutgoingMail,
): Promise<{ sent: true; messageId: string } | { sent: false }> {
  try {
    const { messageId } = await getMailer().send(message);
    return { sent: true, messageId };
  } catch (error) {
    // Through the redacting logger: an SMTP error can carry the recipient's address.
    logError("mail not sent", error);
    return { sent: false };
  }
}
