import { afterEach, describe, expect, it, vi } from "vitest";
import { logError, redact } from "@/lib/log";

afterEach(() => vi.restoreAllMocks());

// An argon2id hash in the PHC string format (RFC 9106 parameters, as @node-rs/argon2 writes it).
const HASH =
  "$argon2id$v=19$m=19456,t=2,p=1$c29tZXNhbHRzb21lc2FsdA$5Yq0bTh3cDdhXzVJbEtLQ1pxQVRnUGVXbnFtTQ";

describe("redact", () => {
  it("drops values under secret-looking keys at any depth", () => {
    const out = JSON.stringify(
      redact({
        user: { email: "ann@example.com", passwordHash: HASH, name: "Ann" },
        headers: { Cookie: "castline.session=abc", authorization: "Bearer x" },
        token: "t0ken",
        list: [{ secret: "s" }, { newPassword: "p" }],
      }),
    );
    for (const leaked of [
      HASH,
      "castline.session=abc",
      "Bearer x",
      "t0ken",
      '"s"',
      '"p"',
      "ann@example.com",
    ])
      expect(out).not.toContain(leaked);
    expect(out).toContain("Ann");
  });

  it("cuts query parameters and hashes out of messages", () => {
    const message = `Failed query: insert into "users" ("email","password_hash") values ($1, $2)\nparams: ann@example.com,${HASH}`;
    const out = redact(message) as string;
    expect(out).toContain('insert into "users"');
    expect(out).not.toContain("ann@example.com");
    expect(out).not.toContain(HASH);
  });
});

describe("logError", () => {
  it("writes one line with the error's name and code, no parameters", () => {
    const spy = vi.spyOn(console, "error").mockImplementation(() => {});
    const cause = Object.assign(new Error('invalid byte sequence for encoding "UTF8": 0x00'), {
      code: "22021",
    });
    const error = new Error(`Failed query: select 1\nparams: ann@example.com,${HASH}`, { cause });
    logError("unexpected error", error);
    const written = spy.mock.calls.map((c) => c.join(" ")).join("\n");
    expect(written).toContain("22021");
    expect(written).not.toContain("ann@example.com");
    expect(written).not.toContain(HASH);
  });
});
