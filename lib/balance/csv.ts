import type { BalanceBody } from "@/lib/balance/types";
import { spreadsheetCsv } from "@/lib/csv";
import type { MonthRow, PoolName } from "@/lib/engine";
import { columnHeader, toColumnValue, type AmountKind } from "@/lib/format-quantity";

// The Balance month table as CSV: one line per month, each material's columns
// with the unit in the header, numbers in the garden's units rounded as on screen
// (lib/format-quantity.ts). Cells that a spreadsheet would run as a formula
// are neutralised by lib/csv.ts.

const POOLS: { pool: PoolName; title: string; kind: AmountKind; supplied: string }[] = [
  { pool: "castings", title: "Castings", kind: "castings-mass", supplied: "harvested" },
  { pool: "leachate", title: "Leachate", kind: "liquid", supplied: "collected" },
];

const FIGURES: { key: keyof MonthRow; title: string }[] = [
  { key: "opening", title: "opening" },
  { key: "supplied", title: "" }, // named per pool
  // Spilled, given away, spoiled (negative) or a count corrected, by hand on the stock page.
  { key: "adjusted", title: "adjusted by hand" },
  { key: "demand", title: "demand" },
  { key: "allocated", title: "allocated" },
  { key: "agedOut", title: "aged out" },
  { key: "closing", title: "closing" },
  { key: "shortfall", title: "shortfall" },
];

/** Allocated as a share of demand, whole percent; empty when nothing was asked for. */
function coverage(row: MonthRow): number | "" {
  return row.demand > 0 ? Math.round((row.allocated / row.demand) * 100) : "";
}

export function balanceCsv(body: BalanceBody): string {
  const system = body.settings.unitSystem;
  const header = ["Month"];
  for (const p of POOLS) {
    for (const f of FIGURES)
      header.push(columnHeader(`${p.title} ${f.title || p.supplied}`, p.kind, system));
    header.push(`${p.title} coverage (%)`);
  }
  const lines = body.plan.months.map((month) => {
    const line: (string | number)[] = [month];
    for (const p of POOLS) {
      const row = body.plan.rows.find((r) => r.month === month && r.pool === p.pool);
      if (!row) {
        line.push(...FIGURES.map(() => ""), "");
        continue;
      }
      for (const f of FIGURES) line.push(toColumnValue(row[f.key] as number, p.kind, system));
      line.push(coverage(row));
    }
    return line;
  });
  return spreadsheetCsv([header, ...lines]);
}
