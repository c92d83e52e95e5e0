import { findListedCrop } from "@/lib/crops/crop-list";

// Quick entry: "6 tomato, 4 pepper" (or "6 tomatoes and 4 peppers", "basil x3")
// becomes one planting per part. Parsing is pure so the form can preview it
// and the server can check it with the same code.

export interface QuickEntryPart {
  count: number;
  name: string;
}

export interface QuickEntryResult {
  parts: QuickEntryPart[];
  /** One message per part that could not be read, naming the part. */
  errors: string[];
}

const SEPARATORS = /\s*(?:,|;|\n|\band\b|&|\+)\s*/i;

export function parseQuickEntry(text: string): QuickEntryResult {
  const parts: QuickEntryPart[] = [];
  const errors: string[] = [];
  for (const raw of text.split(SEPARATORS)) {
    const part = raw.trim();
    if (!part) continue;
    const leading = /^(\d+)\s*[x×]?\s+(.+)$/i.exec(part);
    const trailing = /^(.+?)\s*[x×]\s*(\d+)$/i.exec(part);
    const count = leading ? Number(leading[1]) : trailing ? Number(trailing[2]) : NaN;
    const name = (leading ? leading[2] : trailing ? trailing[1] : part)!.trim();
    if (!Number.isInteger(count)) {
      errors.push(`"${part}": say how many, e.g. "6 ${name}".`);
    } else if (count < 1) {
      errors.push(`"${part}": at least one plant.`);
    } else {
      parts.push({ count, name });
    }
  }
  if (!parts.length && !errors.length)
    errors.push('Type what you planted, e.g. "6 tomato, 4 pepper".');
  return { parts, errors };
}

function singular(word: string): string[] {
  const w = word.toLowerCase();
  const out = [w];
  if (w.endsWith("oes")) out.push(w.slice(0, -2));
  if (w.endsWith("ies")) out.push(`${w.slice(0, -3)}y`);
  if (w.endsWith("s")) out.push(w.slice(0, -1));
  return out;
}

/**
 * The crop a typed name means, from the crops the garden can use: exact name
 * first, then the crop list's aliases ("zucchini" → Squash), then a plural
 * ("tomatoes" → Tomato). undefined when nothing matches.
 */
export function matchCrop<C extends { name: string | null }>(
  name: string,
  crops: C[],
): C | undefined {
  const byName = new Map<string, C>();
  for (const c of crops)
    if (c.name && !byName.has(c.name.toLowerCase())) byName.set(c.name.toLowerCase(), c);
  for (const candidate of singular(name.trim())) {
    const hit =
      byName.get(candidate) ?? byName.get(findListedCrop(candidate)?.name.toLowerCase() ?? "");
    if (hit) return hit;
  }
  return undefined;
}
