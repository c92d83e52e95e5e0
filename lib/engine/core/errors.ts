/**
 * The one error the engine throws for bad input. `field` names the input that
 * was wrong (a dotted path such as "bins[0].trayInsideVolumeL") so a form or the
 * scenario CLI can point at it instead of printing a stack trace.
 */
export class EngineInputError extends Error {
  readonly field: string;

  constructor(field: string, message: string) {
    super(`${field}: ${message}`);
    this.name = "EngineInputError";
    this.field = field;
  }
}

// `suffix` is joined to `field` only when a check fails: callers that check thousands of values
// pass a base ("plantings[3]") and a suffix (".plantCount") instead of building each name.

/** A finite number, or an EngineInputError naming the field. */
export function requireFinite(value: unknown, field: string, suffix = ""): number {
  if (typeof value !== "number" || !Number.isFinite(value)) {
    throw new EngineInputError(field + suffix, `must be a finite number (got ${String(value)})`);
  }
  return value;
}

/** A finite number > 0 and ≤ max (when given). */
export function requirePositive(value: unknown, field: string, max?: number, suffix = ""): number {
  const n = requireFinite(value, field, suffix);
  if (n <= 0) throw new EngineInputError(field + suffix, `must be greater than 0 (got ${n})`);
  if (max !== undefined && n > max) {
    throw new EngineInputError(field + suffix, `must be at most ${max} (got ${n})`);
  }
  return n;
}

/** A finite number ≥ 0 and ≤ max (when given). */
export function requireNonNegative(
  value: unknown,
  field: string,
  max?: number,
  suffix = "",
): number {
  const n = requireFinite(value, field, suffix);
  if (n < 0) throw new EngineInputError(field + suffix, `must not be negative (got ${n})`);
  if (max !== undefined && n > max) {
    throw new EngineInputError(field + suffix, `must be at most ${max} (got ${n})`);
  }
  return n;
}

/** A whole number within [min, max]. */
export function requireInteger(value: unknown, field: string, min: number, max: number): number {
  const n = requireFinite(value, field);
  if (!Number.isInteger(n) || n < min || n > max) {
    throw new EngineInputError(field, `must be a whole number from ${min} to ${max} (got ${n})`);
  }
  return n;
}
