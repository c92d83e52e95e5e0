import type { Metadata } from "next";
import { BinForm } from "@/components/bins/bin-form";
import { Card, CardBody } from "@/components/ui";
import { getGardenById } from "@/db/queries/gardens";
import { requirePageMember } from "@/lib/auth/page-session";
import { newBinPrefill, type SearchParams } from "@/lib/validation/bin-prefill";
import { todayIn } from "@/lib/validation/bin-values";

export const metadata: Metadata = { title: "Add a bin" };

// The Balance's "second bin" suggestion links here with the bin in the query
// (lib/validation/bin-prefill.ts); nothing is saved until the grower adds it.
export default async function NewBinPage({
  params,
  searchParams,
}: {
  params: Promise<{ gardenId: string }>;
  searchParams: Promise<SearchParams>;
}) {
  const { gardenId } = await params;
  await requirePageMember(gardenId, "grower");
  const garden = (await getGardenById({ gardenId }))!;
  const prefill = newBinPrefill(await searchParams);
  return (
    <>
      <h1 className="text-3xl">Add a bin</h1>
      <Card>
        <CardBody>
          <BinForm
            gardenId={gardenId}
            system={garden.unitSystem}
            initial={{
              name: prefill.name ?? "",
              kind: prefill.kind ?? "stacked-tray",
              trayCount: prefill.trayCount ?? 4,
              trayLengthM: prefill.trayLengthM ?? null,
              trayWidthM: prefill.trayWidthM ?? null,
              trayDepthM: prefill.trayDepthM ?? null,
              startedOn: prefill.startedOn ?? todayIn(garden.timeZone),
              startingWormCount: prefill.startingWormCount ?? 2000,
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
