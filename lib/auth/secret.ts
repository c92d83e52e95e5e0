import "server-only";
import crypto from "node:crypto";
import fs from "node:fs";
import path from "node:path";

// AUTH_SECRET signs and encrypts session cookies. Production sets it; for a
// fresh clone we generate one per machine and keep it beside the data (never
// committed), so sessions survive restarts without anyone inventing a secret.
let cached: string | undefined;

export function getAuthSecret(): string {
  if (cached) return cached;
  const fromEnv = process.env.AUTH_SECRET;
  if (fromEnv && fromEnv.length >= 16) return (cached = fromEnv);
  const file = process.env.CASTLINE_SECRET_FILE
    ? path.resolve(/*turbopackIgnore: true*/ process.env.CASTLINE_SECRET_FILE)
    : path.join(process.cwd(), ".data", "auth-secret");
  try {
    cached = fs.readFileSync(/*turbopackIgnore: true*/ file, "utf8").trim();
    if (cached.length >= 32) return cached;
  } catch {
    // Not there yet: created below.
  }
  cached = crypto.randomBytes(32).toString("base64url");
  fs.mkdirSync(path.dirname(file), { recursive: true });
  fs.writeFileSync(file, cached, { mode: 0o600 });
  return cached;
}
