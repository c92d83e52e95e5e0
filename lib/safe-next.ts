// Where to send someone after signing in or up. `next` comes from the query
// string, so it is attacker-chosen: it must resolve to our own origin after URL
// parsing, not merely look like a path. Browsers read "\" as "/" in http(s)
// URLs and drop tabs and newlines (WHATWG URL standard), so "/\evil.example"
// and "/\t/evil.example" both mean "//evil.example", another host.

const FALLBACK = "/gardens";
// A stand-in origin: only the question "same origin or not?" matters here.
const BASE = new URL("http://castline.invalid");

export function safeNextPath(next: string | string[] | undefined): string {
  const value = Array.isArray(next) ? next[0] : next;
  if (!value || !value.startsWith("/")) return FALLBACK;
  // Backslashes and control characters have no place in our own paths; refusing
  // them outright also covers parsers less forgiving than the browser's.
  if (/[\\\u0000-\u001f\u007f]/.test(value)) return FALLBACK;
  let url: URL;
  try {
    url = new URL(value, BASE);
  } catch {
    return FALLBACK;
  }
  if (url.origin !== BASE.origin) return FALLBACK;
  const path = `${url.pathname}${url.search}${url.hash}`;
  // Parsing can still yield "//x" from "/.//x"; a leading "//" is always another host.
  return path.startsWith("//") ? FALLBACK : path;
}
