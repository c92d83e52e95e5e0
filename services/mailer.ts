import { getEnv } from "@/lib/env";
import {
  createMailer,
  ensureLocalSmtpServer,
  isMailError,
  mailerConfigFromEnv,
  type Mailer,
  type OutgoingMail,
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

/** The outbox page shows mail caught locally; never in production unless asked for. */
export function isOutboxEnabled(): boolean {
  const env = getEnv();
  if (!usesLocalMail()) return false;
  if (env.CASTLINE_OUTBOX !== undefined) return env.CASTLINE_OUTBOX;
  return env.NODE_ENV !== "production" || env.CASTLINE_DEMO;
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
    console.error("[castline] mail not sent", isMailError(error) ? error.message : error);
    return { sent: false };
  }
}
