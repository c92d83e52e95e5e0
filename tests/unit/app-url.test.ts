import { afterEach, describe, expect, it, vi } from "vitest";
import { appBaseUrl } from "@/lib/app-url";
import { resetEnvCache } from "@/lib/env";

// Links in e-mails: the configured origin (APP_ORIGIN, else AUTH_URL); locally and in the
// demo http://localhost:${PORT:-3000}. No request is even consulted, so a forged Host
// cannot put an attacker's domain into a reset link (issue 7 item 9).

function withEnv(vars: Record<string, string | undefined>) {
  for (const [k, v] of Object.entries(vars)) vi.stubEnv(k, v);
  resetEnvCache();
}

afterEach(() => {
  vi.unstubAllEnvs();
  resetEnvCache();
});

describe("appBaseUrl", () => {
  it("uses APP_ORIGIN before AUTH_URL, as an origin without a trailing slash", () => {
    withEnv({ APP_ORIGIN: "https://garden.example.com/", AUTH_URL: "https://auth.example.com" });
    expect(appBaseUrl()).toBe("https://garden.example.com");
    withEnv({ APP_ORIGIN: undefined, AUTH_URL: "https://garden.example.org/api/auth" });
    expect(appBaseUrl()).toBe("https://garden.example.org");
  });

  it("defaults to localhost and PORT in development and demo", () => {
    withEnv({
      APP_ORIGIN: undefined,
      AUTH_URL: undefined,
      NODE_ENV: "development",
      PORT: undefined,
    });
    expect(appBaseUrl()).toBe("http://localhost:3000");
    withEnv({ NODE_ENV: "production", CASTLINE_DEMO: "1", PORT: "4100" });
    expect(appBaseUrl()).toBe("http://localhost:4100");
  });

  it("refuses to make links on a production server with no configured origin", () => {
    withEnv({
      APP_ORIGIN: undefined,
      AUTH_URL: undefined,
      NODE_ENV: "production",
      CASTLINE_DEMO: "0",
    });
    expect(() => appBaseUrl()).toThrow(/APP_ORIGIN/);
  });
});
