import type { Metadata } from "next";
import { Badge } from "@/components/ui";
import { gardenNamesFrom } from "@/components/balance/garden-names";
import { gardenStatus } from "@/components/overview/garden-status";
import {
  DueThisWeek,
  FirstSteps,
  GardenCounts,
  NextHarvests,
  StockOnHand,
  ThisMonth,
  Warnings,
} from "@/components/overview/overview-sections";
import { getGardenById } from "@/db/queries/gardens";
import { getGardenSummary } from "@/db/queries/garden-summary";
import { loadGardenInputs } from "@/db/queries/garden-inputs";
import { listLotStock } from "@/db/queries/lots";
import { requirePageMember } from "@/lib/auth/page-session";
import { roleLabels } from "@/lib/auth/roles";
import { computePlan } from "@/lib/engine";
import { formatMonthDay } from "@/lib/format";
import { todayIn } from "@/lib/garden-today";

export const metadata: Metadata = { title: "Overview" };

export default async function GardenOverviewPage({
  params,
}: {
  params: Promise<{ gardenId: string }>;
}) {
  const { gardenId } = await params;
  const member = await requirePageMember(gardenId, "viewer");
  const garden = await getGardenById({ gardenId });
  if (!garden) return null;
  const today = todayIn(garden.timeZone);
  const [summary, inputs, lots] = await Promise.all([
    getGardenSummary({ gardenId }),
    loadGardenInputs({ gardenId, asOf: today }),
    listLotStock({ gardenId }),
  ]);
  const names = gardenNamesFrom(inputs);
  const ready = inputs.bins.length > 0 && inputs.beds.length > 0;
  // Three months cover "this month", this week's feedings and the next harvests.
  const plan = ready
    ? computePlan(inputs, { from: today.slice(0, 7), months: 3, suggestions: false })
    : null;
  const status = plan ? gardenStatus(plan, inputs, lots) : null;
  const system = garden.unitSystem;
  const at = (page: string) => `/g/${gardenId}/${page}`;
  const figures = [
    { label: "Beds", value: summary.beds, href: at("beds") },
    { label: "Containers", value: summary.containers, href: at("beds") },
    { label: "Plantings, current and planned", value: summary.activePlantings, href: at("beds") },
    { label: "Worm bins", value: summary.bins, href: at("bins") },
    { label: "Members", value: summary.members, href: at("members") },
  ];
  return (
    <>
      <header className="flex flex-col gap-2">
        <h1 className="text-3xl" data-testid="garden-name">
          {garden.name}
        </h1>
        <p className="flex flex-wrap items-center gap-2 text-soil-700">
          <Badge tone="positive">{roleLabels[member.role]}</Badge>
          Growing season {formatMonthDay(garden.lastSpringFrost)} –{" "}
          {formatMonthDay(garden.firstFallFrost)}
          {garden.location ? ` · ${garden.location}` : ""}
        </p>
      </header>
      {status ? (
        <>
          <Warnings status={status} names={names} system={system} />
          <div className="grid gap-3 md:grid-cols-2">
            <ThisMonth status={status} system={system} gardenId={gardenId} />
            <DueThisWeek status={status} names={names} system={system} />
            <NextHarvests status={status} names={names} system={system} />
            <StockOnHand status={status} names={names} system={system} gardenId={gardenId} />
          </div>
        </>
      ) : (
        <FirstSteps
          hasBins={inputs.bins.length > 0}
          hasBeds={inputs.beds.length > 0}
          gardenId={gardenId}
        />
      )}
      {/* An empty garden gets first steps, not a row of zeros. */}
      {status ? <GardenCounts figures={figures} /> : null}
    </>
  );
}
