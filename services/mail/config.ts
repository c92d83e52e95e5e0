import type { MailerConfig } from "./index";

/** The mail settings as lib/env.ts's getEnv() returns them (already validated there). */
export type MailEnv = {
  SMTP_HOST?: string;
  SMTP_PORT?: number;
  SMTP_USER?: string;
  SMTP_PASSWORD?: string;
  SMTP_SECURE: boolean;
  MAIL_FROM: string;
  LOCAL_SMTP_PORT: number;
};

/**
 * SMTP_HOST set → real SMTP; unset → the built-in local catcher on LOCAL_SMTP_PORT, whose
 * messages show in the dev outbox. Mirrors the comment on LOCAL_SMTP_PORT in lib/env.ts.
 */
export function mailerConfigFromEnv(env: MailEnv): MailerConfig {
  const host = env.SMTP_HOST?.trim();
  if (!host) return { driver: "local", port: env.LOCAL_SMTP_PORT, from: env.MAIL_FROM };
  return {
    driver: "smtp",
    host,
    // 465 = implicit TLS, 587 = submission with STARTTLS (RFC 8314 §3.3, RFC 6409; from memory).
    port: env.SMTP_PORT ?? (env.SMTP_SECURE ? 465 : 587),
    // An empty SMTP_USER in a .env file means "no login", not a user called "".
    user: env.SMTP_USER || undefined,
    password: env.SMTP_PASSWORD || undefined,
    from: env.MAIL_FROM,
    secure: env.SMTP_SECURE,
  };
}
