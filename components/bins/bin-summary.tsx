import { Alert, Card, CardBody, CardHeader, CardTitle } from "@/components/ui";
import type { BinDto } from "@/db/queries/bins";
import type { BinSupply, PlanWarning } from "@/lib/engine";
import { formatDay } from "@/lib/format";
import { formatAmount } from "@/lib/format-quantity";
import type { UnitSystem } from "@/lib/units";

// What the engine's plan says about one bin: the next harvest, its
// calibration, and whether the worms can keep up with the feeding planned.

const capacityText: Record<string, string> = {
  "capacity-intake":
    "More food is planned than these worms can eat in a day. Feed less, or add worms.",
  "capacity-surface":
    "The tray surface is too small for the food planned. Spread feedings out, or use a wider bin.",
};

export function BinSummary({
  bin,
  supply,
  warnings,
  today,
  system,
  volumeL,
  loggedWorms,
}: {
  bin: BinDto;
  supply: BinSupply | undefined;
  warnings: PlanWarning[];
  today: string;
  system: UnitSystem;
  volumeL: number;
  /** Start, moves in and out, and the latest count: what a move is checked against. */
  loggedWorms: number;
}) {
  const next = supply?.tasks.find((t) => t.kind === "harvest-tray" && t.date >= today && !t.logged);
  const nextTray = supply?.tasks.find((t) => t.kind === "add-tray" && t.date >= today && !t.logged);
  const month = today.slice(0, 7);
  const wormsNow = supply?.months.find((m) => m.month === month)?.worms;
  const cal = supply?.calibration;
  const mine = warnings.filter((w) => w.binId === bin.id && w.kind in capacityText);
  const kinds = [...new Set(mine.map((w) => w.kind))];
  return (
    <Card>
      <CardHeader>
        <CardTitle>Forecast</CardTitle>
      </CardHeader>
      <CardBody className="flex flex-col gap-3">
        {bin.retiredOn ? (
          <p>Retired on {formatDay(bin.retiredOn)}: no forecast after that day.</p>
        ) : null}
        <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-2">
          <dt className="font-semibold">Next harvest</dt>
          <dd>
            {next ? (
              <>
                {formatDay(next.date, { weekday: "short", month: "short", day: "numeric" })}
                {next.amount !== null
                  ? `, about ${formatAmount(next.amount, "castings-mass", system)}`
                  : ""}
              </>
            ) : (
              "None in the next twelve months"
            )}
          </dd>
          <dt className="font-semibold">Next tray on</dt>
          <dd>{nextTray ? formatDay(nextTray.date) : "—"}</dd>
          <dt className="font-semibold">Calibration</dt>
          <dd>
            {cal && cal.harvestsUsed > 0
              ? `Scaled ×${cal.factor.toFixed(2)} from ${cal.harvestsUsed} logged harvest${cal.harvestsUsed === 1 ? "" : "s"}`
              : "Not yet: log a harvest with its weight and the forecast learns from it"}
          </dd>
          <dt className="font-semibold">Worms on record</dt>
          <dd>
            <span data-testid="logged-worms">{loggedWorms.toLocaleString("en-US")}</span>
            <span className="block text-sm text-soil-700">
              Start, moves and your last count: a move may take up to this many. Log a count when
              they have multiplied.
            </span>
          </dd>
          <dt className="font-semibold">Worms now</dt>
          <dd>
            {wormsNow !== undefined
              ? `about ${Math.round(wormsNow).toLocaleString("en-US")} (forecast)`
              : "—"}
          </dd>
          <dt className="font-semibold">Tray inside</dt>
          <dd>
            {formatAmount(bin.trayLengthM, "tray-side", system)} ×{" "}
            {formatAmount(bin.trayWidthM, "tray-side", system)} ×{" "}
            {formatAmount(bin.trayDepthM, "tray-side", system)} (
            {formatAmount(volumeL, "tray-volume", system)})
          </dd>
          {supply ? (
            <>
              <dt className="font-semibold">Liquid</dt>
              <dd>about {formatAmount(supply.leachateLPerDay * 7, "liquid", system)} a week</dd>
            </>
          ) : null}
        </dl>
        {kinds.map((k) => (
          <Alert key={k} tone="caution" title="Worm capacity">
            {capacityText[k]}
          </Alert>
        ))}
      </CardBody>
    </Card>
  );
}
