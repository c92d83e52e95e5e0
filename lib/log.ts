// The one way server code writes problems to the log. Nothing that could be a
// credential or personal data leaves here: values under secret-looking keys are
// dropped, query parameters are cut out of database messages, and e-mail
// addresses and argon2 hashes found anywhere in text are masked.

const SECRET_KEY = /pass|hash|token|secret|cookie|authorization|session|email|params/i;
const REDACTED = "[redacted]";

function redactText(text: string): string {
  return (
    text
      // Drizzle puts "\nparams: a,b,c" after the SQL; pg's detail lines quote values too.
      .replace(/\n?\s*params:[\s\S]*$/i, "\nparams: [redacted]")
      .replace(/\$argon2(id|i|d)\$[^\s,'")]*/g, "[argon2 hash]")
      .replace(/[^\s@,'"()<>]+@[^\s@,'"()<>]+\.[^\s@,'"()<>]+/g, "[e-mail]")
  );
}

/** A copy of `value` safe to log (depth-limited; cycles cut). */
export function redact(value: unknown, depth = 0, seen = new WeakSet<object>()): unknown {
  if (typeof value === "string") return redactText(value);
  if (value === null || typeof value !== "object") return value;
  if (depth > 4 || seen.has(value)) return "[…]";
  seen.add(value);
  if (Array.isArray(value)) return value.map((v) => redact(v, depth + 1, seen));
  const out: Record<string, unknown> = {};
  for (const [key, v] of Object.entries(value)) {
    out[key] = SECRET_KEY.test(key) ? REDACTED : redact(v, depth + 1, seen);
  }
  return out;
}

interface ErrorSummary {
  name: string;
  message: string;
  code?: string;
  stack?: string;
  cause?: ErrorSummary;
}

// Only name, code, message and our own stack frames: driver errors carry the query's
// parameters in fields (params, detail, where) that are never copied.
function summarize(error: unknown, depth = 0): ErrorSummary {
  if (!(error instanceof Error)) return { name: typeof error, message: redactText(String(error)) };
  const code = (error as { code?: unknown }).code;
  const frames = (error.stack ?? "").split("\n").filter((l) => /^\s+at /.test(l));
  return {
    name: error.name,
    message: redactText(error.message),
    ...(typeof code === "string" ? { code } : {}),
    ...(frames.length ? { stack: frames.slice(0, 8).join("\n") } : {}),
    ...(error.cause !== undefined && depth < 3 ? { cause: summarize(error.cause, depth + 1) } : {}),
  };
}

/** Logs an unexpected failure as one JSON line. */
export function logError(context: string, error: unknown, extra?: Record<string, unknown>): void {
  console.error(
    `[castline] ${context}`,
    JSON.stringify({ error: summarize(error), ...(extra ? { extra: redact(extra) } : {}) }),
  );
}

export function logWarning(context: string, detail?: unknown): void {
  console.warn(`[castline] ${context}`, detail === undefined ? "" : JSON.stringify(redact(detail)));
}
