import "server-only";
import crypto from "node:crypto";

// Links in e-mails carry a random token; the database keeps only its SHA-256,
// so a leaked database cannot be turned into working links.
export function createLinkToken(): { token: string; tokenHash: string } {
  const token = crypto.randomBytes(32).toString("base64url");
  return { token, tokenHash: hashLinkToken(token) };
}

export function hashLinkToken(token: string): string {
  return crypto.createHash("sha256").update(token).digest("hex");
}
