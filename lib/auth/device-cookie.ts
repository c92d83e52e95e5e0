import "server-only";
import crypto from "node:crypto";
import { readCookie, sessionCookieOptions } from "./cookies";
import { getAuthSecret } from "./secret";

// OWASP "Slow Down Online Guessing Attacks with Device Cookies": a browser that once
// signed in to an account with the right password gets a signed cookie naming that
// account and a random device id. Its later failures are counted per device, not against
// the account, so a stranger who locks the account for untrusted clients does not lock
// out the owner's own browser. The cookie proves nothing else: it never signs anyone in.

export const DEVICE_COOKIE = "castline.device";
const DEVICE_MAX_AGE_SECONDS = 365 * 24 * 60 * 60;

function sign(payload: string): string {
  return crypto
    .createHmac("sha256", getAuthSecret())
    .update(`castline-device-cookie:${payload}`)
    .digest("base64url");
}

function payloadFor(email: string, deviceId: string): string {
  return Buffer.from(JSON.stringify({ e: email.trim().toLowerCase(), d: deviceId })).toString(
    "base64url",
  );
}

export function issueDeviceCookie(email: string): string {
  const payload = payloadFor(email, crypto.randomBytes(16).toString("base64url"));
  const o = sessionCookieOptions();
  const parts = [
    `${DEVICE_COOKIE}=${payload}.${sign(payload)}`,
    `Path=${o.path}`,
    `Max-Age=${DEVICE_MAX_AGE_SECONDS}`,
    "HttpOnly",
    "SameSite=Lax",
  ];
  if (o.secure) parts.push("Secure");
  return parts.join("; ");
}

/** The device id when the request carries a valid device cookie for this account, else null. */
export function trustedDeviceId(request: Request, email: string): string | null {
  const value = readCookie(request.headers.get("cookie"), DEVICE_COOKIE);
  if (!value) return null;
  const [payload, signature] = value.split(".");
  if (!payload || !signature) return null;
  const expected = Buffer.from(sign(payload));
  const given = Buffer.from(signature);
  if (expected.length !== given.length || !crypto.timingSafeEqual(expected, given)) return null;
  try {
    const { e, d } = JSON.parse(Buffer.from(payload, "base64url").toString("utf8")) as {
      e?: unknown;
      d?: unknown;
    };
    if (typeof d !== "string" || e !== email.trim().toLowerCase()) return null;
    return d;
  } catch {
    return null;
  }
}
