import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { BinForm } from "@/components/bins/bin-form";
import { RetireBin } from "@/components/bins/retire-bin";
import { Alert, Card, CardBody } from "@/components/ui";
import { getBinById } from "@/db/queries/bins";
import { getGardenById } from "@/db/queries/gardens";
import { requirePageMember } from "@/lib/auth/page-session";
import { editBinPrefill, type SearchParams } from "@/lib/validation/bin-prefill";

export const metadata: Metadata = { title: "Edit bin" };

export default async function EditBinPage({
  params,
  searchParams,
}: {
  params: Promise<{ gardenId: string; binId: string }>;
  searchParams: Promise<SearchParams>;
}) {
  const { gardenId, binId } = await params;
  await requirePageMember(gardenId, "grower");
  const [garden, bin] = await Promise.all([
    getGardenById({ gardenId }),
    getBinById({ gardenId, binId }),
  ]);
  if (!garden || !bin) notFound();
  // ?trays=n: the Balance's "extra trays" suggestion, filled in but not saved.
  const { trayCount } = editBinPrefill(await searchParams);
  const suggested = trayCount !== undefined && trayCount !== bin.trayCount ? trayCount : null;
  return (
    <>
      <h1 className="text-3xl">Edit {bin.name}</h1>
      {suggested !== null ? (
        <Alert tone="info" title="Suggested by the Balance">
          {suggested} trays instead of {bin.trayCount}, filled in below. Nothing changes until you
          save.
        </Alert>
      ) : null}
      <Card>
        <CardBody>
          <BinForm
            gardenId={gardenId}
            system={garden.unitSystem}
            initial={suggested !== null ? { ...bin, trayCount: suggested } : bin}
          />
        </CardBody>
      </Card>
      {bin.retiredOn ? null : <RetireBin gardenId={gardenId} binId={bin.id} name={bin.name} />}
    </>
  );
}
