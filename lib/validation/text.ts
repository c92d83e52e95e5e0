import { z } from "zod";

// Unicode general category Cc: C0 controls, DEL and C1 controls. None belongs in
// a name or a place, PostgreSQL text cannot hold U+0000 at all, and escape
// sequences in names end up in logs and terminals.
const CONTROL_CHARACTER = /[\u0000-\u001f\u007f-\u009f]/;

export const CONTROL_CHARACTER_MESSAGE =
  "Use letters, numbers, spaces and punctuation only (no control characters).";

export function hasControlCharacter(value: string): boolean {
  return CONTROL_CHARACTER.test(value);
}

/** A single-line text field: refuses control characters, then trims. */
export function plainText(error?: string) {
  return z
    .string(error ? { error } : undefined)
    .refine((v) => !hasControlCharacter(v), CONTROL_CHARACTER_MESSAGE)
    .trim();
}
