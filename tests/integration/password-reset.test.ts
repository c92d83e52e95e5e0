import "@/tests/support/integration/env";
import { sql } from "drizzle-orm";
import { afterAll, describe, expect, it } from "vitest";
import * as account from "@/app/api/account/route";
import * as confirm from "@/app/api/password-reset/confirm/route";
import * as requestReset from "@/app/api/password-reset/route";
import { getDb } from "@/db";
import { consumePasswordReset } from "@/db/queries/password-resets";
import { settleAfterResponseWork } from "@/lib/after-response";
import { hashLinkToken } from "@/lib/auth/tokens";
import { RESET_REQUESTED_MESSAGE } from "@/lib/messages";
import {
  BASE_URL,
  call,
  closeHarness,
  waitForMailTo,
  outbox,
  resetTokenFrom,
  signIn,
  signUpUser,
  uniqueEmail,
  type TestUser,
} from "@/tests/support/integration/harness";

afterAll(closeHarness);

const ask = (email: string) =>
  call(requestReset.POST, { url: "/api/password-reset", body: { email } });
const setNew = (token: string, newPassword: string) =>
  call(confirm.POST, { url: "/api/password-reset/confirm", body: { token, newPassword } });

async function requestToken(user: TestUser): Promise<string> {
  const res = await ask(user.email);
  expect(res.status).toBe(202);
  // The mail goes out after the response (account-enumeration.test.ts): wait for it.
  await settleAfterResponseWork();
  return resetTokenFrom(await waitForMailTo(user.email, /reset/i));
}

describe("password reset", () => {
  it("mails a link whose token works once and ends existing sessions", async () => {
    const user = await signUpUser("forgetful");
    const res = await ask(user.email);
    expect(res.status).toBe(202);
    expect(res.json.message).toBe(RESET_REQUESTED_MESSAGE);
    const mail = await waitForMailTo(user.email, /reset/i);
    expect(mail.text).toContain(`${BASE_URL}/reset-password?token=`);
    const token = resetTokenFrom(mail);
    // The database keeps only the token's SHA-256, never the token from the link.
    const db = await getDb();
    const stored = (await db.execute(
      sql`select token_hash from password_reset_tokens`,
    )) as unknown as {
      rows: { token_hash: string }[];
    };
    expect(stored.rows.map((r) => r.token_hash)).toContain(hashLinkToken(token));
    expect(JSON.stringify(stored.rows)).not.toContain(token);

    const ok = await setNew(token, "fresh-bedding-every-spring");
    expect(ok.status).toBe(200);
    // user.cookie came from sign-up, before the reset: it must no longer work.
    expect((await call(account.GET, { url: "/api/account", cookie: user.cookie })).status).toBe(
      401,
    );
    await expect(signIn(user.email, user.password)).rejects.toThrow(/401/);
    await expect(signIn(user.email, "fresh-bedding-every-spring")).resolves.toBeTruthy();

    const reuse = await setNew(token, "another-new-password-5");
    expect(reuse.status).toBe(410);
    expect(reuse.json.error.code).toBe("gone:reset_used");
    await expect(signIn(user.email, "fresh-bedding-every-spring")).resolves.toBeTruthy();
  });

  it("retires the earlier link when a second one is asked for", async () => {
    const user = await signUpUser("twice");
    const first = await requestToken(user);
    const second = await requestToken(user);
    expect(second).not.toBe(first);
    expect((await setNew(first, "worm-tea-on-tuesdays")).status).toBe(410);
    expect((await setNew(second, "worm-tea-on-tuesdays")).status).toBe(200);
  });

  it("refuses an expired link with 410 (expiry moved into the past in the database)", async () => {
    const user = await signUpUser("late");
    const token = await requestToken(user);
    const db = await getDb();
    await db.execute(
      sql`update password_reset_tokens set expires_at = now() - interval '1 minute' where token_hash = ${hashLinkToken(token)}`,
    );
    const res = await setNew(token, "too-late-for-this-one");
    expect(res.status).toBe(410);
    expect(res.json.error.code).toBe("gone:reset_expired");
    await expect(signIn(user.email, user.password)).resolves.toBeTruthy();
  });

  it("ends a link's life after one hour (query function with a clock an hour ahead)", async () => {
    const user = await signUpUser("clock");
    const token = await requestToken(user);
    const later = new Date(Date.now() + 60 * 60 * 1000 + 1000);
    const outcome = await consumePasswordReset({
      tokenHash: hashLinkToken(token),
      newPasswordHash: "x",
      now: later,
    });
    expect(outcome).toEqual({ ok: false, reason: "expired" });
  });

  it("answers an unknown address exactly like a known one, and sends nothing", async () => {
    const known = await signUpUser("known");
    const before = (await outbox()).length;
    const unknown = await ask(uniqueEmail("stranger"));
    await settleAfterResponseWork();
    expect((await outbox()).length).toBe(before);
    const knownRes = await ask(known.email);
    expect(unknown.status).toBe(202);
    expect(unknown.json).toEqual(knownRes.json);
    await settleAfterResponseWork();
    expect((await outbox()).length).toBe(before + 1);
  });

  it("refuses a made-up token and a weak new password", async () => {
    const made = await setNew("A".repeat(43), "perfectly-fine-pass-1");
    expect(made.status).toBe(410);
    expect(made.json.error.code).toBe("gone:reset_invalid");
    const user = await signUpUser("weak");
    const weak = await setNew(await requestToken(user), "password1");
    expect(weak.status).toBe(400);
    expect(weak.json.error.fields.newPassword).toMatch(/commonly used/);
  });
});
