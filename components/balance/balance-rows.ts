import type { MonthRow } from "@/lib/engine";

// The month × material table as the grower sorts it. Pure, so the sort is tested apart from React.

export type SortKey =
  | "month"
  | "opening"
  | "supplied"
  | "adjusted"
  | "demand"
  | "allocated"
  | "agedOut"
  | "closing"
  | "shortfall"
  | "coverage";

export interface SortState {
  key: SortKey;
  direction: "ascending" | "descending";
}

/** Share of demand served, 0–1; a month with no demand counts as fully covered. */
export function coverageOf(row: Pick<MonthRow, "demand" | "allocated">): number {
  return row.demand > 0 ? row.allocated / row.demand : 1;
}

function valueOf(row: MonthRow, key: SortKey): number | string {
  if (key === "month") return row.month;
  if (key === "coverage") return coverageOf(row);
  return row[key];
}

/**
 * Rows sorted by one column; ties keep month order and castings before leachate,
 * so a sort never shuffles rows that compare equal.
 */
export function sortRows(rows: readonly MonthRow[], sort: SortState): MonthRow[] {
  const sign = sort.direction === "ascending" ? 1 : -1;
  return rows
    .map((row, index) => ({ row, index }))
    .sort((a, b) => {
      const x = valueOf(a.row, sort.key);
      const y = valueOf(b.row, sort.key);
      if (x < y) return -sign;
      if (x > y) return sign;
      return a.index - b.index;
    })
    .map(({ row }) => row);
}

/** Next state when a column header is pressed: same column flips, a new one starts ascending. */
export function nextSort(current: SortState, key: SortKey): SortState {
  if (current.key !== key) return { key, direction: key === "month" ? "ascending" : "descending" };
  return { key, direction: current.direction === "ascending" ? "descending" : "ascending" };
}
