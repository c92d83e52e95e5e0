import { randomUUID } from "node:crypto";
import type { AddressInfo } from "node:net";
import { simpleParser } from "mailparser";
import { SMTPServer, type SMTPServerDataStream, type SMTPServerSession } from "smtp-server";
import type { ReceivedMail } from "./types";

export type FakeSmtpServerOptions = {
  /** 0 picks a free port. */
  port?: number;
  host?: string;
  /** How many messages to keep; older ones are dropped first. */
  maxMessages?: number;
  /** Largest accepted message in bytes (announced through the SIZE extension, RFC 1870). */
  maxMessageBytes?: number;
};

export type FakeSmtpServer = {
  port: number;
  host: string;
  /** Newest first. Copies, so callers cannot edit the store. */
  messages(): ReceivedMail[];
  clear(): void;
  stop(): Promise<void>;
};

const DEFAULTS = { port: 0, host: "127.0.0.1", maxMessages: 200, maxMessageBytes: 1024 * 1024 };

function checkOptions(options: Required<FakeSmtpServerOptions>): void {
  const { port, maxMessages, maxMessageBytes } = options;
  if (!Number.isInteger(port) || port < 0 || port > 65_535) {
    throw new Error(`startFakeSmtpServer: port must be an integer 0–65535, got ${String(port)}`);
  }
  if (!Number.isInteger(maxMessages) || maxMessages < 1 || maxMessages > 10_000) {
    throw new Error(`startFakeSmtpServer: maxMessages must be an integer 1–10000`);
  }
  if (!Number.isInteger(maxMessageBytes) || maxMessageBytes < 1) {
    throw new Error(`startFakeSmtpServer: maxMessageBytes must be a positive integer`);
  }
}

// The stream keeps flowing past the size limit (the server only flags it), so stop keeping
// bytes there but drain the rest, or the client never gets its reply.
async function readBounded(stream: SMTPServerDataStream, maxBytes: number): Promise<Buffer> {
  const chunks: Buffer[] = [];
  let kept = 0;
  for await (const chunk of stream) {
    const buffer = chunk as Buffer;
    if (kept + buffer.length <= maxBytes) {
      chunks.push(buffer);
      kept += buffer.length;
    }
  }
  return Buffer.concat(chunks);
}

async function toReceivedMail(raw: Buffer, session: SMTPServerSession): Promise<ReceivedMail> {
  const parsed = await simpleParser(raw);
  const envelopeFrom = session.envelope.mailFrom ? session.envelope.mailFrom.address : "";
  return {
    id: randomUUID(),
    receivedAt: new Date().toISOString(),
    from: parsed.from?.text ?? envelopeFrom,
    to: session.envelope.rcptTo.map((r) => r.address),
    subject: parsed.subject ?? "",
    text: parsed.text ?? "",
    html: typeof parsed.html === "string" ? parsed.html : "",
    messageId: parsed.messageId ?? null,
  };
}

/**
 * A local SMTP server that accepts everything and keeps the newest messages in memory, for
 * development (the outbox page) and tests. It never relays anywhere.
 */
export async function startFakeSmtpServer(
  options: FakeSmtpServerOptions = {},
): Promise<FakeSmtpServer> {
  const opts = { ...DEFAULTS, ...options };
  checkOptions(opts);
  let store: ReceivedMail[] = [];

  const server = new SMTPServer({
    logger: false,
    banner: "Castline local SMTP (development only)",
    authOptional: true,
    // Plain text only: there is no certificate to offer, and clients must not try to upgrade.
    disabledCommands: ["STARTTLS"],
    // Dev configs that carry a user name still work; the fake checks no password.
    allowInsecureAuth: true,
    onAuth: (auth, _session, callback) => callback(null, { user: auth.username ?? "local" }),
    size: opts.maxMessageBytes,
    closeTimeout: 1_000,
    onData(stream, session, callback) {
      readBounded(stream, opts.maxMessageBytes)
        .then(async (raw) => {
          if (stream.sizeExceeded) {
            const error = new Error("Message exceeds the size limit") as Error & {
              responseCode: number;
            };
            // 552: "exceeded storage allocation" (RFC 5321 §4.2.3, RFC 1870 §6.4; from memory).
            error.responseCode = 552;
            callback(error);
            return;
          }
          const mail = await toReceivedMail(raw, session);
          store.push(mail);
          if (store.length > opts.maxMessages) store = store.slice(-opts.maxMessages);
          callback();
        })
        .catch((error: unknown) => callback(error instanceof Error ? error : new Error("read")));
    },
  });

  await new Promise<void>((resolve, reject) => {
    const onError = (error: Error) => reject(error);
    server.once("error", onError);
    server.listen(opts.port, opts.host, () => {
      server.off("error", onError);
      resolve();
    });
  });
  // Later socket errors (a client hanging up mid-message) must not crash the dev server.
  server.on("error", () => undefined);

  const address = server.server.address() as AddressInfo;
  let stopped: Promise<void> | null = null;

  return {
    port: address.port,
    host: opts.host,
    messages: () => store.map((m) => ({ ...m, to: [...m.to] })).reverse(),
    clear: () => {
      store = [];
    },
    stop: () => {
      stopped ??= new Promise<void>((resolve) => server.close(() => resolve()));
      return stopped;
    },
  };
}
