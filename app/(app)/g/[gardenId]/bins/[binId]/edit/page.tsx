import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { BinForm } from "@/components/bins/bin-form";
import { RetireBin } from "@/components/bins/retire-bin";
import { Card, CardBody } from "@/components/ui";
import { getBinById } from "@/db/queries/bins";
import { getGardenById } from "@/db/queries/gardens";
import { requirePageMember } from "@/lib/auth/page-session";

export const metadata: Metadata = { title: "Edit bin" };

export default async function EditBinPage({
  params,
}: {
  params: Promise<{ gardenId: string; binId: string }>;
}) {
  const { gardenId, binId } = await params;
  await requirePageMember(gardenId, "grower");
  const [garden, bin] = await Promise.all([
    getGardenById({ gardenId }),
    getBinById({ gardenId, binId }),
  ]);
  if (!garden || !bin) notFound();
  return (
    <>
      <h1 className="text-3xl">Edit {bin.name}</h1>
      <Card>
        <CardBody>
          <BinForm gardenId={gardenId} system={garden.unitSystem} initial={bin} />
        </CardBody>
      </Card>
      {bin.retiredOn ? null : <RetireBin gardenId={gardenId} binId={bin.id} name={bin.name} />}
    </>
  );
}
