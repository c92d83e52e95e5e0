import { ensureLocalSmtpServer } from "./outbox";
import { createSmtpMailer, type SmtpMailerConfig } from "./smtp-mailer";
import type { Mailer } from "./types";

export type MailerConfig =
  | ({ driver: "smtp" } & SmtpMailerConfig)
  | {
      /** Our in-process fake SMTP server; messages land in the dev outbox, never leave. */
      driver: "local";
      port: number;
      from: string;
    };

/**
 * Picks the mail driver from configuration. Both drivers speak real SMTP through the same
 * code path, so the local one exercises exactly what production sends.
 */
export function createMailer(config: MailerConfig): Mailer {
  if (config.driver === "smtp") {
    const { driver: _driver, ...smtp } = config;
    return createSmtpMailer(smtp);
  }
  let inner: Promise<Mailer> | null = null;
  return {
    async send(message) {
      // Started on first use, not at import, so a build or a test that never sends opens no port.
      inner ??= ensureLocalSmtpServer(config.port).then((server) =>
        createSmtpMailer({ host: server.host, port: server.port, from: config.from }),
      );
      const mailer = await inner.catch((error: unknown) => {
        inner = null;
        throw error;
      });
      return mailer.send(message);
    },
  };
}

export { mailerConfigFromEnv } from "./config";
export { startFakeSmtpServer } from "./fake-smtp-server";
export type { FakeSmtpServer, FakeSmtpServerOptions } from "./fake-smtp-server";
export {
  clearLocalOutbox,
  ensureLocalSmtpServer,
  getLocalOutbox,
  stopLocalSmtpServer,
} from "./outbox";
export { createSmtpMailer } from "./smtp-mailer";
export type { SmtpMailerConfig } from "./smtp-mailer";
export {
  escapeHtml,
  invitationMail,
  passwordResetMail,
  PRODUCT_NAME,
  reminderMail,
  renderMail,
  signUpAttemptMail,
  welcomeMail,
} from "./templates";
export type {
  InvitedRole,
  MailAction,
  MailContent,
  MailListItem,
  ReminderItem,
  RenderedMail,
  RenderMailInput,
} from "./templates";
export { isMailError, MailError } from "./types";
export type { Mailer, MailErrorCode, OutgoingMail, ReceivedMail } from "./types";
