import net from "node:net";
import { afterAll, afterEach, beforeAll, describe, expect, it } from "vitest";
import {
  createMailer,
  createSmtpMailer,
  ensureLocalSmtpServer,
  getLocalOutbox,
  invitationMail,
  isMailError,
  MailError,
  mailerConfigFromEnv,
  passwordResetMail,
  reminderMail,
  renderMail,
  startFakeSmtpServer,
  stopLocalSmtpServer,
  type FakeSmtpServer,
} from "@/services/mail";

const FROM = "Castline <no-reply@example.com>";
const TAGLINE = "Castline — garden feeding planned around your worm bins.";

/** A port that was free a moment ago and now has nobody listening. */
async function closedPort(): Promise<number> {
  const probe = net.createServer();
  await new Promise<void>((resolve) => probe.listen(0, "127.0.0.1", resolve));
  const { port } = probe.address() as net.AddressInfo;
  await new Promise<void>((resolve) => probe.close(() => resolve()));
  return port;
}

async function expectMailError(promise: Promise<unknown>): Promise<MailError> {
  const error = await promise.then(
    () => null,
    (e: unknown) => e,
  );
  expect(isMailError(error)).toBe(true);
  return error as MailError;
}

describe("SMTP mailer against the fake SMTP server", () => {
  let server: FakeSmtpServer;

  beforeAll(async () => {
    server = await startFakeSmtpServer({ port: 0, maxMessages: 3 });
  });
  afterEach(() => server.clear());
  afterAll(async () => {
    await server.stop();
  });

  it("delivers a message that arrives parsed with subject, both parts and recipient", async () => {
    expect(server.port).toBeGreaterThan(0);
    const mailer = createSmtpMailer({ host: server.host, port: server.port, from: FROM });
    const mail = passwordResetMail({
      resetUrl: "https://castline.example.com/reset?token=abc&x=1",
      expiresInMinutes: 30,
    });
    const result = await mailer.send({ to: "rowan@example.com", ...mail });

    const [received, ...rest] = server.messages();
    expect(rest).toHaveLength(0);
    expect(received?.to).toEqual(["rowan@example.com"]);
    expect(received?.from).toContain("no-reply@example.com");
    expect(received?.subject).toBe("Reset your Castline password");
    expect(received?.messageId).toBe(result.messageId);
    expect(received?.text).toContain("https://castline.example.com/reset?token=abc&x=1");
    expect(received?.text).toContain("30 minutes");
    expect(received?.text).toContain(TAGLINE);
    // In HTML the "&" of a query string must be written "&amp;" (HTML Living Standard §13.1.4,
    // character references; from memory) — and the parsed HTML must keep that form.
    expect(received?.html).toContain('href="https://castline.example.com/reset?token=abc&amp;x=1"');
    expect(received?.html).toContain("Castline");
    expect(Date.parse(received?.receivedAt ?? "")).not.toBeNaN();
  });

  it("escapes an inviter name holding a script tag in the HTML part", async () => {
    const mailer = createSmtpMailer({ host: server.host, port: server.port, from: FROM });
    const mail = invitationMail({
      gardenName: 'Hollis Street Garden "north"',
      inviterName: "<script>alert('x')</script> Dana",
      role: "helper",
      acceptUrl: "https://castline.example.com/invite/t0k3n",
      expiresAt: new Date("2026-05-01T18:00:00Z"),
    });
    await mailer.send({ to: "sam@example.com", ...mail });
    const received = server.messages()[0];

    // OWASP XSS Prevention Cheat Sheet, rule 1: encode & < > " ' in HTML content (from memory).
    for (const html of [mail.html, received?.html ?? ""]) {
      expect(html).not.toContain("<script>");
      expect(html).toContain("&lt;script&gt;alert(&#39;x&#39;)&lt;/script&gt; Dana");
      expect(html).toContain("Hollis Street Garden &quot;north&quot;");
    }
    // The plain-text part is not HTML, so it shows the name as typed.
    expect(received?.text).toContain("<script>alert('x')</script> Dana invited you");
    expect(received?.text).toContain("May 1, 2026 at 6:00 PM (UTC)");
    expect(received?.subject).toContain("Hollis Street Garden");
  });

  it("keeps only the newest maxMessages messages", async () => {
    const mailer = createSmtpMailer({ host: server.host, port: server.port, from: FROM });
    for (let i = 1; i <= 5; i += 1) {
      const body = renderMail({ heading: `Note ${i}`, paragraphs: [`Body ${i}`] });
      await mailer.send({ to: `member${i}@example.com`, subject: `Note ${i}`, ...body });
    }
    const subjects = server.messages().map((m) => m.subject);
    expect(subjects).toEqual(["Note 5", "Note 4", "Note 3"]);
  });

  it("refuses a message over the size limit and the mailer reports mail_unavailable", async () => {
    const small = await startFakeSmtpServer({ port: 0, maxMessageBytes: 10_000 });
    try {
      const mailer = createSmtpMailer({ host: small.host, port: small.port, from: FROM });
      const big = "worm castings ".repeat(2_000);
      const error = await expectMailError(
        mailer.send({ to: "a@example.com", subject: "Big", text: big, html: `<p>${big}</p>` }),
      );
      expect(error.code).toBe("mail_unavailable");
      // 552 = "exceeded storage allocation" (RFC 5321 §4.2.3; RFC 1870 SIZE; from memory).
      expect(error.responseCode).toBe(552);
      expect(small.messages()).toHaveLength(0);
    } finally {
      await small.stop();
    }
  });

  it("demands STARTTLS once credentials are configured, so passwords never go in clear", async () => {
    // The fake server disables STARTTLS; a mailer with a user must refuse to carry on.
    const mailer = createSmtpMailer({
      host: server.host,
      port: server.port,
      user: "dev",
      password: "not-a-secret",
      from: FROM,
    });
    const error = await expectMailError(
      mailer.send({ to: "a@example.com", subject: "Hi", text: "t", html: "<p>t</p>" }),
    );
    expect(error.code).toBe("mail_unavailable");
    expect(server.messages()).toHaveLength(0);
  });

  it("rejects an unusable message before connecting, naming the field", async () => {
    const mailer = createSmtpMailer({ host: server.host, port: server.port, from: FROM });
    const error = await expectMailError(
      mailer.send({ to: "not-an-address", subject: "Hi", text: "t", html: "<p>t</p>" }),
    );
    expect(error.code).toBe("mail_invalid");
    expect(error.field).toBe("to");
    expect(server.messages()).toHaveLength(0);
  });
});

describe("SMTP down", () => {
  // Fault tests with a generous bound, not benchmarks: they prove we do not hang.
  it("fails fast with MailError when nothing listens on the port", async () => {
    const port = await closedPort();
    const mailer = createSmtpMailer({ host: "127.0.0.1", port, from: FROM });
    const started = Date.now();
    const error = await expectMailError(
      mailer.send({ to: "a@example.com", subject: "Hi", text: "t", html: "<p>t</p>" }),
    );
    expect(error.code).toBe("mail_unavailable");
    expect(Date.now() - started).toBeLessThan(10_000);
  });

  it("fails within the greeting timeout when the server accepts but never speaks", async () => {
    const sockets = new Set<net.Socket>();
    const silent = net.createServer((socket) => sockets.add(socket));
    await new Promise<void>((resolve) => silent.listen(0, "127.0.0.1", resolve));
    const { port } = silent.address() as net.AddressInfo;
    try {
      const mailer = createSmtpMailer({ host: "127.0.0.1", port, from: FROM });
      const started = Date.now();
      const error = await expectMailError(
        mailer.send({ to: "a@example.com", subject: "Hi", text: "t", html: "<p>t</p>" }),
      );
      expect(error.code).toBe("mail_unavailable");
      expect(Date.now() - started).toBeLessThan(10_000);
    } finally {
      for (const socket of sockets) socket.destroy();
      await new Promise<void>((resolve) => silent.close(() => resolve()));
    }
  });
});

describe("local outbox registry", () => {
  afterAll(async () => {
    await stopLocalSmtpServer();
  });

  it("is null before start, starts once, and collects mail sent by the local driver", async () => {
    expect(await getLocalOutbox()).toBeNull();
    const [a, b] = await Promise.all([ensureLocalSmtpServer(0), ensureLocalSmtpServer(0)]);
    expect(a).toBe(b);
    const mailer = createMailer({ driver: "local", port: 0, from: FROM });
    const mail = reminderMail({
      gardenName: "Hollis Street Garden",
      items: [
        { date: "2026-06-12", text: "Top-dress 6 tomato with 1 cup castings each" },
        { date: "2026-06-05", text: "Harvest the bottom tray of the wooden stack" },
      ],
      calendarUrl: "https://castline.example.com/g/1/calendar",
    });
    await mailer.send({ to: "grower@example.com", ...mail });
    const outbox = await getLocalOutbox();
    expect(outbox).toHaveLength(1);
    const text = outbox?.[0]?.text ?? "";
    expect(outbox?.[0]?.subject).toBe("Hollis Street Garden: 2 tasks coming up");
    // 2026-06-05 is a Friday and 2026-06-12 the Friday after (proleptic Gregorian calendar).
    expect(text.indexOf("Fri, Jun 5")).toBeGreaterThan(-1);
    expect(text.indexOf("Fri, Jun 5")).toBeLessThan(text.indexOf("Fri, Jun 12"));
    await stopLocalSmtpServer();
    expect(await getLocalOutbox()).toBeNull();
  });
});

describe("templates and config", () => {
  it("puts the product name and the plain footer in both parts", () => {
    const { text, html } = renderMail({
      heading: "Hello",
      paragraphs: ["One", "Two"],
      footerNote: "you joined Hollis Street Garden",
    });
    expect(text).toContain("You are getting this because you joined Hollis Street Garden.");
    expect(text).toContain(TAGLINE);
    expect(html).toContain("You are getting this because you joined Hollis Street Garden.");
    expect(html).toContain(TAGLINE);
    expect(html).not.toMatch(/<link|<script|src=/);
  });

  it("refuses non-http links and bad input, naming the field", () => {
    expect(() =>
      renderMail({
        heading: "x",
        paragraphs: [],
        action: { label: "Go", url: "javascript:alert(1)" },
      }),
    ).toThrow(/action\.url/);
    expect(() =>
      passwordResetMail({ resetUrl: "https://e.example.com", expiresInMinutes: NaN }),
    ).toThrow(/expiresInMinutes/);
    expect(() =>
      reminderMail({ gardenName: "G", items: [{ date: "2026-02-30", text: "x" }] }),
    ).toThrow(/items\[0\]\.date/);
    const base = { SMTP_SECURE: false, MAIL_FROM: FROM, LOCAL_SMTP_PORT: 2525 };
    expect(mailerConfigFromEnv(base)).toEqual({ driver: "local", port: 2525, from: FROM });
    // Submission port 587 with STARTTLS, 465 implicit TLS (RFC 6409 §3.1, RFC 8314 §3.3; from memory).
    expect(
      mailerConfigFromEnv({ ...base, SMTP_HOST: "smtp.example.com", SMTP_USER: "" }),
    ).toMatchObject({ driver: "smtp", port: 587, secure: false, user: undefined });
    expect(
      mailerConfigFromEnv({ ...base, SMTP_HOST: "smtp.example.com", SMTP_SECURE: true }),
    ).toMatchObject({ port: 465, secure: true });
  });
});
