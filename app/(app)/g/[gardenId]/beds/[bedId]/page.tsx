import type { Metadata } from "next";
import { BackToBeds } from "@/components/beds/back-to-beds";
import { notFound } from "next/navigation";
import { BedActions } from "@/components/beds/bed-actions";
import { BedDemandTable } from "@/components/beds/bed-demand-table";
import { bedSize } from "@/components/beds/bed-list";
import { PlantingItem } from "@/components/plantings/planting-item";
import { QuickPlantForm } from "@/components/plantings/quick-plant-form";
import { Card, CardBody, CardHeader, CardTitle, EmptyState } from "@/components/ui";
import { getBedDemand } from "@/db/queries/bed-demand";
import { todayIn } from "@/lib/garden-today";
import { bedHasLoggedFeedings, getBedById } from "@/db/queries/beds";
import { getGardenById } from "@/db/queries/gardens";
import { listPlantings } from "@/db/queries/plantings";
import { requirePageMember } from "@/lib/auth/page-session";
import { roleAtLeast } from "@/lib/auth/roles";
import { formatDay } from "@/lib/format";
import { PreHarvestCaution } from "@/components/balance/feeding-cautions";
import { listBins } from "@/db/queries/bins";
import { rateCutFromSearch, ruleFormValues } from "@/lib/plantings/rule-form-values";
import { describeRule } from "@/lib/plantings/rule-words";
import { bedIdParamsSchema } from "@/lib/validation/bed";

export const metadata: Metadata = { title: "Bed" };

export default async function BedPage({
  params,
  searchParams,
}: {
  params: Promise<{ gardenId: string; bedId: string }>;
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const parsed = bedIdParamsSchema.safeParse(await params);
  if (!parsed.success) notFound();
  const { gardenId, bedId } = parsed.data;
  const member = await requirePageMember(gardenId, "viewer");
  const [garden, bed] = await Promise.all([
    getGardenById({ gardenId }),
    getBedById({ gardenId, bedId }),
  ]);
  if (!garden || !bed) notFound();
  const system = garden.unitSystem;
  const today = todayIn(garden.timeZone);
  const [{ plantings }, demand, hasLog, bins] = await Promise.all([
    listPlantings({ gardenId, query: { bedId, limit: 200, offset: 0 } }),
    getBedDemand({ gardenId, bedId }),
    bedHasLoggedFeedings({ gardenId, bedId }),
    listBins({ gardenId }),
  ]);
  // Stock from a manure-fed bin waits out the pre-harvest interval on food crops: say so here.
  const manureFed = bins.some((b) => b.manureFeedstock && !b.retiredOn);
  const canEdit = roleAtLeast(member.role, "grower");
  // The Balance's rate cut (RULES.md URL contract): ?planting={id}&cut={percent}.
  const cut = canEdit
    ? rateCutFromSearch(
        await searchParams,
        plantings.map((p) => p.id),
      )
    : null;
  const views = plantings.map((p) => ({
    id: p.id,
    title: `${p.plantCount} ${p.cropName}`,
    dates: `${p.plantedOn > today ? "To plant" : "Planted"} ${formatDay(p.plantedOn, { month: "short", day: "numeric", year: "numeric" })}${
      p.endedOn
        ? ` · ${p.endedOn < today ? "ended" : "ends"} ${formatDay(p.endedOn)}`
        : p.expectedHarvestOn
          ? ` · harvest expected ${formatDay(p.expectedHarvestOn)}`
          : ""
    } · ${p.feederClass} feeder`,
    priority: p.priority,
    plantedOn: p.plantedOn,
    ruleSource: p.ruleSource,
    rules: p.effectiveRules.map((r) => ({
      words: describeRule(r, system),
      values: ruleFormValues(r, system),
    })),
    rateCut:
      cut?.plantingId === p.id
        ? {
            percent: cut.cutPercent,
            // Every rule's amount cut; no words, so each opens on its reduced fields.
            rules: p.effectiveRules.map((r) => ({
              values: ruleFormValues(r, system, cut.cutPercent),
            })),
          }
        : undefined,
  }));

  return (
    <>
      <BackToBeds gardenId={gardenId} />
      <header className="flex flex-col gap-1">
        <h1 className="text-3xl">{bed.name}</h1>
        <p className="text-soil-700">
          {bed.kind === "bed" ? "Bed" : "Container"} · {bedSize(bed, system)}
          {bed.indoors ? " · indoors, fed all year" : " · outdoors, fed in the growing season"}
        </p>
        {bed.notes ? <p>{bed.notes}</p> : null}
      </header>
      {canEdit && !bed.archivedOn ? (
        <BedActions gardenId={gardenId} bed={bed} unitSystem={system} hasLog={hasLog} />
      ) : null}
      <section aria-labelledby="plantings-title" className="flex flex-col gap-3">
        <h2 id="plantings-title" className="text-2xl">
          Plantings
        </h2>
        {views.length ? (
          <ul className="flex flex-col gap-3">
            {views.map((v) => (
              <PlantingItem
                key={v.id}
                gardenId={gardenId}
                planting={v}
                rateCut={v.rateCut}
                canEdit={canEdit}
                today={today}
                unitSystem={system}
              />
            ))}
          </ul>
        ) : null}
        {views.length && manureFed ? <PreHarvestCaution /> : null}
        {views.length ? null : (
          <EmptyState
            as="h3"
            title="Nothing planted here yet"
            text={
              canEdit
                ? "Add plants below: type counts and crops, like “6 tomato, 4 pepper”."
                : "When a grower adds plants, they appear here."
            }
          />
        )}
      </section>
      {canEdit ? (
        <Card>
          <CardHeader>
            <CardTitle>Add plants</CardTitle>
          </CardHeader>
          <CardBody>
            <QuickPlantForm gardenId={gardenId} bedId={bedId} today={today} />
          </CardBody>
        </Card>
      ) : null}
      <section aria-labelledby="demand-title" className="flex flex-col gap-3">
        <h2 id="demand-title" className="text-2xl">
          Next 12 months
        </h2>
        <p className="text-sm text-soil-700">
          What each planting is due, as applied, and how much of it the worm bins&apos; stock covers
          (the same plan as the Balance).
        </p>
        <BedDemandTable
          demand={demand}
          plantings={views.map((v) => ({
            id: v.id,
            // Two plantings of the same crop and count are told apart by their planting day.
            title: views.some((o) => o !== v && o.title === v.title)
              ? `${v.title} (${formatDay(v.plantedOn, { month: "short", year: "numeric" })})`
              : v.title,
          }))}
          unitSystem={system}
        />
      </section>
    </>
  );
}
