import "@/tests/support/integration/env";
import { afterAll, afterEach, describe, expect, it, vi } from "vitest";
import * as devOutbox from "@/app/api/dev/outbox/route";
import * as resetRequest from "@/app/api/password-reset/route";
import { resetEnvCache } from "@/lib/env";
import { isOutboxEnabled } from "@/services/mailer";
import {
  call,
  closeHarness,
  latestMailTo,
  signUpUser,
  waitForMailTo,
} from "@/tests/support/integration/harness";

// Issue 7 item 1: the outbox held every password-reset link for anyone to read, so a
// stranger could ask for a reset for the owner's address and take over the account.

afterAll(closeHarness);
afterEach(() => {
  vi.unstubAllEnvs();
  resetEnvCache();
});

const readOutbox = (cookie?: string) => call(devOutbox.GET, { url: "/api/dev/outbox", cookie });

describe("the local outbox", () => {
  it("shows a signed-out stranger none of the owner's reset mail", async () => {
    const owner = await signUpUser("outboxowner");
    const asked = await call(resetRequest.POST, {
      url: "/api/password-reset",
      body: { email: owner.email },
    });
    expect(asked.status).toBe(202);
    const mail = await waitForMailTo(owner.email, /reset/i);
    expect(mail.text).toMatch(/reset-password\?token=/);

    const stranger = await readOutbox();
    // Whatever the status, no message and no reset link may be in the answer.
    expect(stranger.text).not.toContain("reset-password?token=");
    expect(stranger.json?.messages ?? []).toEqual([]);
  });

  it("shows a signed-in person only mail to their own address", async () => {
    const owner = await signUpUser("mailowner");
    const other = await signUpUser("mailother");
    await call(resetRequest.POST, { url: "/api/password-reset", body: { email: owner.email } });
    await waitForMailTo(owner.email, /reset/i);

    const theirs = await readOutbox(other.cookie);
    expect(theirs.status).toBe(200);
    expect(theirs.text).not.toContain("reset-password?token=");
    for (const m of theirs.json.messages) expect(m.to).toEqual([other.email]);

    const mine = await readOutbox(owner.cookie);
    expect(mine.status).toBe(200);
    expect(mine.json.messages.length).toBeGreaterThan(0);
    for (const m of mine.json.messages) expect(m.to).toEqual([owner.email]);
    expect(mine.text).toContain("reset-password?token=");
    expect(await latestMailTo(owner.email)).toBeDefined();
  });

  it("is never on when a real SMTP server is configured, whatever CASTLINE_OUTBOX says", () => {
    vi.stubEnv("SMTP_HOST", "smtp.example.com");
    vi.stubEnv("CASTLINE_OUTBOX", "1");
    resetEnvCache();
    expect(isOutboxEnabled()).toBe(false);
  });
});
