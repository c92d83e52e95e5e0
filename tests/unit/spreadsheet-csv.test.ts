import { describe, expect, it } from "vitest";
import { readCsvCell, spreadsheetCsv } from "@/lib/csv";

// CSV injection (OWASP "CSV Injection"): a cell starting with = + - @ tab or CR
// runs as a formula when a spreadsheet opens the file; prefixing ' makes it text.

describe("spreadsheetCsv", () => {
  it("prefixes formula-looking text cells, leaves numbers and plain text alone", () => {
    expect(spreadsheetCsv([["=1+2", "+A1", "-x", "@SUM(A1)", "plain", -3, 4.5]])).toBe(
      `"'=1+2","'+A1","'-x","'@SUM(A1)",plain,-3,4.5`,
    );
  });

  it("neutralises a multi-line cell that starts with = (papaparse's own pattern stops at the newline)", () => {
    expect(spreadsheetCsv([['=HYPERLINK("http://x.example")\nsecond line']])).toBe(
      `"'=HYPERLINK(""http://x.example"")\nsecond line"`,
    );
  });
});

describe("readCsvCell", () => {
  it("gives our neutralised cell its text back, and flags one that still looks like a formula", () => {
    expect(readCsvCell("'=SUM(A1)")).toEqual({ text: "=SUM(A1)", looksLikeFormula: false });
    expect(readCsvCell("=SUM(A1)")).toEqual({ text: "=SUM(A1)", looksLikeFormula: true });
    expect(readCsvCell("  Tomato ")).toEqual({ text: "Tomato", looksLikeFormula: false });
    expect(readCsvCell("'quoted")).toEqual({ text: "'quoted", looksLikeFormula: false });
  });
});
