import fc from "fast-check";

// Inputs an attacker (or a broken client) sends, for the write-route fuzz. Every
// arbitrary here yields a request that must be refused: the hostile content
// (SQL, HTML, unicode, prototype keys, NaN) rides inside something that is
// invalid by construction (a wrong JSON type, a string longer than any field
// allows, malformed JSON, a body over the size limit, a non-JSON content type,
// an id that names nothing), so a 2xx answer is always a bug.

const SQL = [
  "' OR '1'='1",
  "'; DROP TABLE users; --",
  "1; SELECT pg_sleep(5)",
  "$1",
  "\\x00",
  "' UNION SELECT password_hash FROM users --",
];
const HTML = [
  "<script>alert(1)</script>",
  '"><img src=x onerror=alert(1)>',
  "javascript:alert(1)",
  "{{7*7}}",
  "${7*7}",
];
const ODD = [
  "__proto__",
  "constructor",
  "prototype",
  "../../etc/passwd",
  "\u0000",
  "\u001b[2J",
  "\u202e",
  "\ufeff",
  "\ud800",
  "🌱🪱",
  "Ω≈ç√",
  "%00",
  "%2F%2Fevil.example",
];

export const hostileString = fc.oneof(
  fc.constantFrom(...SQL, ...HTML, ...ODD),
  fc.string({ unit: "binary", maxLength: 40 }),
  fc.string({ unit: fc.integer({ min: 0, max: 0x1f }).map((c) => String.fromCharCode(c)) }),
);

/** Longer than any text field allows (the longest, currentPassword, stops at 1,024). */
const TOO_LONG = 1100;
export const overlongString = fc
  .tuple(
    fc.array(hostileString, { minLength: 1, maxLength: 4 }),
    fc.integer({ min: TOO_LONG, max: 20_000 }),
  )
  .map(([parts, length]) => {
    const unit = parts.join(" ") || "x";
    return unit.repeat(Math.ceil(length / unit.length) + 1).slice(0, Math.max(length, TOO_LONG));
  });

const nonFinite = fc.constantFrom(Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY);
const hostileNumber = fc.oneof(
  nonFinite,
  fc.constantFrom(-1, -0, 1e308, -1e308, Number.MAX_SAFE_INTEGER + 2, 0.1),
  fc.integer({ min: -(2 ** 31), max: 2 ** 31 }),
  fc.double(),
);
const hostileKey = fc.oneof(
  fc.constantFrom("__proto__", "constructor", "prototype", ...SQL, ...HTML),
  hostileString,
);
const hostileObject = fc.dictionary(hostileKey, fc.jsonValue({ maxDepth: 2 }), { maxKeys: 4 });

/** A value of the wrong JSON type for a field whose valid value is `example`. */
export function wrongValueFor(example: unknown): fc.Arbitrary<unknown> {
  const containers = [fc.array(fc.jsonValue({ maxDepth: 2 }), { maxLength: 3 }), hostileObject];
  if (typeof example === "string")
    return fc.oneof(hostileNumber, fc.boolean(), overlongString, ...containers);
  if (typeof example === "number")
    return fc.oneof(hostileString, fc.boolean(), nonFinite, ...containers);
  if (typeof example === "boolean") return fc.oneof(hostileString, hostileNumber, ...containers);
  return fc.oneof(overlongString, hostileNumber);
}

/** JSON text that keeps NaN and ±Infinity as bare (invalid) tokens instead of JSON.stringify's null. */
export function hostileJson(value: unknown): string {
  return JSON.stringify(value, (_key, v: unknown) =>
    typeof v === "number" && !Number.isFinite(v) ? `\u0000NUM:${v}` : v,
  ).replace(/"\\u0000NUM:(NaN|-?Infinity)"/g, "$1");
}

export interface HostileBody {
  text: string;
  contentType: string;
  kind: string;
}

const ONE_AND_A_BIT_MB = "x".repeat(1_100_000);

/** Bodies that must be refused, built around a valid example body for the route. */
export function hostileBody(example: Record<string, unknown>): fc.Arbitrary<HostileBody> {
  const keys = Object.keys(example);
  const json = (kind: string) => (text: string) => ({
    text,
    contentType: "application/json",
    kind,
  });
  const wrongField = keys.length
    ? fc
        .tuple(
          fc.subarray(keys, { minLength: 1 }),
          fc.array(fc.tuple(hostileKey, fc.jsonValue({ maxDepth: 2 })), { maxLength: 3 }),
        )
        .chain(([chosen, extras]) =>
          fc.tuple(...chosen.map((k) => wrongValueFor(example[k]))).map((values) => {
            const body: Record<string, unknown> = { ...example };
            chosen.forEach((k, i) => (body[k] = values[i]));
            // Own "__proto__" keys, as JSON.parse makes them, not a prototype change.
            for (const [k, v] of extras)
              if (!(k in example))
                Object.defineProperty(body, k, {
                  value: v,
                  enumerable: true,
                  configurable: true,
                  writable: true,
                });
            return hostileJson(body);
          }),
        )
        .map(json("wrong field type"))
    : fc.constant(json("wrong field type")(hostileJson([])));
  const notAnObject = fc
    .oneof(
      hostileString,
      hostileNumber,
      fc.boolean(),
      fc.constant(null),
      fc.array(fc.jsonValue({ maxDepth: 2 })),
    )
    .map((v) => hostileJson(v))
    .map(json("not an object"));
  const exampleText = JSON.stringify(example);
  const malformed = fc
    .oneof(
      fc.constantFrom(
        "{",
        '{"a":',
        "{'a':1}",
        "NaN",
        '{"x": Infinity}',
        "\u0000",
        "[1,2",
        '{"__proto__":',
        "{}}",
      ),
      fc
        .integer({ min: 1, max: Math.max(1, exampleText.length - 1) })
        .map((n) => exampleText.slice(0, n)),
    )
    .map(json("malformed JSON"));
  const oversized = fc.constant(
    json("over the size limit")(JSON.stringify({ ...example, [keys[0] ?? "x"]: ONE_AND_A_BIT_MB })),
  );
  const wrongContentType = fc
    .constantFrom(
      "text/plain",
      "application/x-www-form-urlencoded",
      "multipart/form-data; boundary=x",
      "application/jsonx",
    )
    .map((contentType) => ({ text: exampleText, contentType, kind: "not JSON content type" }));
  return fc.oneof(
    { arbitrary: wrongField, weight: 8 },
    { arbitrary: notAnObject, weight: 3 },
    { arbitrary: malformed, weight: 3 },
    { arbitrary: wrongContentType, weight: 1 },
    { arbitrary: oversized, weight: 1 },
  );
}

/** Path parameters with at least one replaced by something that names nothing. */
export function hostileParams(
  example: Record<string, string>,
): fc.Arbitrary<Record<string, string>> {
  const keys = Object.keys(example);
  const badId = fc.oneof(
    hostileString,
    fc.uuid(),
    fc.constantFrom("", "0", "-1", "null", "undefined"),
  );
  return fc.subarray(keys, { minLength: 1 }).chain((chosen) =>
    fc.tuple(...chosen.map(() => badId)).map((values) => {
      const params = { ...example };
      chosen.forEach((k, i) => (params[k] = values[i]!));
      return params;
    }),
  );
}
