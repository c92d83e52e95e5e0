"use client";

import { useMemo, useRef, useState } from "react";
import { useQuery } from "@tanstack/react-query";
import Link from "next/link";
import { Alert, EmptyState, Skeleton, buttonStyles } from "@/components/ui";
import { BalanceTable } from "@/components/balance/balance-table";
import { ExplanationProvider, Figure } from "@/components/balance/explanation";
import { GapPanel } from "@/components/balance/gap-panel";
import { nameLookup, type GardenNames } from "@/components/balance/garden-names";
import { MonthDetail } from "@/components/balance/month-detail";
import { RangeControl } from "@/components/balance/range-control";
import { SupplyChart } from "@/components/balance/supply-chart";
import { WhatIfPanel } from "@/components/balance/what-if-panel";
import type { TryChange } from "@/components/balance/what-if-changes";
import type { BalanceRangeValue } from "@/components/balance/balance-range";
import { apiFetch, ApiError } from "@/lib/api-client";
import type { Role } from "@/lib/auth/roles";
import type { BalanceBody } from "@/lib/balance/types";
import { formatDay } from "@/lib/format";
import { formatMoney, formatPoolAmount } from "@/lib/format-quantity";
import { queryKeys } from "@/lib/query-keys";
import type { UnitSystem } from "@/lib/units";

export function BalanceView({
  gardenId,
  role,
  unitSystem,
  range,
  names,
}: {
  gardenId: string;
  role: Role;
  unitSystem: UnitSystem;
  range: BalanceRangeValue;
  names: GardenNames;
}) {
  const base = `/g/${gardenId}/balance`;
  const query = `from=${range.from}&months=${range.months}`;
  const balance = useQuery({
    queryKey: queryKeys.balance(gardenId, range.from, range.months),
    queryFn: () => apiFetch<BalanceBody>(`/api/gardens/${gardenId}/balance?${query}`),
  });
  const [month, setMonth] = useState<string | null>(null);
  const [changes, setChanges] = useState<TryChange[]>([]);
  const whatIfRef = useRef<HTMLDivElement>(null);
  const detailRef = useRef<HTMLDivElement>(null);
  const nameOf = useMemo(() => nameLookup(names), [names]);
  const system = balance.data?.settings.unitSystem ?? unitSystem;
  const canPlan = role === "owner" || role === "grower";

  if (names.bins.length === 0 || names.beds.length === 0) {
    const missing = names.bins.length === 0 ? "a worm bin" : "a bed or container";
    return (
      <>
        <h1 className="text-3xl">Balance</h1>
        <EmptyState
          title={`Add ${missing} first`}
          text={
            names.bins.length === 0
              ? "The balance weighs what your bins make against what your plantings want. With no bin there is no supply to weigh: add your worm bin, then a bed and its plantings."
              : "There is supply but nothing to feed yet: add a bed or a container and its plantings, and the balance fills in."
          }
          action={
            canPlan ? null : (
              <p className="text-sm text-soil-700">
                Ask a grower or the owner of this garden to add it.
              </p>
            )
          }
        />
      </>
    );
  }

  const plan = balance.data?.plan;
  return (
    <ExplanationProvider system={system} nameOf={nameOf}>
      <header className="flex min-w-0 flex-col gap-2">
        <h1 className="text-3xl">Balance</h1>
        <p className="text-soil-700">
          What your bins make against what your plantings want, month by month. Press any figure to
          see where it comes from.
        </p>
      </header>
      <RangeControl key={query} basePath={base} from={range.from} months={range.months} />
      {balance.isPending ? <Skeleton className="h-64" /> : null}
      {balance.error ? (
        <Alert tone="danger" title="The balance could not be worked out">
          {balance.error instanceof ApiError ? balance.error.message : "Something went wrong."}
        </Alert>
      ) : null}
      {plan ? (
        <>
          <section
            aria-label="Summary"
            className="flex flex-wrap gap-x-6 gap-y-1"
            data-testid="balance-summary"
          >
            <p>
              First short:{" "}
              <strong>
                {plan.firstShortfall.castings ? formatDay(plan.firstShortfall.castings) : "never"}
              </strong>{" "}
              (castings)
            </p>
            <p>
              Not used by the plan:{" "}
              <Figure title="Castings not used" explanation={plan.surplus.explanation}>
                {formatPoolAmount(plan.surplus.castingsKg, "castings", system)}
              </Figure>{" "}
              ({formatMoney(plan.surplus.value)})
            </p>
            <p>
              Harvested in these months:{" "}
              <Figure title="Output" explanation={plan.outputValue.explanation}>
                {formatPoolAmount(plan.outputValue.castingsKg, "castings", system)}
              </Figure>{" "}
              ({formatMoney(plan.outputValue.value)})
            </p>
          </section>
          <SupplyChart rows={plan.rows} system={system} />
          <BalanceTable
            rows={plan.rows}
            system={system}
            csvHref={`/api/gardens/${gardenId}/balance?${query}&format=csv`}
            onOpenMonth={(m) => {
              setMonth(m);
              requestAnimationFrame(() =>
                detailRef.current?.scrollIntoView({ behavior: "smooth" }),
              );
            }}
          />
          <div ref={detailRef} className="min-w-0">
            {month ? <MonthDetail plan={plan} month={month} names={names} system={system} /> : null}
          </div>
          {plan.gap ? (
            <GapPanel
              gap={plan.gap}
              names={names}
              system={system}
              gardenId={gardenId}
              canEdit={canPlan}
              onTry={(c) => {
                setChanges(c);
                requestAnimationFrame(() =>
                  whatIfRef.current?.scrollIntoView({ behavior: "smooth" }),
                );
              }}
            />
          ) : null}
          <div ref={whatIfRef} className="min-w-0">
            <WhatIfPanel
              gardenId={gardenId}
              range={range}
              names={names}
              system={system}
              changes={changes}
              onChangesChange={setChanges}
            />
          </div>
          {canPlan ? null : (
            <p className="text-sm text-soil-700">
              You can read the plan and try changes; only growers and the owner change the garden.
            </p>
          )}
          <p className="text-sm">
            <Link
              href={`/g/${gardenId}`}
              className={buttonStyles({ variant: "ghost", size: "sm" })}
            >
              Back to the overview
            </Link>
          </p>
        </>
      ) : null}
    </ExplanationProvider>
  );
}
