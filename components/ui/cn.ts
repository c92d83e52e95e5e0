export type ClassValue = string | number | bigint | boolean | null | undefined | ClassValue[];

/**
 * Joins class names, skipping falsy values and flattening arrays. It does not
 * resolve Tailwind conflicts: primitives keep their own classes conflict-free so
 * a caller's `className` only adds (layout, margin, width), never overrides.
 */
export function cn(...values: ClassValue[]): string {
  const out: string[] = [];
  for (const value of values) {
    if (Array.isArray(value)) {
      const nested = cn(...value);
      if (nested) out.push(nested);
    } else if (
      typeof value === "string" ||
      typeof value === "number" ||
      typeof value === "bigint"
    ) {
      if (value !== "" && value !== 0) out.push(String(value));
    }
  }
  return out.join(" ");
}
