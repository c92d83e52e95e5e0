import { afterEach, describe, expect, it, vi } from "vitest";
import { appBaseUrl } from "@/lib/app-url";
import { resetEnvCache } from "@/lib/env";

// Links in e-mails: AUTH_URL when set; the browser's Host locally; never a
// forged Host on a production server (password-reset poisoning).

function request(host: string) {
  // Next builds request.url from its own hostname, not the Host header.
  return new Request("http://localhost:3000/api/password-reset", { headers: { host } });
}

function withEnv(vars: Record<string, string | undefined>) {
  for (const [k, v] of Object.entries(vars)) vi.stubEnv(k, v);
  resetEnvCache();
}

afterEach(() => {
  vi.unstubAllEnvs();
  resetEnvCache();
});

describe("appBaseUrl", () => {
  it("uses AUTH_URL, without a trailing slash, whatever Host says", () => {
    withEnv({ AUTH_URL: "https://garden.example.com/", NODE_ENV: "production" });
    expect(appBaseUrl(request("evil.example.net"))).toBe("https://garden.example.com");
  });

  it("follows the Host the browser used in development and demo", () => {
    withEnv({ AUTH_URL: undefined, NODE_ENV: "development" });
    expect(appBaseUrl(request("127.0.0.1:43955"))).toBe("http://127.0.0.1:43955");
    withEnv({ NODE_ENV: "production", CASTLINE_DEMO: "1" });
    expect(appBaseUrl(request("127.0.0.1:3000"))).toBe("http://127.0.0.1:3000");
  });

  it("ignores Host on a production server without AUTH_URL", () => {
    withEnv({ AUTH_URL: undefined, NODE_ENV: "production", CASTLINE_DEMO: "0" });
    expect(appBaseUrl(request("evil.example.net"))).toBe("http://localhost:3000");
  });

  it("refuses a malformed Host header", () => {
    withEnv({ AUTH_URL: undefined, NODE_ENV: "development" });
    expect(appBaseUrl(request("a b/c"))).toBe("http://localhost:3000");
  });
});
