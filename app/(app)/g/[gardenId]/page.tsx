import type { Metadata } from "next";
import { Badge, Card, CardBody } from "@/components/ui";
import { SafetyCautions } from "@/components/garden/safety-cautions";
import { getGardenById } from "@/db/queries/gardens";
import { getGardenSummary } from "@/db/queries/garden-summary";
import { requirePageMember } from "@/lib/auth/page-session";
import { roleLabels } from "@/lib/auth/roles";
import { formatDay } from "@/lib/format";

export const metadata: Metadata = { title: "Overview" };

export default async function GardenOverviewPage({
  params,
}: {
  params: Promise<{ gardenId: string }>;
}) {
  const { gardenId } = await params;
  const member = await requirePageMember(gardenId, "viewer");
  const [garden, summary] = await Promise.all([
    getGardenById({ gardenId }),
    getGardenSummary({ gardenId }),
  ]);
  if (!garden) return null;
  const figures = [
    { label: "Beds", value: summary.beds },
    { label: "Containers", value: summary.containers },
    { label: "Plantings, current and planned", value: summary.activePlantings },
    { label: "Worm bins", value: summary.bins },
    { label: "Members", value: summary.members },
  ];
  return (
    <>
      <header className="flex flex-col gap-2">
        <h1 className="text-3xl" data-testid="garden-name">
          {garden.name}
        </h1>
        <p className="flex flex-wrap items-center gap-2 text-soil-700">
          <Badge tone="positive">{roleLabels[member.role]}</Badge>
          Growing season {formatDay(garden.lastSpringFrost)} – {formatDay(garden.firstFallFrost)}
          {garden.location ? ` · ${garden.location}` : ""}
        </p>
      </header>
      <section
        aria-label="The garden at a glance"
        className="grid grid-cols-2 gap-3 sm:grid-cols-5"
      >
        {figures.map((f) => (
          <Card key={f.label}>
            <CardBody>
              <p className="text-3xl font-semibold tabular-nums">{f.value}</p>
              <p className="text-sm text-soil-700">{f.label}</p>
            </CardBody>
          </Card>
        ))}
      </section>
      <SafetyCautions />
    </>
  );
}
