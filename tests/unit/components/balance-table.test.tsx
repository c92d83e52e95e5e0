import { fireEvent, render, screen, within } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { BalanceTable } from "@/components/balance/balance-table";
import type { MonthRow } from "@/lib/engine";

// 1 lb = 0.45359237 kg (NIST Handbook 44, Appendix C): the rows are written in
// whole pounds so the table's "N lb" can be read back exactly.
const LB = 0.45359237;

function row(
  month: string,
  lb: { opening: number; supplied: number; demand: number; shortfall: number },
): MonthRow {
  const allocated = lb.demand - lb.shortfall;
  const closing = lb.opening + lb.supplied - allocated;
  return {
    month,
    pool: "castings",
    opening: lb.opening * LB,
    supplied: lb.supplied * LB,
    demand: lb.demand * LB,
    allocated: allocated * LB,
    adjusted: 0,
    agedOut: 0,
    closing: closing * LB,
    shortfall: lb.shortfall * LB,
    replayed: false,
    explanation: { kind: "pool-month", inputs: {} },
  };
}

const rows = [
  row("2027-03", { opening: 20, supplied: 44, demand: 30, shortfall: 0 }),
  row("2027-04", { opening: 34, supplied: 0, demand: 50, shortfall: 16 }),
  row("2027-05", { opening: 0, supplied: 44, demand: 10, shortfall: 0 }),
];

function monthsInOrder() {
  const body = screen.getByTestId("balance-table").querySelector("tbody")!;
  return [...body.querySelectorAll("tr")].map((tr) => tr.getAttribute("data-month"));
}

describe("BalanceTable", () => {
  it("starts in month order and shows amounts in pounds, the short month marked", () => {
    render(<BalanceTable rows={rows} system="us" />);
    expect(monthsInOrder()).toEqual(["2027-03", "2027-04", "2027-05"]);
    const april = screen
      .getByTestId("balance-table")
      .querySelector('tr[data-month="2027-04"]') as HTMLElement;
    // 34 + 0 − 34 fed = 0 left; 50 wanted, 16 short.
    expect(within(april).getByText("16 lb short")).toBeTruthy();
    // Coverage 34 / 50 = 68 %.
    expect(within(april).getByText("68 %")).toBeTruthy();
  });

  it("sorts by a column when its header is pressed, and flips on a second press", () => {
    render(<BalanceTable rows={rows} system="us" />);
    const header = screen.getByRole("button", { name: /Wanted/ });
    fireEvent.click(header);
    // First press on an amount sorts largest first: 50, 30, 10 lb wanted.
    expect(monthsInOrder()).toEqual(["2027-04", "2027-03", "2027-05"]);
    expect(header.closest("th")!.getAttribute("aria-sort")).toBe("descending");
    fireEvent.click(header);
    expect(monthsInOrder()).toEqual(["2027-05", "2027-03", "2027-04"]);
    expect(header.closest("th")!.getAttribute("aria-sort")).toBe("ascending");
  });

  it("keeps month order among rows that tie", () => {
    render(<BalanceTable rows={rows} system="us" />);
    // Harvested: 44, 0, 44 lb; descending keeps March before May.
    fireEvent.click(screen.getByRole("button", { name: /Harvested/ }));
    expect(monthsInOrder()).toEqual(["2027-03", "2027-05", "2027-04"]);
  });

  it("links the CSV export when given", () => {
    render(<BalanceTable rows={rows} system="us" csvHref="/api/gardens/g1/balance?format=csv" />);
    expect(screen.getByRole("link", { name: "Download CSV" }).getAttribute("href")).toContain(
      "format=csv",
    );
  });
});
