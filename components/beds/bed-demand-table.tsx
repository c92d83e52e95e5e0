import type { BedDemandView } from "@/db/queries/bed-demand";
import { formatAmount } from "@/lib/format-quantity";
import type { UnitSystem } from "@/lib/units";

const monthLabel = (m: string) =>
  new Intl.DateTimeFormat("en-US", { month: "short", year: "2-digit", timeZone: "UTC" }).format(
    new Date(`${m}-01T00:00:00Z`),
  );

/** Next 12 months per planting: castings and liquid as applied, and how much of it the stock covers. */
export function BedDemandTable({
  demand,
  plantings,
  unitSystem,
}: {
  demand: BedDemandView;
  plantings: { id: string; title: string }[];
  unitSystem: UnitSystem;
}) {
  if (demand.problem)
    return <p className="text-bloom-700">The plan could not be worked out: {demand.problem}</p>;
  const rows = plantings.filter((p) => demand.byPlanting[p.id]);
  if (!rows.length) return <p className="text-soil-700">Nothing is due in the next 12 months.</p>;
  return (
    <div
      className="overflow-x-auto rounded-card border border-loam-300"
      tabIndex={0}
      role="region"
      aria-label="Demand per planting, next 12 months (scrolls sideways)"
    >
      <table className="min-w-full border-collapse text-sm">
        <caption className="sr-only">
          Castings and liquid due per planting and month, with coverage from stock
        </caption>
        <thead className="bg-loam-100">
          <tr>
            <th scope="col" className="sticky left-0 bg-loam-100 px-3 py-2 text-left">
              Planting
            </th>
            {demand.months.map((m) => (
              <th key={m} scope="col" className="px-3 py-2 text-right whitespace-nowrap">
                {monthLabel(m)}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((p) => (
            <tr key={p.id} className="border-t border-loam-200">
              <th
                scope="row"
                className="sticky left-0 bg-white px-3 py-2 text-left font-semibold whitespace-nowrap"
              >
                {p.title}
              </th>
              {demand.byPlanting[p.id]!.map((c) => (
                <td
                  key={c.month}
                  className="px-3 py-2 text-right align-top whitespace-nowrap tabular-nums"
                >
                  {c.coveragePct === null ? (
                    <span className="text-soil-600" aria-label="nothing due">
                      –
                    </span>
                  ) : (
                    <>
                      {c.castingsKg > 0 ? (
                        <div>{formatAmount(c.castingsKg, "castings-mass", unitSystem)}</div>
                      ) : null}
                      {c.liquidL > 0 ? (
                        <div>{formatAmount(c.liquidL, "liquid", unitSystem)}</div>
                      ) : null}
                      <div
                        className={
                          c.coveragePct < 99.5 ? "font-semibold text-bloom-700" : "text-leaf-800"
                        }
                      >
                        {Math.round(c.coveragePct)} % covered
                      </div>
                    </>
                  )}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
