import { dictionary } from "@zxcvbn-ts/language-common";
import { z } from "zod";

// ASVS 6.2.1 (≥ 8 characters), 6.2.9 (≥ 64 allowed), 6.2.5 (no composition
// rules), 6.2.4 (refuse common passwords). The list is zxcvbn-ts's
// "passwords-common" dictionary (~49,000 leaked passwords).
export const PASSWORD_MIN = 8;
export const PASSWORD_MAX = 128;

let common: Set<string> | undefined;
function commonPasswords(): Set<string> {
  common ??= new Set((dictionary["passwords-common"] as string[]).map((p) => p.toLowerCase()));
  return common;
}

export function isCommonPassword(password: string): boolean {
  return commonPasswords().has(password.toLowerCase());
}

export const newPasswordSchema = z
  .string({ error: "Enter a password." })
  .min(PASSWORD_MIN, `Use at least ${PASSWORD_MIN} characters.`)
  .max(PASSWORD_MAX, `Use at most ${PASSWORD_MAX} characters.`)
  .refine(
    (p) => !isCommonPassword(p),
    "That password is on a list of commonly used ones; pick another.",
  );
