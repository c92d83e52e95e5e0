import nodemailer from "nodemailer";
import { z } from "zod";
import { MailError, type Mailer, type OutgoingMail } from "./types";

export type SmtpMailerConfig = {
  host: string;
  port: number;
  user?: string;
  password?: string;
  /** Sender, e.g. `Castline <no-reply@example.com>`. */
  from: string;
  /** true = TLS from the first byte (usually port 465); otherwise STARTTLS is required. */
  secure?: boolean;
  /** Overrides for the fail-fast timeouts, in milliseconds. */
  timeouts?: { connectionMs?: number; greetingMs?: number; socketMs?: number };
};

// Nodemailer's defaults wait up to 2 minutes for a connection and 10 minutes on a silent
// socket; a sign-up or invite request must not hang that long when SMTP is down.
const DEFAULT_TIMEOUTS = { connectionMs: 5_000, greetingMs: 5_000, socketMs: 15_000 };

const LOOPBACK_HOSTS = new Set(["127.0.0.1", "localhost", "::1"]);

const positiveMs = z.number().int().positive().max(600_000);

const configSchema = z.object({
  host: z.string().trim().min(1),
  port: z.number().int().min(1).max(65_535),
  user: z.string().min(1).optional(),
  password: z.string().optional(),
  from: z.string().trim().min(3),
  secure: z.boolean().optional(),
  timeouts: z
    .object({
      connectionMs: positiveMs.optional(),
      greetingMs: positiveMs.optional(),
      socketMs: positiveMs.optional(),
    })
    .optional(),
});

const messageSchema = z.object({
  to: z.email(),
  // A line break in a header is how header injection starts; nothing legitimate needs one.
  subject: z
    .string()
    .trim()
    .min(1)
    .max(300)
    .refine((s) => !/[\r\n]/.test(s), "must be a single line"),
  text: z.string().min(1),
  html: z.string().min(1),
});

function parseConfig(config: SmtpMailerConfig): z.infer<typeof configSchema> {
  const parsed = configSchema.safeParse(config);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    const field = issue?.path.join(".") || "config";
    throw new Error(`Invalid SMTP mailer config: ${field} ${issue?.message ?? "is invalid"}`);
  }
  return parsed.data;
}

function validateMessage(message: OutgoingMail): void {
  const parsed = messageSchema.safeParse(message);
  if (parsed.success) return;
  const issue = parsed.error.issues[0];
  const field = issue?.path[0];
  const known = ["to", "subject", "text", "html"] as const;
  const mailField = known.find((k) => k === field);
  throw new MailError(
    "mail_invalid",
    `Invalid e-mail: ${mailField ?? "message"} ${issue?.message ?? "is invalid"}`,
    { field: mailField },
  );
}

function readResponseCode(error: unknown): number | undefined {
  if (typeof error !== "object" || error === null || !("responseCode" in error)) return undefined;
  const code = (error as { responseCode: unknown }).responseCode;
  return typeof code === "number" ? code : undefined;
}

export function createSmtpMailer(config: SmtpMailerConfig): Mailer {
  const cfg = parseConfig(config);
  const timeouts = { ...DEFAULT_TIMEOUTS, ...cfg.timeouts };
  const secure = cfg.secure ?? false;
  // Our own fake SMTP (loopback, no credentials) speaks plain SMTP only; anything else must be
  // encrypted, either implicitly (secure) or by a required STARTTLS upgrade.
  const plainLocal = LOOPBACK_HOSTS.has(cfg.host) && !cfg.user;

  const transporter = nodemailer.createTransport({
    host: cfg.host,
    port: cfg.port,
    secure,
    ignoreTLS: plainLocal,
    requireTLS: !plainLocal && !secure,
    auth: cfg.user ? { user: cfg.user, pass: cfg.password ?? "" } : undefined,
    connectionTimeout: timeouts.connectionMs,
    greetingTimeout: timeouts.greetingMs,
    socketTimeout: timeouts.socketMs,
    dnsTimeout: timeouts.connectionMs,
  });

  return {
    async send(message) {
      validateMessage(message);
      try {
        const info = await transporter.sendMail({
          from: cfg.from,
          to: message.to,
          subject: message.subject,
          text: message.text,
          html: message.html,
        });
        return { messageId: info.messageId };
      } catch (error) {
        const responseCode = readResponseCode(error);
        const reason = error instanceof Error ? error.message : String(error);
        throw new MailError(
          "mail_unavailable",
          `The e-mail could not be sent via ${cfg.host}:${cfg.port}: ${reason}`,
          { cause: error, responseCode },
        );
      }
    },
  };
}
