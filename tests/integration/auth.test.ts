import "@/tests/support/integration/env";
import { encode } from "next-auth/jwt";
import { afterAll, describe, expect, it } from "vitest";
import * as accountPassword from "@/app/api/account/password/route";
import * as account from "@/app/api/account/route";
import * as everywhere from "@/app/api/session/everywhere/route";
import * as session from "@/app/api/session/route";
import { SESSION_COOKIE } from "@/lib/auth/cookies";
import {
  call,
  closeHarness,
  errorCode,
  signIn,
  signUpUser,
  tableRows,
  uniqueEmail,
} from "@/tests/support/integration/harness";

afterAll(closeHarness);

const me = (cookie: string | undefined) => call(account.GET, { url: "/api/account", cookie });
const signUpWith = (body: Record<string, unknown>) =>
  call(account.POST, { url: "/api/account", body });

describe("sign up", () => {
  it("answers 400 with a message per bad field", async () => {
    const res = await signUpWith({ name: " ", email: "not-an-address", password: "short" });
    expect(res.status).toBe(400);
    expect(errorCode(res)).toBe("validation");
    expect(Object.keys(res.json.error.fields).sort()).toEqual(["email", "name", "password"]);
    expect(res.json.error.fields.password).toMatch(/at least 8/);
  });

  it("refuses a password from the common-password list, whatever its case", async () => {
    // ASVS 5.0 6.2.4 / NIST SP 800-63B §5.1.1.2: refuse known-breached and common passwords.
    // "password1" heads most leaked-password lists (zxcvbn-ts passwords-common holds it).
    for (const password of ["password1", "PassWord1"]) {
      const res = await signUpWith({ name: "Rowan", email: uniqueEmail("common"), password });
      expect(res.status).toBe(400);
      expect(res.json.error.fields.password).toMatch(/commonly used/);
    }
  });

  it("sets the minimum at 8 characters, with no composition rules", async () => {
    // NIST SP 800-63B §5.1.1.2: at least 8 characters; no rules like "one digit, one symbol".
    const seven = await signUpWith({
      name: "Rowan",
      email: uniqueEmail("seven"),
      password: "qzvlmno",
    });
    expect(seven.status).toBe(400);
    expect(seven.json.error.fields.password).toMatch(/at least 8/);
    const eight = await signUpWith({
      name: "Rowan",
      email: uniqueEmail("eight"),
      password: "qzvlmnop",
    });
    expect(eight.status).toBe(202);
  });

  it("accepts 64 characters and more (up to our 128 cap)", async () => {
    // NIST SP 800-63B §5.1.1.2: verifiers SHOULD permit at least 64 characters.
    for (const length of [64, 100, 128]) {
      const password = "mulch".repeat(30).slice(0, length);
      expect(password).toHaveLength(length);
      const email = uniqueEmail(`long${length}`);
      const res = await signUpWith({ name: "Rowan", email, password });
      expect(res.status, `length ${length}`).toBe(202);
      await expect(signIn(email, password)).resolves.toMatch(/^castline\.session=/);
    }
  });

  it("accepts a pasted passphrase with spaces and non-ASCII, and does not trim it", async () => {
    // NIST SP 800-63B §5.1.1.2: spaces and Unicode SHOULD be accepted; paste allowed.
    const password = "  Three trays high — the worms ate 4 banana peels & a café filter 🍌  ";
    const email = uniqueEmail("paste");
    expect((await signUpWith({ name: "Rowan", email, password })).status).toBe(202);
    await expect(signIn(email, password)).resolves.toMatch(/^castline\.session=/);
    // Trimmed is a different password: the stored one keeps its spaces.
    await expect(signIn(email, password.trim())).rejects.toThrow(/401/);
  });

  it("signs the new person in, never returns the hash, and makes no second account for a taken address", async () => {
    const email = uniqueEmail("rowan");
    const res = await signUpWith({ name: "Rowan Hale", email, password: "sifted-castings-77" });
    expect(res.status).toBe(202);
    expect(JSON.stringify(res.json)).not.toMatch(/hash|argon/i);
    expect((await me(res.cookie!)).json.user.email).toBe(email);

    const again = await signUpWith({
      name: "Other",
      email: email.toUpperCase(),
      password: "sifted-castings-78",
    });
    // The same answer as for a new address (issue 7 item 8), no session, no second row.
    expect(again.status).toBe(202);
    expect(again.json).toEqual(res.json);
    expect(again.setCookie).toBeNull();
    const rows = (await tableRows("users")) as { email: string }[];
    expect(rows.filter((r) => r.email === email)).toHaveLength(1);
  });
});

describe("sign in and out", () => {
  it("issues an HttpOnly session cookie and clears it on sign-out", async () => {
    const user = await signUpUser("signin");
    const res = await call(session.POST, {
      url: "/api/session",
      body: { email: user.email, password: user.password },
    });
    expect(res.status).toBe(200);
    // Cookie attributes per RFC 6265 §4.1.2; HttpOnly keeps scripts from reading the session.
    expect(res.setCookie).toMatch(
      new RegExp(`^${SESSION_COOKIE}=[^;]+; Path=/; Max-Age=\\d+; HttpOnly; SameSite=Lax`),
    );
    expect((await me(res.cookie!)).status).toBe(200);

    const out = await call(session.DELETE, {
      method: "DELETE",
      url: "/api/session",
      cookie: res.cookie!,
    });
    expect(out.status).toBe(200);
    expect(out.setCookie).toMatch(new RegExp(`^${SESSION_COOKIE}=; Path=/; Max-Age=0`));
    expect((await me(out.cookie!)).status).toBe(401);
    expect((await me(undefined)).status).toBe(401);
  });

  it("answers malformed JSON with our 400 body and no stack trace", async () => {
    for (const handler of [session.POST, account.POST]) {
      const res = await call(handler, { url: "/api/session", body: '{"email": "a@example.com", ' });
      expect(res.status).toBe(400);
      expect(res.json).toEqual({
        error: { code: "bad_request:json", message: "The request body is not valid JSON." },
      });
      expect(res.text).not.toMatch(/SyntaxError|\bat\s+\S+\s+\(|node_modules|stack/);
    }
  });
});

describe("sessions", () => {
  it("a password change ends the other sessions and hands this browser a fresh cookie", async () => {
    const user = await signUpUser("changer");
    const laptop = await signIn(user.email, user.password);
    const phone = await signIn(user.email, user.password);

    const wrong = await call(accountPassword.POST, {
      url: "/api/account/password",
      cookie: laptop,
      body: { currentPassword: "not-my-password", newPassword: "a-new-tray-of-bedding" },
    });
    expect(wrong.status).toBe(400);
    expect(wrong.json.error.fields.currentPassword).toBeTruthy();
    expect((await me(phone)).status).toBe(200);

    const res = await call(accountPassword.POST, {
      url: "/api/account/password",
      cookie: laptop,
      body: { currentPassword: user.password, newPassword: "a-new-tray-of-bedding" },
    });
    expect(res.status).toBe(200);
    expect(res.cookie).toBeTruthy();
    expect((await me(laptop)).status).toBe(401);
    expect((await me(phone)).status).toBe(401);
    expect((await me(res.cookie!)).status).toBe(200);
    await expect(signIn(user.email, user.password)).rejects.toThrow(/401/);
    await expect(signIn(user.email, "a-new-tray-of-bedding")).resolves.toBeTruthy();
  });

  it("signing out ends that session on the server, even for a copied cookie; others live on", async () => {
    const user = await signUpUser("signout");
    const laptop = await signIn(user.email, user.password);
    const phone = await signIn(user.email, user.password);
    const copied = laptop;
    const res = await call(session.DELETE, {
      method: "DELETE",
      url: "/api/session",
      cookie: laptop,
    });
    expect(res.status).toBe(200);
    expect(res.setCookie).toMatch(/Max-Age=0/);
    // ASVS 7.4.1 (from memory): sign-out must end the session server-side, not only clear the cookie.
    expect((await me(copied)).status).toBe(401);
    expect((await me(phone)).status).toBe(200);
  });

  it("sign out everywhere ends every session, including this one", async () => {
    const user = await signUpUser("everywhere");
    const a = await signIn(user.email, user.password);
    const b = await signIn(user.email, user.password);
    const res = await call(everywhere.POST, { url: "/api/session/everywhere", cookie: a });
    expect(res.status).toBe(200);
    expect(res.setCookie).toMatch(/Max-Age=0/);
    expect((await me(a)).status).toBe(401);
    expect((await me(b)).status).toBe(401);
    expect((await me(await signIn(user.email, user.password))).status).toBe(200);
  });

  it("refuses a tampered, truncated or foreign-secret session token", async () => {
    const user = await signUpUser("tamper");
    const cookie = await signIn(user.email, user.password);
    const token = cookie.slice(SESSION_COOKIE.length + 1);
    const segments = token.split(".");
    // JWE compact form (RFC 7516 §7.1): header.key.iv.ciphertext.tag; Auth.js uses "dir", so key is empty.
    expect(segments).toHaveLength(5);
    const flip = (s: string, i: number) =>
      s.slice(0, i) + (s[i] === "A" ? "B" : "A") + s.slice(i + 1);
    const tampered = [0, 2, 3, 4].map((seg) =>
      segments.map((s, i) => (i === seg ? flip(s, Math.floor(s.length / 2)) : s)).join("."),
    );
    const foreign = await encode({
      token: { sub: user.id, sid: "made-up-session-id" },
      secret: "a-different-secret-of-enough-length-000",
      salt: SESSION_COOKIE,
    });
    for (const bad of [...tampered, token.slice(0, -10), "garbage", foreign]) {
      expect((await me(`${SESSION_COOKIE}=${bad}`)).status).toBe(401);
    }
    expect((await me(cookie)).status).toBe(200);
  });

  it("keeps the hash out of every user row it returns", async () => {
    const rows = (await tableRows("users")) as { password_hash: string }[];
    // Stored as argon2id PHC strings (RFC 9106 algorithm; PHC string format).
    expect(rows.length).toBeGreaterThan(0);
    for (const row of rows)
      expect(row.password_hash).toMatch(/^\$argon2id\$v=19\$m=19456,t=2,p=1\$/);
  });
});
