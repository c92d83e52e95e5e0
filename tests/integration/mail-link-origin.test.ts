import "@/tests/support/integration/env";
import { afterAll, afterEach, describe, expect, it, vi } from "vitest";
import * as resetRequest from "@/app/api/password-reset/route";
import { resetEnvCache } from "@/lib/env";
import { call, closeHarness, signUpUser, waitForMailTo } from "@/tests/support/integration/harness";

// Issue 7 item 9: in demo mode `Host: attacker.example` put the attacker's domain into a
// password-reset link. Links must use the configured origin; the Host header never decides.

afterAll(closeHarness);
afterEach(() => {
  vi.unstubAllEnvs();
  resetEnvCache();
});

async function resetLinkFor(host: string) {
  const user = await signUpUser("linkorigin");
  const res = await call(resetRequest.POST, {
    url: "/api/password-reset",
    body: { email: user.email },
    headers: { host, "x-forwarded-host": host },
  });
  expect(res.status).toBe(202);
  const mail = await waitForMailTo(user.email, /reset/i);
  return /(https?:\/\/[^\s/]+)\/reset-password\?token=/.exec(mail.text)?.[1];
}

describe("e-mailed links", () => {
  it("ignore a forged Host in demo mode and use localhost:PORT by default", async () => {
    vi.stubEnv("CASTLINE_DEMO", "1");
    vi.stubEnv("APP_ORIGIN", undefined);
    vi.stubEnv("AUTH_URL", undefined);
    vi.stubEnv("PORT", "4123");
    resetEnvCache();
    expect(await resetLinkFor("attacker.example")).toBe("http://localhost:4123");
  });

  it("use the configured origin whatever Host says", async () => {
    vi.stubEnv("APP_ORIGIN", "https://garden.example.org");
    resetEnvCache();
    expect(await resetLinkFor("attacker.example")).toBe("https://garden.example.org");
  });
});
