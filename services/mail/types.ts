/** One e-mail as the app hands it to a mailer: always both a plain-text and an HTML part. */
export type OutgoingMail = {
  to: string;
  subject: string;
  text: string;
  html: string;
};

export interface Mailer {
  send(message: OutgoingMail): Promise<{ messageId: string }>;
}

/**
 * "mail_unavailable": the SMTP server could not be reached, timed out or refused the message.
 * Callers show "the e-mail could not be sent" and offer a resend; the cause stays in logs.
 * "mail_invalid": the message itself is unusable (empty recipient, missing part) — a bug in
 * the caller, so resending would not help.
 */
export type MailErrorCode = "mail_unavailable" | "mail_invalid";

export class MailError extends Error {
  readonly code: MailErrorCode;
  /** The message field at fault, for "mail_invalid". */
  readonly field: keyof OutgoingMail | undefined;
  /** SMTP reply code when the server answered (e.g. 552), to tell "refused" from "unreachable". */
  readonly responseCode: number | undefined;

  constructor(
    code: MailErrorCode,
    message: string,
    options: { cause?: unknown; field?: keyof OutgoingMail; responseCode?: number } = {},
  ) {
    super(message, { cause: options.cause });
    this.name = "MailError";
    this.code = code;
    this.field = options.field;
    this.responseCode = options.responseCode;
  }
}

export function isMailError(value: unknown): value is MailError {
  return value instanceof MailError;
}

/** What the local fake SMTP server keeps of each message it accepted. */
export type ReceivedMail = {
  id: string;
  /** ISO 8601, server clock. */
  receivedAt: string;
  /** The From header as written (e.g. `Castline <no-reply@example.com>`), else the envelope sender. */
  from: string;
  /** Envelope recipients, i.e. everyone the message was really delivered to. */
  to: string[];
  subject: string;
  text: string;
  html: string;
  /** Message-ID header, so a test or the outbox page can match a send() result. */
  messageId: string | null;
};
