import "@/tests/support/integration/env";
import { afterAll, describe, expect, it } from "vitest";
import * as accountPassword from "@/app/api/account/password/route";
import * as account from "@/app/api/account/route";
import * as authJs from "@/app/api/auth/[...nextauth]/route";
import * as everywhere from "@/app/api/session/everywhere/route";
import * as session from "@/app/api/session/route";
import {
  call,
  closeHarness,
  signIn,
  signUpUser,
  type Handler,
} from "@/tests/support/integration/harness";

// Issue 7 item 2: after signing out, Auth.js's GET /api/auth/session minted a fresh
// cookie from the old one, and POST /api/auth/signout only cleared the browser's copy.
// A session must be valid only while its record exists on the server.

afterAll(closeHarness);

const me = (cookie: string | null | undefined) =>
  call(account.GET, { url: "/api/account", cookie: cookie ?? undefined });
const authCall = (path: string, method: "GET" | "POST", cookie?: string) =>
  call((method === "GET" ? authJs.GET : authJs.POST) as Handler, {
    url: `/api/auth/${path}`,
    method,
    cookie,
    params: { nextauth: path.split("?")[0]!.split("/") } as unknown as Record<string, string>,
    ...(method === "POST"
      ? { body: "", headers: { "content-type": "application/x-www-form-urlencoded" } }
      : {}),
  });

describe("server-side session allow-list", () => {
  it("a signed-out cookie cannot be revived through /api/auth/session", async () => {
    const user = await signUpUser("revive");
    const cookie = await signIn(user.email, user.password);
    expect((await me(cookie)).status).toBe(200);
    expect(
      (await call(session.DELETE, { url: "/api/session", method: "DELETE", cookie })).status,
    ).toBe(200);
    expect((await me(cookie)).status).toBe(401);

    const revived = await authCall("session", "GET", cookie);
    // No new session cookie may come back, and whatever came back must not work.
    expect(revived.setCookie ?? "").not.toMatch(/castline\.session=[^;]+/);
    expect((await me(revived.cookie ?? cookie)).status).toBe(401);
  });

  it("Auth.js sign-out ends the session on the server, not only in the browser", async () => {
    const user = await signUpUser("authjsout");
    const cookie = await signIn(user.email, user.password);
    await authCall("signout", "POST", cookie);
    expect((await me(cookie)).status).toBe(401);
  });

  it("answers Auth.js endpoints the UI does not use with a JSON 404, never a 500", async () => {
    for (const path of ["error?error=Configuration", "providers", "csrf", "signin", "session"]) {
      const res = await authCall(path, "GET");
      expect(res.status, path).toBe(404);
      expect(res.json?.error?.code, path).toBe("not_found");
    }
    const signInPost = await authCall("callback/credentials", "POST");
    expect(signInPost.status).toBe(404);
  });

  it("a password change and 'sign out everywhere' end other sessions for good", async () => {
    const user = await signUpUser("manydevices");
    const laptop = await signIn(user.email, user.password);
    const phone = await signIn(user.email, user.password);
    const changed = await call(accountPassword.POST, {
      url: "/api/account/password",
      cookie: laptop,
      body: { currentPassword: user.password, newPassword: "compost-tea-at-dawn-77" },
    });
    expect(changed.status).toBe(200);
    expect((await me(phone)).status).toBe(401);
    expect((await me(laptop)).status).toBe(401);
    const kept = changed.cookie!;
    expect((await me(kept)).status).toBe(200);

    const tablet = await signIn(user.email, "compost-tea-at-dawn-77");
    expect(
      (await call(everywhere.POST, { url: "/api/session/everywhere", cookie: kept })).status,
    ).toBe(200);
    expect((await me(kept)).status).toBe(401);
    expect((await me(tablet)).status).toBe(401);
  });
});
