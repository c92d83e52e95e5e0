"use client";

import { useState } from "react";
import { Table, TBody, Td, Th, THead, Tr, buttonStyles, cn } from "@/components/ui";
import { Figure } from "@/components/balance/explanation";
import {
  coverageOf,
  nextSort,
  sortRows,
  type SortKey,
  type SortState,
} from "@/components/balance/balance-rows";
import type { MonthRow } from "@/lib/engine";
import { formatAmount, formatColumnAmount, formatPercent } from "@/lib/format-quantity";
import type { UnitSystem } from "@/lib/units";
import { monthLabel } from "@/components/balance/month-label";

// `figure`: a plain quantity of the row, shown in the garden's units and opening its
// explanation. The columns without one are written out in cellOf below.
const columns: { key: SortKey; label: string; figure?: (row: MonthRow) => number }[] = [
  { key: "month", label: "Month" },
  { key: "opening", label: "Opening", figure: (r) => r.opening },
  { key: "supplied", label: "Harvested / drained", figure: (r) => r.supplied },
  { key: "adjusted", label: "Taken out or added by hand", figure: (r) => r.adjusted },
  { key: "demand", label: "Wanted", figure: (r) => r.demand },
  { key: "allocated", label: "Fed", figure: (r) => r.allocated },
  { key: "agedOut", label: "Aged out", figure: (r) => r.agedOut },
  { key: "closing", label: "Closing", figure: (r) => r.closing },
  { key: "shortfall", label: "Short or spare" },
  { key: "coverage", label: "Coverage" },
];
const figureColumns = columns.filter((c) => c.key !== "month");

export function BalanceTable({
  rows,
  system,
  csvHref,
  onOpenMonth,
}: {
  rows: MonthRow[];
  system: UnitSystem;
  csvHref?: string;
  onOpenMonth?: (month: string) => void;
}) {
  const [sort, setSort] = useState<SortState>({ key: "month", direction: "ascending" });
  const sorted = sortRows(rows, sort);
  // Fixed units per column (no switch to oz for small rows), so the table reads like its CSV.
  const amount = (row: MonthRow, si: number) =>
    formatColumnAmount(si, row.pool === "castings" ? "castings-mass" : "liquid", system);
  return (
    <section aria-labelledby="balance-table-heading" className="flex min-w-0 flex-col gap-2">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h2 id="balance-table-heading" className="text-xl">
          Month by month
        </h2>
        {csvHref ? (
          <a
            href={csvHref}
            download
            className={buttonStyles({ variant: "secondary", size: "sm" })}
            data-testid="balance-csv"
          >
            Download CSV
          </a>
        ) : null}
      </div>
      <Table
        caption="Supply and demand per month and material"
        hideCaption
        data-testid="balance-table"
        className="text-sm sm:text-sm [&_td]:px-2 [&_th]:px-2"
      >
        <THead>
          <Tr>
            {columns.map((c) => (
              <Th
                key={c.key}
                numeric={c.key !== "month"}
                aria-sort={sort.key === c.key ? sort.direction : undefined}
              >
                <button
                  type="button"
                  className="inline-flex min-h-6 items-center gap-1 font-semibold hover:underline"
                  onClick={() => setSort(nextSort(sort, c.key))}
                >
                  {c.label}
                  <span aria-hidden="true">
                    {sort.key === c.key ? (sort.direction === "ascending" ? "▲" : "▼") : ""}
                  </span>
                </button>
              </Th>
            ))}
          </Tr>
        </THead>
        <TBody>
          {sorted.map((row) => {
            const title = `${row.pool === "castings" ? "Castings" : "Leachate"}, ${monthLabel(row.month)}`;
            const cellOf = (column: (typeof columns)[number]) => {
              if (column.figure)
                return (
                  <Figure title={title} explanation={row.explanation}>
                    {amount(row, column.figure(row))}
                  </Figure>
                );
              if (column.key === "coverage")
                return row.demand > 0 ? formatPercent(coverageOf(row)) : "—";
              if (row.shortfall > 0)
                return (
                  <strong className="text-bloom-800">{amount(row, row.shortfall)} short</strong>
                );
              if (row.closing > 0)
                return <span className="text-leaf-800">{amount(row, row.closing)} spare</span>;
              return "even";
            };
            return (
              <Tr
                key={`${row.month}-${row.pool}`}
                data-month={row.month}
                data-pool={row.pool}
                className={cn(row.shortfall > 0 && "bg-bloom-50")}
              >
                <Td className="whitespace-nowrap">
                  {onOpenMonth ? (
                    <button
                      type="button"
                      className="min-h-6 text-left font-semibold text-leaf-800 underline underline-offset-4"
                      onClick={() => onOpenMonth(row.month)}
                    >
                      {monthLabel(row.month)}
                    </button>
                  ) : (
                    <span className="font-semibold">{monthLabel(row.month)}</span>
                  )}
                  <span className="block text-sm text-soil-700">
                    {row.pool === "castings" ? "Castings" : "Leachate"}
                    {row.replayed ? " · logged" : " · forecast"}
                  </span>
                  {row.tea && row.tea.litres > 0 ? (
                    <span className="block text-sm text-soil-700">
                      incl. {formatAmount(row.tea.litres, "liquid", system)} tea from{" "}
                      {formatAmount(row.tea.castingsDemandKg, "castings-mass", system)} castings
                    </span>
                  ) : null}
                </Td>
                {figureColumns.map((c) => (
                  <Td key={c.key} numeric data-col={c.key}>
                    {cellOf(c)}
                  </Td>
                ))}
              </Tr>
            );
          })}
        </TBody>
      </Table>
    </section>
  );
}
