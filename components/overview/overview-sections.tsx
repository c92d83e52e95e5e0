import type { ReactNode } from "react";
import Link from "next/link";
import { Alert, Card, CardBody, CardHeader, CardTitle, buttonStyles } from "@/components/ui";
import { LiquidCaution, PreHarvestCaution } from "@/components/balance/feeding-cautions";
import type { GardenNames } from "@/components/balance/garden-names";
import { nameLookup } from "@/components/balance/garden-names";
import type { GardenStatus } from "@/components/overview/garden-status";
import { explain } from "@/lib/explain-sentences";
import { formatDay } from "@/lib/format";
import { formatAmount, formatPoolAmount } from "@/lib/format-quantity";
import type { UnitSystem } from "@/lib/units";

// The overview's sections. Server components: they render words, no state.

export function ThisMonth({
  status,
  system,
  gardenId,
}: {
  status: GardenStatus;
  system: UnitSystem;
  gardenId: string;
}) {
  return (
    <OverviewCard title="This month" bodyClassName="flex flex-col gap-1">
      {status.thisMonth.map((r) => {
        const a = (si: number) => formatPoolAmount(si, r.pool, system);
        return (
          <p key={r.pool} data-testid={`this-month-${r.pool}`}>
            <strong>{r.pool === "castings" ? "Castings" : "Leachate"}:</strong> {a(r.opening)} on
            hand at the start, {a(r.supplied)} {r.pool === "castings" ? "harvested" : "collected"},{" "}
            {a(r.demand)} wanted —{" "}
            {r.shortfall > 0 ? (
              <strong className="text-bloom-800">{a(r.shortfall)} short</strong>
            ) : (
              "all fed"
            )}
            {r.tea && r.tea.litres > 0
              ? ` (incl. ${formatAmount(r.tea.litres, "liquid", system)} tea brewed from ${formatAmount(r.tea.castingsDemandKg, "castings-mass", system)} castings)`
              : ""}
            .
          </p>
        );
      })}
      <Link
        href={`/g/${gardenId}/balance`}
        className={buttonStyles({ variant: "ghost", size: "sm", className: "self-start" })}
      >
        Open the balance
      </Link>
    </OverviewCard>
  );
}

export function NextHarvests({
  status,
  names,
  system,
}: {
  status: GardenStatus;
  names: GardenNames;
  system: UnitSystem;
}) {
  const nameOf = nameLookup(names);
  return (
    <OverviewCard title="Next harvests">
      {status.nextHarvests.length === 0 ? (
        <EmptyNote>No tray is due for harvest in the next months.</EmptyNote>
      ) : (
        <ul className="flex flex-col gap-1">
          {status.nextHarvests.map((h) => (
            <li key={`${h.binId}-${h.date}`}>
              {formatDay(h.date)}: {nameOf("bin", h.binId) ?? "a bin"}
              {h.amountKg !== null
                ? `, about ${formatPoolAmount(h.amountKg, "castings", system)}`
                : ""}
            </li>
          ))}
        </ul>
      )}
    </OverviewCard>
  );
}

export function DueThisWeek({
  status,
  names,
  system,
}: {
  status: GardenStatus;
  names: GardenNames;
  system: UnitSystem;
}) {
  const nameOf = nameLookup(names);
  const liquids = status.dueThisWeek.some((f) => f.material !== "castings");
  return (
    <OverviewCard title="Feedings due this week" bodyClassName="flex flex-col gap-2">
      {status.dueThisWeek.length === 0 ? (
        <EmptyNote>Nothing is due in the next seven days.</EmptyNote>
      ) : (
        <ul className="flex flex-col gap-1">
          {status.dueThisWeek.map((f) => (
            <li key={f.id}>
              {formatDay(f.date)}: {nameOf("planting", f.plantingId) ?? "a planting"} —{" "}
              {formatAmount(
                f.amount,
                f.material === "castings" ? "castings-mass" : "liquid",
                system,
              )}{" "}
              {f.material}
              {f.status === "blocked" ? " (held back: pre-harvest interval)" : ""}
            </li>
          ))}
        </ul>
      )}
      {liquids ? <LiquidCaution /> : null}
    </OverviewCard>
  );
}

export function StockOnHand({
  status,
  names,
  system,
  gardenId,
}: {
  status: GardenStatus;
  names: GardenNames;
  system: UnitSystem;
  gardenId: string;
}) {
  const nameOf = nameLookup(names);
  return (
    <OverviewCard title="Stock on hand" bodyClassName="flex flex-col gap-2">
      {status.stock.length === 0 ? (
        <EmptyNote>Nothing on the shelf right now.</EmptyNote>
      ) : (
        <ul className="flex flex-col gap-1">
          {status.stock.map((l) => (
            <li key={l.id}>
              {formatPoolAmount(l.remainingSi, l.material, system)} {l.material} from{" "}
              {l.binId ? (nameOf("bin", l.binId) ?? "a bin") : "outside"}, made{" "}
              {formatDay(l.producedOn)} · keeps until {formatDay(l.keepsUntil)}
              {l.nearEnd ? <strong className="text-clay-800"> — use soon</strong> : null}
            </li>
          ))}
        </ul>
      )}
      <Link
        href={`/g/${gardenId}/stock`}
        className={buttonStyles({ variant: "ghost", size: "sm", className: "self-start" })}
      >
        Open the stock
      </Link>
    </OverviewCard>
  );
}

export function Warnings({
  status,
  names,
  system,
}: {
  status: GardenStatus;
  names: GardenNames;
  system: UnitSystem;
}) {
  if (status.warnings.length === 0) return null;
  const nameOf = nameLookup(names);
  const titles = {
    "capacity-intake": "More food than the worms can eat",
    "capacity-surface": "More food than the tray surface handles",
    "pre-harvest-block": "Held back before harvest",
    "harvest-not-logged": "Harvest due but not logged",
  } as Record<string, string>;
  return (
    <section aria-labelledby="warnings-heading" className="flex flex-col gap-2">
      <h2 id="warnings-heading" className="text-xl">
        Needs attention
      </h2>
      {groupWarnings(status.warnings).map(({ first, more }, i) => (
        <Alert key={i} tone="caution" title={titles[first.kind] ?? first.kind}>
          {explain(first.explanation, { system, nameOf }).sentences.join(" ")}
          {more > 0 ? ` And ${more} more like it.` : ""}
        </Alert>
      ))}
      {status.warnings.some((w) => w.kind === "pre-harvest-block") ? <PreHarvestCaution /> : null}
    </section>
  );
}

/** One alert per kind and bin or planting: five late trays of one bin are one thing to do. */
function groupWarnings(warnings: GardenStatus["warnings"]) {
  const groups = new Map<string, { first: GardenStatus["warnings"][number]; more: number }>();
  for (const w of warnings) {
    const key = `${w.kind}:${w.binId ?? ""}:${w.plantingId ?? ""}`;
    const g = groups.get(key);
    if (g) g.more += 1;
    else groups.set(key, { first: w, more: 0 });
  }
  return [...groups.values()];
}

export function FirstSteps({
  hasBins,
  hasBeds,
  gardenId,
}: {
  hasBins: boolean;
  hasBeds: boolean;
  gardenId: string;
}) {
  const done = "text-soil-700 line-through";
  return (
    <OverviewCard title="First steps" testId="first-steps">
      <ol className="ml-5 flex list-decimal flex-col gap-1">
        <li className={hasBins ? done : undefined}>
          <Link
            href={`/g/${gardenId}/bins/new`}
            className="inline-flex min-h-6 items-center underline"
          >
            Add your worm bin
          </Link>
          : its tray size, how many trays, when it started.
        </li>
        <li className={hasBeds ? done : undefined}>
          <Link href={`/g/${gardenId}/beds`} className="inline-flex min-h-6 items-center underline">
            Add a bed or a container
          </Link>
          , and what grows in it.
        </li>
        <li>
          Open the Balance to see what the bins make against what the plants want, month by month.
        </li>
      </ol>
    </OverviewCard>
  );
}

/** The garden's counts, each a link to the page that lists them. */
export function GardenCounts({
  figures,
}: {
  figures: { label: string; value: number; href: string }[];
}) {
  return (
    <section aria-label="The garden at a glance" className="grid grid-cols-2 gap-3 sm:grid-cols-5">
      {figures.map((f) => (
        <Link key={f.label} href={f.href} className="rounded-card">
          <Card className="h-full hover:border-loam-400">
            <CardBody>
              <p className="text-3xl font-semibold tabular-nums">{f.value}</p>
              <p className="text-sm text-soil-700 underline underline-offset-2">{f.label}</p>
            </CardBody>
          </Card>
        </Link>
      ))}
    </section>
  );
}

/** The one card shape every overview section shares: a title over its body. */
function OverviewCard({
  title,
  bodyClassName,
  testId,
  children,
}: {
  title: string;
  bodyClassName?: string;
  testId?: string;
  children: ReactNode;
}) {
  return (
    <Card data-testid={testId}>
      <CardHeader>
        <CardTitle>{title}</CardTitle>
      </CardHeader>
      <CardBody className={bodyClassName}>{children}</CardBody>
    </Card>
  );
}

function EmptyNote({ children }: { children: ReactNode }) {
  return <p className="text-soil-700">{children}</p>;
}
