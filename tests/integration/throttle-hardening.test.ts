import "@/tests/support/integration/env";
import { afterAll, afterEach, describe, expect, it, vi } from "vitest";
import * as resend from "@/app/api/gardens/[gardenId]/invitations/[invitationId]/resend/route";
import * as invitations from "@/app/api/gardens/[gardenId]/invitations/route";
import * as account from "@/app/api/account/route";
import * as resetRequest from "@/app/api/password-reset/route";
import * as session from "@/app/api/session/route";
import { clientAddress } from "@/lib/auth/throttle";
import { resetEnvCache } from "@/lib/env";
import {
  call,
  closeHarness,
  cookieFor,
  makeGardenWithRoles,
  signUpUser,
  uniqueEmail,
} from "@/tests/support/integration/harness";

// Issue 7 item 3. Limits are the project's own (lib/auth/throttle.ts): 10 failures per
// account from untrusted clients, 10 per device cookie, 50 per address, in 15 minutes.
// Addresses come from the RFC 5737 documentation ranges.

afterAll(closeHarness);
afterEach(() => {
  vi.unstubAllEnvs();
  resetEnvCache();
});

function setProxies(count: number) {
  vi.stubEnv("TRUSTED_PROXY_COUNT", String(count));
  resetEnvCache();
}

const attempt = (email: string, password: string, headers: Record<string, string>) =>
  call(session.POST, { url: "/api/session", body: { email, password }, headers });

function deviceCookieOf(res: { headers: Headers }): string {
  const set = res.headers.getSetCookie().find((c) => c.startsWith("castline.device="));
  if (!set) throw new Error("no device cookie was issued");
  return set.split(";")[0]!;
}

describe("client address", () => {
  const req = (xff?: string) =>
    new Request("http://localhost:3000/api/session", {
      headers: xff ? { "x-forwarded-for": xff, "x-real-ip": "192.0.2.99" } : {},
    });

  it("ignores forwarding headers unless proxies are trusted", () => {
    setProxies(0);
    expect(clientAddress(req("192.0.2.1"))).toBe("direct");
    expect(clientAddress(req())).toBe("direct");
  });

  it("takes the address the nearest trusted proxy saw, not what the client wrote", () => {
    setProxies(1);
    expect(clientAddress(req("192.0.2.66, 203.0.113.77"))).toBe("203.0.113.77");
    setProxies(2);
    expect(clientAddress(req("192.0.2.66, 203.0.113.77, 10.0.0.2"))).toBe("203.0.113.77");
  });
});

describe("sign-in guessing", () => {
  it("rotating X-Forwarded-For does not escape the 50-per-address limit", async () => {
    setProxies(0);
    const statuses: number[] = [];
    // 6 unknown accounts × 9 guesses: no account reaches its own limit of 10.
    for (let a = 0; a < 6; a++) {
      const email = uniqueEmail("spray");
      for (let i = 0; i < 9; i++) {
        const res = await attempt(email, "guess-guess-1", {
          "x-forwarded-for": `192.0.2.${a * 9 + i + 1}`,
        });
        statuses.push(res.status);
      }
    }
    expect(statuses.filter((s) => s === 401)).toHaveLength(50);
    expect(statuses.slice(50)).toEqual([429, 429, 429, 429]);
  });

  it("a stranger's failures do not lock out the owner's own browser", async () => {
    setProxies(1);
    const owner = await signUpUser("lockout");
    const first = await attempt(owner.email, owner.password, { "x-forwarded-for": "198.51.100.5" });
    expect(first.status).toBe(200);
    const device = deviceCookieOf(first);

    for (let i = 0; i < 12; i++) {
      await attempt(owner.email, "wrong-guess-99", { "x-forwarded-for": `203.0.113.${100 + i}` });
    }
    // Untrusted clients are locked out of this account, even with the right password…
    const untrusted = await attempt(owner.email, owner.password, {
      "x-forwarded-for": "203.0.113.200",
    });
    expect(untrusted.status).toBe(429);
    // …but the browser that signed in before carries a device cookie and is let in.
    const trusted = await attempt(owner.email, owner.password, {
      "x-forwarded-for": "198.51.100.5",
      cookie: device,
    });
    expect(trusted.status).toBe(200);
  });

  it("a device cookie is limited on its own, and only for its own account", async () => {
    setProxies(1);
    const owner = await signUpUser("devicelimit");
    const device = deviceCookieOf(
      await attempt(owner.email, owner.password, { "x-forwarded-for": "198.51.100.6" }),
    );
    const statuses: number[] = [];
    for (let i = 0; i < 11; i++) {
      const res = await attempt(owner.email, "wrong-guess-98", {
        "x-forwarded-for": "198.51.100.6",
        cookie: device,
      });
      statuses.push(res.status);
    }
    expect(statuses.slice(0, 10)).toEqual(Array(10).fill(401));
    expect(statuses[10]).toBe(429);
  });

  it("40 parallel wrong guesses check at most 10 passwords", async () => {
    setProxies(1);
    const owner = await signUpUser("parallel");
    const results = await Promise.all(
      Array.from({ length: 40 }, (_, i) =>
        attempt(owner.email, `parallel-guess-${i}`, { "x-forwarded-for": `198.51.100.${100 + i}` }),
      ),
    );
    const checked = results.filter((r) => r.status === 401).length;
    console.log(`[throttle] 40 parallel guesses: ${checked} checked, ${40 - checked} refused`);
    expect(checked).toBeLessThanOrEqual(10);
    expect(results.every((r) => r.status === 401 || r.status === 429)).toBe(true);
  });
});

describe("mail floods", () => {
  it("limits sign-up requests per target address", async () => {
    setProxies(1);
    const email = uniqueEmail("signupflood");
    const statuses: number[] = [];
    for (let i = 0; i < 4; i++) {
      const res = await call(account.POST, {
        url: "/api/account",
        body: { name: "Flood Tester", email, password: "a-fresh-bed-of-leaves" },
        headers: { "x-forwarded-for": `192.0.2.${10 + i}` },
      });
      statuses.push(res.status);
    }
    expect(statuses[3]).toBe(429);
  });

  it("limits password-reset requests per target address, known or not", async () => {
    setProxies(1);
    for (const email of [(await signUpUser("resetflood")).email, uniqueEmail("resetghost")]) {
      const statuses: number[] = [];
      for (let i = 0; i < 4; i++) {
        const res = await call(resetRequest.POST, {
          url: "/api/password-reset",
          body: { email },
          headers: { "x-forwarded-for": `192.0.2.${30 + i}` },
        });
        statuses.push(res.status);
      }
      expect(statuses).toEqual([202, 202, 202, 429]);
    }
  });

  it("limits invitation sends per invited address and per garden", async () => {
    const world = await makeGardenWithRoles();
    const cookie = await cookieFor(world.owner);
    const at = {
      url: `/api/gardens/${world.gardenId}/invitations`,
      params: { gardenId: world.gardenId },
    };
    const target = uniqueEmail("inviteflood");
    const created = await call(invitations.POST, {
      ...at,
      cookie,
      body: { email: target, role: "viewer" },
    });
    expect(created.status).toBe(201);
    const invitationId = created.json.invitation.id as string;
    const resends: number[] = [];
    for (let i = 0; i < 5; i++) {
      const res = await call(resend.POST, {
        url: `${at.url}/${invitationId}/resend`,
        params: { gardenId: world.gardenId, invitationId },
        cookie,
      });
      resends.push(res.status);
    }
    // 3 sends per invited address per hour: the invitation plus two resends.
    expect(resends).toEqual([200, 200, 429, 429, 429]);

    const perGarden: number[] = [];
    for (let i = 0; i < 20; i++) {
      const res = await call(invitations.POST, {
        ...at,
        cookie,
        body: { email: uniqueEmail(`bulk${i}`), role: "viewer" },
      });
      perGarden.push(res.status);
    }
    // 20 sends per garden per hour, the first invitation and its two resends included.
    expect(perGarden.filter((s) => s === 201)).toHaveLength(17);
    expect(perGarden.slice(17)).toEqual([429, 429, 429]);
  });
});
