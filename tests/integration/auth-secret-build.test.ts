import "@/tests/support/integration/env";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, expect, it } from "vitest";

// Issue 7 item 10: `next build` wrote .data/auth-secret into the checkout because the
// secret was generated when lib/auth/next-auth.ts loaded. Loading route modules (what a
// build does) must write nothing; the server makes the secret when it starts.

const dir = fs.mkdtempSync(path.join(os.tmpdir(), "castline-secret-"));
const file = path.join(dir, "auth-secret");
afterAll(() => fs.rmSync(dir, { recursive: true, force: true }));

it("loading every auth route module writes no secret file", async () => {
  delete process.env.AUTH_SECRET;
  process.env.CASTLINE_SECRET_FILE = file;
  await import("@/app/api/auth/[...nextauth]/route");
  await import("@/app/api/session/route");
  await import("@/app/api/account/route");
  expect(fs.existsSync(file)).toBe(false);
  // The server's start-up step makes it, once.
  const { ensureAuthSecret } = await import("@/lib/auth/secret");
  const secret = ensureAuthSecret();
  expect(fs.readFileSync(file, "utf8").trim()).toBe(secret);
});
