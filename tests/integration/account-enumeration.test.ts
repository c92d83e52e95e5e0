import "@/tests/support/integration/env";
import { afterAll, describe, expect, it } from "vitest";
import * as account from "@/app/api/account/route";
import * as resetRequest from "@/app/api/password-reset/route";
import { getLocalOutbox } from "@/services/mail";
import {
  call,
  closeHarness,
  signUpUser,
  uniqueEmail,
  waitForMailTo,
} from "@/tests/support/integration/harness";

// Issue 7 item 8: sign-up answered 409 for a known address, and a reset request took
// ~174 ms for a known address against ~12 ms for an unknown one.

afterAll(closeHarness);

const signUpWith = (email: string) =>
  call(account.POST, {
    url: "/api/account",
    body: { name: "Probe Person", email, password: "a-fresh-bed-of-leaves" },
  });

describe("sign-up does not tell which addresses have accounts", () => {
  it("answers a known address with the same status and body as a new one", async () => {
    const existing = await signUpUser("known");
    const known = await signUpWith(existing.email);
    const fresh = await signUpWith(uniqueEmail("fresh"));
    expect(known.status).toBe(fresh.status);
    expect(known.json).toEqual(fresh.json);
    // The owner of the known address hears that someone tried.
    const notice = await waitForMailTo(existing.email, /sign up|signed up|account/i);
    expect(notice.text).toMatch(/already has an account|tried to sign up/i);
  });
});

describe("password-reset requests do equal work either way", () => {
  it("answers before any mail is sent, for a known and an unknown address (timings printed)", async () => {
    const user = await signUpUser("timed");
    const time = async (email: string) => {
      const started = performance.now();
      const res = await call(resetRequest.POST, { url: "/api/password-reset", body: { email } });
      const ms = performance.now() - started;
      expect(res.status).toBe(202);
      // The handler has answered; the mail goes out after the response (never awaited
      // inside it), so nothing addressed to this address is in the outbox yet.
      const early = (await getLocalOutbox())?.filter((m) => m.to.includes(email)) ?? [];
      return { ms, early: early.length, json: res.json };
    };
    await time(uniqueEmail("warmup"));
    const known = await time(user.email);
    const unknown = await time(uniqueEmail("nobody"));
    console.log(
      `[enumeration] reset request: known ${known.ms.toFixed(1)} ms, unknown ${unknown.ms.toFixed(1)} ms`,
    );
    expect(known.json).toEqual(unknown.json);
    expect(known.early).toBe(0);
    // …and it does arrive afterwards.
    await waitForMailTo(user.email, /reset/i);
  });
});
