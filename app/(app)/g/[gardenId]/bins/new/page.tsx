import type { Metadata } from "next";
import { BinForm } from "@/components/bins/bin-form";
import { Card, CardBody } from "@/components/ui";
import { getGardenById } from "@/db/queries/gardens";
import { requirePageMember } from "@/lib/auth/page-session";
import { todayIn } from "@/lib/validation/bin-values";

export const metadata: Metadata = { title: "Add a bin" };

const num = (v: string | string[] | undefined) => {
  const n = Number(Array.isArray(v) ? v[0] : v);
  return Number.isFinite(n) && n > 0 ? n : null;
};

// The Balance's "extra trays" / "second bin" suggestions link here with the
// suggestion in the query (SI: lengthM, widthM, depthM, trays, worms, startedOn).
export default async function NewBinPage({
  params,
  searchParams,
}: {
  params: Promise<{ gardenId: string }>;
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const { gardenId } = await params;
  await requirePageMember(gardenId, "grower");
  const q = await searchParams;
  const garden = (await getGardenById({ gardenId }))!;
  const today = todayIn(garden.timeZone);
  const started =
    typeof q.startedOn === "string" && /^\d{4}-\d{2}-\d{2}$/.test(q.startedOn)
      ? q.startedOn
      : today;
  return (
    <>
      <h1 className="text-3xl">Add a bin</h1>
      <Card>
        <CardBody>
          <BinForm
            gardenId={gardenId}
            system={garden.unitSystem}
            initial={{
              name: typeof q.name === "string" ? q.name.slice(0, 60) : "",
              kind: "stacked-tray",
              trayCount: num(q.trays) ?? 4,
              trayLengthM: num(q.lengthM),
              trayWidthM: num(q.widthM),
              trayDepthM: num(q.depthM),
              startedOn: started,
              startingWormCount: num(q.worms) ?? 2000,
              manureFeedstock: false,
              indoors: true,
              dormantMonths: [],
              processingDays: null,
              rotationDays: null,
              fillFraction: null,
              bulkDensityKgPerL: null,
              drainIntervalDays: null,
            }}
          />
        </CardBody>
      </Card>
    </>
  );
}
