import { z } from "zod";

// Unicode general category Cc: C0 controls, DEL and C1 controls. None belongs in
// a name or a place, PostgreSQL text cannot hold U+0000 at all, and escape
// sequences in names end up in logs and terminals.
// Also refused: invisible format characters that hide or reorder text — the byte
// order mark U+FEFF (which String.trim() would silently strip, turning a field of
// nothing but BOMs into an empty one) and the bidirectional overrides and isolates
// U+202A–U+202E, U+2066–U+2069 (text that reads differently from what it is).
// Zero-width joiners stay: scripts and emoji need them.
const CONTROL_CHARACTER = /[\u0000-\u001f\u007f-\u009f\ufeff\u202a-\u202e\u2066-\u2069]/;

export const CONTROL_CHARACTER_MESSAGE =
  "Use letters, numbers, spaces and punctuation only (no control or invisible formatting characters).";

export function hasControlCharacter(value: string): boolean {
  return CONTROL_CHARACTER.test(value);
}

// A note typed in a textarea keeps its line breaks and tabs; every other character above is refused.
const CONTROL_CHARACTER_BUT_LINES =
  /[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f-\u009f\ufeff\u202a-\u202e\u2066-\u2069]/;

/** A single-line text field: refuses control characters, then trims. */
export function plainText(error?: string) {
  return z
    .string(error ? { error } : undefined)
    .refine((v) => !hasControlCharacter(v), CONTROL_CHARACTER_MESSAGE)
    .trim();
}

/** A multi-line note (a textarea): as plainText, but line breaks and tabs stay. */
export function plainLines(error?: string) {
  return z
    .string(error ? { error } : undefined)
    .refine((v) => !CONTROL_CHARACTER_BUT_LINES.test(v), CONTROL_CHARACTER_MESSAGE)
    .trim();
}
