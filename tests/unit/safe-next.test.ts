import { describe, expect, it } from "vitest";
import { safeNextPath } from "@/lib/safe-next";

// Where the browser goes after signing in. Forms of open-redirect bypass from the
// OWASP "Unvalidated Redirects and Forwards" cheat sheet and the WHATWG URL
// standard (browsers read "\" as "/" in http(s) URLs and drop tabs and newlines).

const FALLBACK = "/gardens";

describe("safeNextPath", () => {
  it.each([
    "/g/7d3c6a3e-0000-4000-8000-000000000000",
    "/gardens?tab=mine",
    "/account#password",
    "/g/abc/%2F%2Fevil.example",
  ])("keeps our own path %j", (value) => {
    expect(safeNextPath(value)).toBe(value);
  });

  it.each([
    "//evil.example",
    "///evil.example/x",
    "/\\evil.example/x",
    "\\\\evil.example",
    "/\\/evil.example",
    "\\/evil.example",
    "/\t/evil.example",
    "/\n/evil.example",
    "/\r\n/evil.example",
    " //evil.example",
    "\u0000//evil.example",
    "https://evil.example",
    "http:evil.example",
    "https:/evil.example",
    "javascript:alert(1)",
    "JaVaScRiPt:alert(1)",
    "data:text/html,<script>alert(1)</script>",
    "evil.example",
    "",
  ])("refuses %j", (value) => {
    expect(safeNextPath(value)).toBe(FALLBACK);
  });

  it("uses the first value when the query repeats next", () => {
    expect(safeNextPath(["/account", "//evil.example"])).toBe("/account");
    expect(safeNextPath(["//evil.example", "/account"])).toBe(FALLBACK);
  });

  it("falls back when next is missing", () => {
    expect(safeNextPath(undefined)).toBe(FALLBACK);
  });

  // Next decodes the query once: ?next=/%5Cevil.example/x arrives as "/\evil.example/x",
  // and ?next=%2F%2Fevil.example as "//evil.example"; both are in the list above.
  // What arrives still encoded stays a path on our origin.
  it("leaves still-encoded slashes and tabs as a path on our origin", () => {
    expect(safeNextPath("/%5Cevil.example/x")).toBe("/%5Cevil.example/x");
    expect(safeNextPath("/%09/evil.example")).toBe("/%09/evil.example");
  });
});
