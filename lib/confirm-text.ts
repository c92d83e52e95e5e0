// Type-to-confirm (deleting a garden) compares what was typed with a name. Phone
// keyboards "smarten" punctuation: iOS types U+2019 for an apostrophe and curly
// double quotes, some keyboards put a dash for "--" or a no-break space after
// autocorrect. None of that is a different name, so both sides are normalised first:
// Unicode NFKC (folds full-width and compatibility forms, e.g. U+FF07 → "'", and
// no-break spaces → " "), then the quote, apostrophe and dash look-alikes below, then
// runs of white space to one space, trimmed. Case still counts: deleting is deliberate.

const lookAlikes: [RegExp, string][] = [
  // ‘ ’ ‚ ‛ ′ ʼ ʹ ` ´ → '
  [/[\u2018\u2019\u201a\u201b\u2032\u02bc\u02b9\u0060\u00b4]/g, "'"],
  // “ ” „ ‟ ″ « » → "
  [/[\u201c\u201d\u201e\u201f\u2033\u00ab\u00bb]/g, '"'],
  // ‐ ‑ ‒ – — ― − → -
  [/[\u2010\u2011\u2012\u2013\u2014\u2015\u2212]/g, "-"],
];

export function normaliseConfirmText(text: string): string {
  let out = text.normalize("NFKC");
  for (const [pattern, plain] of lookAlikes) out = out.replace(pattern, plain);
  return out.replace(/\s+/gu, " ").trim();
}

export function sameConfirmText(typed: string, expected: string): boolean {
  const want = normaliseConfirmText(expected);
  return want.length > 0 && normaliseConfirmText(typed) === want;
}

const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? "" : "s"}`;

/**
 * What stands between the typed text and the name, in a sentence, or null when they
 * match or nothing is typed yet. Positions count characters after normalising.
 */
export function confirmTextMismatch(typed: string, expected: string): string | null {
  const have = Array.from(normaliseConfirmText(typed));
  const want = Array.from(normaliseConfirmText(expected));
  if (have.length === 0 || have.join("") === want.join("")) return null;
  if (have.join("").toLowerCase() === want.join("").toLowerCase())
    return `Capital letters differ: type it as “${want.join("")}”.`;
  let i = 0;
  while (i < have.length && i < want.length && have[i] === want[i]) i++;
  if (i === have.length) return `${plural(want.length - i, "more character")} to type.`;
  if (i === want.length) return `There is more than the name: remove “${have.slice(i).join("")}”.`;
  return `Character ${i + 1} differs: the name has “${want[i]}”, you typed “${have[i]}”.`;
}
