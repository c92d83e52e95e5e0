import type { Metadata } from "next";
import { BackToBeds } from "@/components/beds/back-to-beds";
import { CsvImport } from "@/components/beds/csv-import";
import { Card, CardBody, CardHeader, CardTitle } from "@/components/ui";
import { loadBedsCsvContext } from "@/db/queries/beds-csv";
import { getGardenById } from "@/db/queries/gardens";
import { requirePageMember } from "@/lib/auth/page-session";
import { BED_CSV_COLUMNS, csvUnits } from "@/lib/plantings/beds-csv-columns";

export const metadata: Metadata = { title: "Import beds" };

export default async function ImportBedsPage({
  params,
}: {
  params: Promise<{ gardenId: string }>;
}) {
  const { gardenId } = await params;
  await requirePageMember(gardenId, "grower");
  const [garden, context] = await Promise.all([
    getGardenById({ gardenId }),
    loadBedsCsvContext({ gardenId }),
  ]);
  if (!garden) return null;
  const units = csvUnits(garden.unitSystem);
  return (
    <>
      <BackToBeds gardenId={gardenId} />
      <h1 className="text-3xl">Import beds and plantings</h1>
      <Card>
        <CardHeader>
          <CardTitle>From a CSV file</CardTitle>
        </CardHeader>
        <CardBody className="flex flex-col gap-4">
          <p>
            One row per planting; repeat the bed on each of its rows (a bed with nothing planted yet
            is a row with the planting columns blank). A bed this garden already has gets the new
            plantings. The columns are {BED_CSV_COLUMNS.map((c) => c.title).join(", ")}; sizes carry
            their unit in the header, e.g. Length ({units.length}) and Volume ({units.volume}).
            Dates are YYYY-MM-DD. Blank expected ends come from the crop&apos;s days to harvest.
          </p>
          <CsvImport gardenId={gardenId} crops={context.crops} beds={context.beds} />
        </CardBody>
      </Card>
    </>
  );
}
