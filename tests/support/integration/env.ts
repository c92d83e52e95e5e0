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
  "APP_ORIGIN",
  "PORT",
  "TRUSTED_PROXY_COUNT",
  "CASTLINE_DEMO",
  "CASTLINE_OUTBOX",
]) {
  delete process.env[name];
}
process.env.PGLITE_DIR = "memory://";
process.env.LOCAL_SMTP_PORT = "0";
// Links in mail point where the harness sends its requests (harness.ts BASE_URL).
process.env.APP_ORIGIN = "http://127.0.0.1:3000";
// As if behind one reverse proxy: the harness gives every call its own X-Forwarded-For
// address unless a test sets one, so tests do not share one throttling bucket.
process.env.TRUSTED_PROXY_COUNT = "1";
// A fresh secret per test file, held in memory: lib/auth/secret.ts prefers AUTH_SECRET
// over its secret file, so the tests never write (or read) .data/auth-secret.
process.env.AUTH_SECRET = crypto.randomBytes(32).toString("base64url");
