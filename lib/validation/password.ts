import { dictionary } from "@zxcvbn-ts/language-common";
import { z } from "zod";

// OWASP ASVS 5.0 §6.2: ≥ 8 characters (6.2.1), ≥ 64 allowed (6.2.9), no composition rules
// (6.2.5), refuse the top common/breached passwords (6.2.4) and context-specific words
// such as the account's own e-mail or name (6.2.11). NIST SP 800-63B §5.1.1.2 names the
// same list, plus "repetitive or sequential characters (e.g. 'aaaaaa', '1234abcd')".
// The breached list is zxcvbn-ts's "passwords-common" dictionary (~49,000 passwords).
export const PASSWORD_MIN = 8;
export const PASSWORD_MAX = 128;
// Fewer distinct characters than this is a repetition ("aaaaaaaa", "abababab"); our own
// threshold (common practice, not a published figure).
const MIN_DISTINCT_CHARACTERS = 4;

let common: Set<string> | undefined;
function commonPasswords(): Set<string> {
  common ??= new Set((dictionary["passwords-common"] as string[]).map((p) => p.toLowerCase()));
  return common;
}

export function isCommonPassword(password: string): boolean {
  const lower = password.toLowerCase();
  return commonPasswords().has(lower) || commonPasswords().has(lower.trim());
}

/** Why a password is too easy to guess, without knowing whose it is; null when fine. */
export function passwordProblem(password: string): string | null {
  if (password.trim() === "") return "A password of only spaces is easy to guess.";
  if (new Set(password).size < MIN_DISTINCT_CHARACTERS)
    return "That password repeats a few characters; use more different ones.";
  if (isCommonPassword(password))
    return "That password is on a list of commonly used ones; pick another.";
  return null;
}

// Letters and digits only, lower-case: "Rowan Applewood" and "rowan.applewood" compare equal.
const bare = (s: string) => s.toLowerCase().replace(/[^\p{L}\p{N}]/gu, "");

/** Words of this account in the password (its e-mail, the part before @, its name); null when none. */
export function accountPasswordProblem(
  password: string,
  account: { email?: string; name?: string },
): string | null {
  const candidate = bare(password);
  const email = account.email?.trim().toLowerCase() ?? "";
  const words = [email, email.split("@")[0] ?? "", account.name ?? "", "castline"]
    .map(bare)
    .filter((w) => w.length >= 3);
  if (email && password.toLowerCase().includes(email))
    return "Do not use your e-mail address in your password.";
  if (words.some((w) => candidate === w))
    return "Do not use your name or e-mail address as your password.";
  return null;
}

export const newPasswordSchema = z
  .string({ error: "Enter a password." })
  .min(PASSWORD_MIN, `Use at least ${PASSWORD_MIN} characters.`)
  .max(PASSWORD_MAX, `Use at most ${PASSWORD_MAX} characters.`)
  .superRefine((p, ctx) => {
    const problem = passwordProblem(p);
    if (problem) ctx.addIssue({ code: "custom", message: problem });
  });
