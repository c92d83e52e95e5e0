import type { Metadata } from "next";
import { listStock } from "@/app/api/gardens/[gardenId]/lots/list-stock";
import { AddLotForm } from "@/components/stock/add-lot-form";
import { StockList } from "@/components/stock/stock-list";
import { Card, CardBody, CardHeader, CardTitle } from "@/components/ui";
import { getGardenById } from "@/db/queries/gardens";
import { requirePageMember } from "@/lib/auth/page-session";
import { roleAtLeast } from "@/lib/auth/roles";
import { todayIn } from "@/lib/validation/bin-values";

export const metadata: Metadata = { title: "Stock" };

export default async function StockPage({ params }: { params: Promise<{ gardenId: string }> }) {
  const { gardenId } = await params;
  const member = await requirePageMember(gardenId, "viewer");
  const garden = (await getGardenById({ gardenId }))!;
  const lots = await listStock(gardenId);
  const canAdjust = roleAtLeast(member.role, "grower");
  return (
    <>
      <h1 className="text-3xl">Stock</h1>
      <p className="text-soil-700">
        Castings and liquid on the shelf, oldest used first. The Balance starts from what is here.
      </p>
      <Card>
        <CardBody>
          <StockList
            gardenId={gardenId}
            system={garden.unitSystem}
            canAdjust={canAdjust}
            initial={lots}
          />
        </CardBody>
      </Card>
      {canAdjust ? (
        <Card>
          <CardHeader>
            <CardTitle>Add stock</CardTitle>
          </CardHeader>
          <CardBody>
            <AddLotForm
              gardenId={gardenId}
              system={garden.unitSystem}
              today={todayIn(garden.timeZone)}
            />
          </CardBody>
        </Card>
      ) : null}
    </>
  );
}
