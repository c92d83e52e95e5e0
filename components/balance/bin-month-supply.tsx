"use client";

import { Card, CardBody, CardHeader, CardTitle } from "@/components/ui";
import { Figure } from "@/components/balance/explanation";
import type { GardenNames } from "@/components/balance/garden-names";
import type { BinTask, GardenPlan } from "@/lib/engine";
import { formatDay } from "@/lib/format";
import { formatAmount, formatPoolAmount } from "@/lib/format-quantity";
import type { UnitSystem } from "@/lib/units";

// A month's supply per bin (issue 9 item 1): the castings each bin makes and the
// leachate it collects, with the harvests and drains that fall in the month. Every
// amount opens the engine's own explanation: the bin's castings forecast for its
// month total, each task's for a harvest or a drain.

export function BinMonthSupply({
  plan,
  month,
  names,
  system,
}: {
  plan: GardenPlan;
  month: string;
  names: GardenNames;
  system: UnitSystem;
}) {
  const binName = (id: string) => names.bins.find((b) => b.id === id)?.name ?? "A bin";
  return (
    <Card>
      <CardHeader>
        <CardTitle as="h3">Harvests and drains per bin</CardTitle>
      </CardHeader>
      <CardBody>
        <ul className="flex flex-col gap-3" data-testid="bin-month-supply">
          {plan.bins.map((b) => {
            const m = b.months.find((x) => x.month === month);
            const inMonth = (kind: BinTask["kind"]) =>
              b.tasks.filter((t) => t.kind === kind && t.date.startsWith(month));
            const name = binName(b.binId);
            return (
              <li key={b.binId} data-bin={b.binId} className="flex flex-col gap-0.5">
                <p>
                  <strong>{name}</strong>:{" "}
                  <Figure title={`${name}, castings`} explanation={b.explanation}>
                    {formatPoolAmount(m?.castingsKg ?? 0, "castings", system)}
                  </Figure>{" "}
                  castings, {formatPoolAmount(m?.leachateL ?? 0, "leachate", system)} leachate
                  collected{" "}
                  <span className="text-soil-700">
                    (about {formatAmount(b.leachateLPerDay, "liquid", system)} a day)
                  </span>
                </p>
                <TaskLine
                  label="Harvests"
                  tasks={inMonth("harvest-tray")}
                  name={name}
                  system={system}
                />
                <TaskLine label="Drains" tasks={inMonth("drain")} name={name} system={system} />
              </li>
            );
          })}
        </ul>
      </CardBody>
    </Card>
  );
}

function TaskLine({
  label,
  tasks,
  name,
  system,
}: {
  label: string;
  tasks: BinTask[];
  name: string;
  system: UnitSystem;
}) {
  if (tasks.length === 0) return null;
  return (
    <div className="flex flex-wrap items-baseline gap-x-3 text-sm">
      <span>{label}:</span>
      <ul className="flex flex-wrap gap-x-3">
        {tasks.map((t) => (
          <li key={t.id} className="whitespace-nowrap">
            {formatDay(t.date)}{" "}
            {t.amount !== null ? (
              <Figure title={`${name}, ${formatDay(t.date)}`} explanation={t.explanation}>
                {formatPoolAmount(t.amount, t.kind === "drain" ? "leachate" : "castings", system)}
              </Figure>
            ) : null}
          </li>
        ))}
      </ul>
    </div>
  );
}
