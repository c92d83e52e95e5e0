import type { Metadata } from "next";
import { searchParam, type SearchParams } from "@/lib/search-params";
import { BackToBeds } from "@/components/beds/back-to-beds";
import Link from "next/link";
import { CropForm } from "@/components/crops/crop-form";
import { CropItem } from "@/components/crops/crop-item";
import {
  Button,
  buttonStyles,
  Card,
  CardBody,
  CardHeader,
  CardTitle,
  Input,
  Select,
} from "@/components/ui";
import { listCrops } from "@/db/queries/crops";
import { getGardenById } from "@/db/queries/gardens";
import { requirePageMember } from "@/lib/auth/page-session";
import { roleAtLeast } from "@/lib/auth/roles";
import { todayIn } from "@/lib/garden-today";
import { ruleFormValues } from "@/lib/plantings/rule-form-values";
import { describeRule } from "@/lib/plantings/rule-words";
import { listCropsQuerySchema } from "@/lib/validation/crop";
import { feederClassSchema } from "@/lib/validation/engine-inputs";

export const metadata: Metadata = { title: "Crops" };

export default async function CropsPage({
  params,
  searchParams,
}: {
  params: Promise<{ gardenId: string }>;
  searchParams: Promise<SearchParams>;
}) {
  const { gardenId } = await params;
  const member = await requirePageMember(gardenId, "viewer");
  const raw = await searchParams;
  const one = (key: string) => searchParam(raw, key);
  // The filter lives in the URL like the beds list's; a bad value falls back to none.
  const parsed = listCropsQuerySchema.safeParse({
    q: one("q"),
    feederClass: one("feederClass"),
  });
  const query = parsed.success ? parsed.data : listCropsQuerySchema.parse({});
  const filtered = Boolean(query.q || query.feederClass);
  const [garden, { crops }] = await Promise.all([
    getGardenById({ gardenId }),
    listCrops({ gardenId, query }),
  ]);
  if (!garden) return null;
  const system = garden.unitSystem;
  const canEdit = roleAtLeast(member.role, "grower");
  const today = todayIn(garden.timeZone);
  return (
    <>
      <BackToBeds gardenId={gardenId} />
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
      <form method="get" className="flex flex-wrap items-end gap-3" aria-label="Find crops">
        <label className="flex flex-col gap-1.5 font-semibold">
          Name contains
          <Input name="q" defaultValue={query.q ?? ""} className="w-44" />
        </label>
        <label className="flex flex-col gap-1.5 font-semibold">
          Feeder
          <Select name="feederClass" defaultValue={query.feederClass ?? ""} className="w-44">
            <option value="">Any</option>
            {feederClassSchema.options.map((c) => (
              <option key={c} value={c}>
                {c[0]!.toUpperCase() + c.slice(1)}
              </option>
            ))}
          </Select>
        </label>
        <Button type="submit" variant="secondary">
          Find
        </Button>
        {filtered ? (
          <Link href="?" className={buttonStyles({ variant: "ghost" })}>
            Clear
          </Link>
        ) : null}
      </form>
      {crops.length === 0 ? (
        <p className="text-soil-700">
          No crop matches. Clear the search to see them all
          {canEdit ? ", or add it as your own crop above" : ""}.
        </p>
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
