import crypto from "node:crypto";

// Imported before any app module: lib/env.ts caches process.env on first use,
// so the test settings must be in place first. Whatever the developer's shell
// or CI exports (DATABASE_URL, SMTP_HOST, ...) must not leak into these tests.
for (const name of [
  "DATABASE_URL",
  "SMTP_HOST",
  "SMTP_PORT",
  "SMTP_USER",
  "SMTP_PASSWORD",
  "AUTH_URL",
  "CASTLINE_DEMO",
  "CASTLINE_OUTBOX",
]) {
  delete process.env[name];
}
process.env.PGLITE_DIR = "memory://";
process.env.LOCAL_SMTP_PORT = "0";
// A fresh secret per test file, held in memory: lib/auth/secret.ts prefers AUTH_SECRET
// over its secret file, so the tests never write (or read) .data/auth-secret.
process.env.AUTH_SECRET = crypto.randomBytes(32).toString("base64url");
