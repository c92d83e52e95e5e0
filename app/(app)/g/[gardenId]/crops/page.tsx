import type { Metadata } from "next";
import Link from "next/link";
import { CropForm } from "@/components/crops/crop-form";
import { CropItem } from "@/components/crops/crop-item";
import { Card, CardBody, CardHeader, CardTitle } from "@/components/ui";
import { listCrops } from "@/db/queries/crops";
import { getGardenById } from "@/db/queries/gardens";
import { requirePageMember } from "@/lib/auth/page-session";
import { roleAtLeast } from "@/lib/auth/roles";
import { todayIn } from "@/lib/garden-today";
import { ruleFormValues } from "@/lib/plantings/rule-form-values";
import { describeRule } from "@/lib/plantings/rule-words";

export const metadata: Metadata = { title: "Crops" };

export default async function CropsPage({ params }: { params: Promise<{ gardenId: string }> }) {
  const { gardenId } = await params;
  const member = await requirePageMember(gardenId, "viewer");
  const [garden, { crops }] = await Promise.all([
    getGardenById({ gardenId }),
    listCrops({ gardenId, query: { limit: 200, offset: 0 } }),
  ]);
  if (!garden) return null;
  const system = garden.unitSystem;
  const canEdit = roleAtLeast(member.role, "grower");
  const today = todayIn(garden.timeZone);
  return (
    <>
      <nav aria-label="Breadcrumb" className="text-sm">
        <Link
          href={`/g/${gardenId}/beds`}
          className="inline-flex min-h-6 items-center text-leaf-800 underline"
        >
          ← All beds and containers
        </Link>
      </nav>
      <h1 className="text-3xl">Crops</h1>
      <p className="text-soil-700">
        Each crop feeds by its default rule unless a planting has its own. Changing a crop here
        changes it for this garden only.
      </p>
      {canEdit ? (
        <Card>
          <CardHeader>
            <CardTitle>Add your own crop</CardTitle>
          </CardHeader>
          <CardBody>
            <CropForm gardenId={gardenId} />
          </CardBody>
        </Card>
      ) : null}
      <ul className="flex flex-col gap-3" aria-label="The garden's crops">
        {crops.map((c) => (
          <CropItem
            key={c.id}
            gardenId={gardenId}
            canEdit={canEdit}
            today={today}
            unitSystem={system}
            crop={{
              id: c.id,
              name: c.name,
              facts: [
                `${c.feederClass} feeder`,
                c.daysToHarvest ? `${c.daysToHarvest} days to harvest` : null,
                c.edible
                  ? c.edibleTouchesSoil
                    ? "edible part touches the soil"
                    : "edible"
                  : "not eaten",
              ]
                .filter(Boolean)
                .join(" · "),
              ruleWords: describeRule(c.effectiveRule, system),
              ruleSource: c.ruleSource,
              ruleValues: ruleFormValues(c.effectiveRule, system),
            }}
          />
        ))}
      </ul>
    </>
  );
}
