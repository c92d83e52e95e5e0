import { describe, expect, it } from "vitest";
import { confirmTextMismatch, sameConfirmText } from "@/lib/confirm-text";

// Issue 12 item 7: phone keyboards type U+2019 RIGHT SINGLE QUOTATION MARK for an
// apostrophe (iOS "Smart Punctuation", on by default) and may insert U+00A0 NO-BREAK
// SPACE; desktop keyboards type U+0027. Code points from the Unicode Standard charts.
describe("sameConfirmText", () => {
  it.each([
    ["Bo\u2019s Plot", "Bo's Plot"], // curly apostrophe typed, straight stored
    ["Bo's Plot", "Bo\u2019s Plot"], // and the other way round
    ["Bo\u02bcs Plot", "Bo's Plot"], // U+02BC MODIFIER LETTER APOSTROPHE
    ["Bo\uff07s Plot", "Bo's Plot"], // U+FF07 FULLWIDTH APOSTROPHE (NFKC → U+0027)
    ["\u201cEast\u201d beds", '"East" beds'], // curly double quotes
    ["North\u2013South", "North-South"], // en dash for a hyphen
    ["North\u2014South", "North-South"], // em dash
    ["Bo's\u00a0Plot", "Bo's Plot"], // no-break space
    ["Bo's  Plot ", "Bo's Plot"], // doubled and trailing spaces
    ["\uff22o's Plot", "Bo's Plot"], // U+FF22 FULLWIDTH B (NFKC → B)
  ])("%j matches %j", (typed, name) => {
    expect(sameConfirmText(typed, name)).toBe(true);
    expect(confirmTextMismatch(typed, name)).toBeNull();
  });

  it.each([
    ["Bo's Plo", "Bo's Plot"],
    ["bo's plot", "Bo's Plot"], // case still counts: deleting is deliberate
    ["Bos Plot", "Bo's Plot"],
    ["", "Bo's Plot"],
  ])("%j does not match %j", (typed, name) => {
    expect(sameConfirmText(typed, name)).toBe(false);
  });
});

describe("confirmTextMismatch says what differs", () => {
  it("says how much is left to type", () => {
    expect(confirmTextMismatch("Bo's Pl", "Bo's Plot")).toBe("2 more characters to type.");
    expect(confirmTextMismatch("Bo's Plo", "Bo's Plot")).toBe("1 more character to type.");
  });
  it("points at capital letters", () => {
    expect(confirmTextMismatch("bo's plot", "Bo's Plot")).toBe(
      "Capital letters differ: type it as “Bo's Plot”.",
    );
  });
  it("names the first character that differs", () => {
    expect(confirmTextMismatch("Bos Plot", "Bo's Plot")).toBe(
      "Character 3 differs: the name has “'”, you typed “s”.",
    );
    expect(confirmTextMismatch("Bo's Plots", "Bo's Plot")).toBe(
      "There is more than the name: remove “s”.",
    );
  });
  it("is silent before anything is typed", () => {
    expect(confirmTextMismatch("", "Bo's Plot")).toBeNull();
  });
});
