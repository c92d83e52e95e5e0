import "server-only";
import crypto from "node:crypto";
import fs from "node:fs";
import path from "node:path";

// AUTH_SECRET encrypts session cookies and signs device cookies. Production sets it; for
// a fresh clone the server generates one per machine when it starts (ensureAuthSecret,
// called from instrumentation.ts) and keeps it beside the data, never committed. Nothing
// here runs at module load, so `next build` writes no secret into the checkout.
let cached: string | undefined;

function secretFile(): string {
  return process.env.CASTLINE_SECRET_FILE
    ? path.resolve(/*turbopackIgnore: true*/ process.env.CASTLINE_SECRET_FILE)
    : path.join(process.cwd(), ".data", "auth-secret");
}

function fromEnvOrFile(): string | undefined {
  const fromEnv = process.env.AUTH_SECRET;
  if (fromEnv && fromEnv.length >= 16) return fromEnv;
  try {
    const stored = fs.readFileSync(/*turbopackIgnore: true*/ secretFile(), "utf8").trim();
    if (stored.length >= 32) return stored;
  } catch {
    // Not there yet.
  }
  return undefined;
}

/** Server start-up: makes sure a secret exists (creating the file if need be) and returns it. */
export function ensureAuthSecret(): string {
  cached ??= fromEnvOrFile();
  if (cached) return cached;
  const file = secretFile();
  cached = crypto.randomBytes(32).toString("base64url");
  fs.mkdirSync(path.dirname(file), { recursive: true });
  fs.writeFileSync(file, cached, { mode: 0o600 });
  return cached;
}

/** The secret for a request. Start-up normally made it; a request is never at build time. */
export function getAuthSecret(): string {
  return cached ?? ensureAuthSecret();
}
