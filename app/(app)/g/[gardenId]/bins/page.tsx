import type { Metadata } from "next";
import Link from "next/link";
import { loadBinPlan } from "@/db/queries/bin-plan";
import { Badge, buttonStyles, Card, CardBody, EmptyState } from "@/components/ui";
import { listBins } from "@/db/queries/bins";
import { getGardenById } from "@/db/queries/gardens";
import { requirePageMember } from "@/lib/auth/page-session";
import { roleAtLeast } from "@/lib/auth/roles";
import { formatDay } from "@/lib/format";
import { formatAmount } from "@/lib/format-quantity";
import { binKindLabels } from "@/lib/validation/bin";

export const metadata: Metadata = { title: "Bins" };

export default async function BinsPage({ params }: { params: Promise<{ gardenId: string }> }) {
  const { gardenId } = await params;
  const member = await requirePageMember(gardenId, "viewer");
  const garden = (await getGardenById({ gardenId }))!;
  const [bins, { plan, today }] = await Promise.all([
    listBins({ gardenId }),
    loadBinPlan(gardenId, garden.timeZone),
  ]);
  const canEdit = roleAtLeast(member.role, "grower");
  const system = garden.unitSystem;
  return (
    <>
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h1 className="text-3xl">Bins</h1>
        {canEdit && bins.length ? (
          <Link href={`/g/${gardenId}/bins/new`} className={buttonStyles()}>
            Add a bin
          </Link>
        ) : null}
      </div>
      {bins.length === 0 ? (
        <EmptyState
          title="No worm bins yet"
          text="Add your first bin: its trays, when it started and how many worms went in. Castline then forecasts the castings and liquid it will make."
          action={
            canEdit ? (
              <Link href={`/g/${gardenId}/bins/new`} className={buttonStyles()}>
                Add a bin
              </Link>
            ) : undefined
          }
        />
      ) : (
        <ul className="grid gap-4 sm:grid-cols-2">
          {bins.map((bin) => {
            const supply = plan.bins.find((b) => b.binId === bin.id);
            const next = supply?.tasks.find(
              (t) => t.kind === "harvest-tray" && t.date >= today && !t.logged,
            );
            return (
              <li key={bin.id}>
                <Card>
                  <CardBody className="flex flex-col gap-2">
                    <div className="flex items-center justify-between gap-2">
                      <Link
                        href={`/g/${gardenId}/bins/${bin.id}`}
                        className="text-xl font-semibold underline"
                      >
                        {bin.name}
                      </Link>
                      {bin.retiredOn ? <Badge>Retired {formatDay(bin.retiredOn)}</Badge> : null}
                      {!bin.retiredOn && bin.manureFeedstock ? (
                        <Badge tone="caution">Manure feedstock</Badge>
                      ) : null}
                    </div>
                    <p className="text-soil-700">
                      {binKindLabels[bin.kind]} · {bin.trayCount} trays ·{" "}
                      {formatAmount(bin.trayLengthM, "tray-side", system)} ×{" "}
                      {formatAmount(bin.trayWidthM, "tray-side", system)} inside · started{" "}
                      {formatDay(bin.startedOn, {
                        month: "short",
                        day: "numeric",
                        year: "numeric",
                      })}
                    </p>
                    {next ? (
                      <p>
                        Next harvest <strong>{formatDay(next.date)}</strong>
                        {next.amount !== null ? (
                          <> · about {formatAmount(next.amount, "castings-mass", system)}</>
                        ) : null}
                      </p>
                    ) : null}
                  </CardBody>
                </Card>
              </li>
            );
          })}
        </ul>
      )}
    </>
  );
}
