import "@/tests/support/integration/env";
import { afterAll, describe, expect, it } from "vitest";
import * as session from "@/app/api/session/route";
import { BAD_CREDENTIALS_MESSAGE } from "@/lib/auth/credentials";
import { call, closeHarness, signUpUser, uniqueEmail } from "@/tests/support/integration/harness";

// Limits are the project's own (lib/auth/throttle.ts): 10 failures per account from
// browsers without a device cookie, and 50 per address, in 15 minutes (device cookies:
// throttle-hardening.test.ts). Addresses are from RFC 5737 documentation ranges,
// one per test so the tests do not count each other's failures.

afterAll(closeHarness);

const attempt = (email: string, password: string, address: string) =>
  call(session.POST, {
    url: "/api/session",
    body: { email, password },
    headers: { "x-forwarded-for": address },
  });

function expectRetryAfter(header: string | null): void {
  // RFC 9110 §10.2.3: Retry-After as delay-seconds, a non-negative integer. Our window is 15 min = 900 s.
  expect(header).toMatch(/^\d+$/);
  const seconds = Number(header);
  expect(seconds).toBeGreaterThan(0);
  expect(seconds).toBeLessThanOrEqual(900);
}

describe("sign-in throttling", () => {
  it("refuses the 11th attempt on one account with 429 and Retry-After, even with the right password", async () => {
    const user = await signUpUser("throttled");
    for (let i = 1; i <= 10; i++) {
      expect(
        (await attempt(user.email, "wrong-password-1", "203.0.113.10")).status,
        `attempt ${i}`,
      ).toBe(401);
    }
    const eleventh = await attempt(user.email, user.password, "203.0.113.10");
    expect(eleventh.status).toBe(429);
    expect(eleventh.json.error.code).toBe("rate_limited:sign_in");
    expectRetryAfter(eleventh.headers.get("retry-after"));
    // The account key counts from any address: a new address does not reset it.
    expect((await attempt(user.email, user.password, "203.0.113.11")).status).toBe(429);
    // Another account on the first address is not affected (10 < the address limit of 50).
    const other = await signUpUser("neighbour");
    expect((await attempt(other.email, other.password, "203.0.113.10")).status).toBe(200);
  });

  it("refuses an address after 50 failures across accounts, and only that address", async () => {
    const address = "203.0.113.50";
    const targets = Array.from({ length: 5 }, () => uniqueEmail("sprayed"));
    // 5 accounts × 10 keeps every account at its own limit, so only the address limit can trip.
    const all = targets.flatMap((email) => Array.from({ length: 10 }, () => email));
    for (let i = 0; i < all.length; i += 10) {
      const batch = await Promise.all(
        all.slice(i, i + 10).map((e) => attempt(e, "guess-guess-1", address)),
      );
      expect(batch.map((r) => r.status)).toEqual(Array(10).fill(401));
    }
    const user = await signUpUser("sharedwifi");
    const blocked = await attempt(user.email, user.password, address);
    expect(blocked.status).toBe(429);
    expectRetryAfter(blocked.headers.get("retry-after"));
    expect((await attempt(user.email, user.password, "203.0.113.51")).status).toBe(200);
  });
});

describe("account enumeration", () => {
  it("answers an unknown e-mail exactly like a wrong password", async () => {
    const user = await signUpUser("enum");
    const unknown = await attempt(uniqueEmail("nobody"), "some-password-9", "198.51.100.20");
    const wrong = await attempt(user.email, "some-password-9", "198.51.100.20");
    expect(unknown.status).toBe(401);
    expect(wrong.status).toBe(unknown.status);
    expect(wrong.json).toEqual(unknown.json);
    expect(unknown.json.error.message).toBe(BAD_CREDENTIALS_MESSAGE);
  });

  it("takes about as long for an unknown e-mail as for a wrong password (loose check)", async () => {
    // A LOOSE check only: medians of 7 tries each on a shared CI machine, and we only
    // require them within a factor of 3. It catches the gross leak (skipping argon2 for
    // unknown addresses: ~1 ms vs ~50+ ms), not small differences.
    const user = await signUpUser("timing");
    const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;
    const time = async (email: string, address: string) => {
      const started = performance.now();
      const res = await attempt(email, "not-the-password-3", address);
      expect(res.status).toBe(401);
      return performance.now() - started;
    };
    // Warm both paths first (the dummy hash is made on first use).
    await time(uniqueEmail("warm"), "198.51.100.30");
    await time(user.email, "198.51.100.31");
    const unknownTimes: number[] = [];
    const wrongTimes: number[] = [];
    for (let i = 0; i < 7; i++) {
      unknownTimes.push(await time(uniqueEmail("ghost"), "198.51.100.30"));
      wrongTimes.push(await time(user.email, "198.51.100.31"));
    }
    const [a, b] = [median(unknownTimes), median(wrongTimes)];
    expect(Math.max(a, b) / Math.min(a, b)).toBeLessThan(3);
  });
});
