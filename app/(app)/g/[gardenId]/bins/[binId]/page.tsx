import type { Metadata } from "next";
import Link from "next/link";
import { notFound, redirect } from "next/navigation";
import { BinCautions } from "@/components/bins/bin-cautions";
import { BinForecastChart } from "@/components/bins/bin-forecast-chart";
import { BinSummary } from "@/components/bins/bin-summary";
import { BinWork } from "@/components/bins/bin-work";
import { loadBinPlan } from "@/db/queries/bin-plan";
import { TrayStack } from "@/components/bins/tray-stack";
import { trayStack } from "@/components/bins/tray-states";
import {
  buttonStyles,
  Card,
  CardBody,
  CardHeader,
  CardTitle,
  textLinkStyles,
} from "@/components/ui";
import { getBinById, getLoggedWorms, listMoveTargets } from "@/db/queries/bins";
import { getGardenById } from "@/db/queries/gardens";
import { requirePageMember } from "@/lib/auth/page-session";
import { roleAtLeast } from "@/lib/auth/roles";
import { dflt, trayInsideVolumeL } from "@/lib/engine";
import { toDisplayAmount } from "@/lib/format-quantity";
import { editBinPrefill, wantsEditForm, type SearchParams } from "@/lib/validation/bin-prefill";

export const metadata: Metadata = { title: "Bin" };

export default async function BinPage({
  params,
  searchParams,
}: {
  params: Promise<{ gardenId: string; binId: string }>;
  searchParams: Promise<SearchParams>;
}) {
  const { gardenId, binId } = await params;
  const member = await requirePageMember(gardenId, "viewer");
  const [garden, bin] = await Promise.all([
    getGardenById({ gardenId }),
    getBinById({ gardenId, binId }),
  ]);
  if (!garden || !bin) notFound();
  // The Balance's "extra trays" link (?edit=1&trays=n) opens the edit form; below a grower it is just the bin page.
  const search = await searchParams;
  if (wantsEditForm(search) && roleAtLeast(member.role, "grower")) {
    const { trayCount } = editBinPrefill(search);
    redirect(`/g/${gardenId}/bins/${bin.id}/edit${trayCount ? `?trays=${trayCount}` : ""}`);
  }
  const system = garden.unitSystem;
  const [{ plan, today }, targets] = await Promise.all([
    loadBinPlan(gardenId, garden.timeZone),
    listMoveTargets({ userId: member.user.id }),
  ]);
  const logged = await getLoggedWorms({ gardenId, binId: bin.id, on: today });
  const supply = plan.bins.find((b) => b.binId === bin.id);
  const trays = trayStack({
    startedOn: bin.startedOn,
    trayCount: bin.trayCount,
    processingDays: bin.processingDays ?? dflt("processingDays"),
    rotationDays: bin.rotationDays ?? dflt("rotationIntervalDays"),
    tasks: supply?.tasks ?? [],
    today,
  });
  const volumeL = trayInsideVolumeL({
    lengthM: bin.trayLengthM,
    widthM: bin.trayWidthM,
    depthM: bin.trayDepthM,
  });
  const fullTrayKg = volumeL * (bin.bulkDensityKgPerL ?? dflt("castingsBulkDensityKgPerL"));
  const massUnit = toDisplayAmount(1, "castings-mass", system).unit;
  const chart = (supply?.months ?? []).map((m) => ({
    month: m.month,
    worms: Math.round(m.worms),
    castings: toDisplayAmount(m.castingsKg, "castings-mass", system).value,
  }));
  return (
    <>
      <div className="flex flex-wrap items-center justify-between gap-3">
        <div>
          <Link href={`/g/${gardenId}/bins`} className={textLinkStyles}>
            ← All bins
          </Link>
          <h1 className="text-3xl">{bin.name}</h1>
        </div>
        {roleAtLeast(member.role, "grower") ? (
          <Link
            href={`/g/${gardenId}/bins/${bin.id}/edit`}
            className={buttonStyles({ variant: "secondary" })}
          >
            Edit bin
          </Link>
        ) : null}
      </div>
      <div className="grid gap-6 md:grid-cols-2">
        <Card>
          <CardHeader>
            <CardTitle>Trays today</CardTitle>
          </CardHeader>
          <CardBody>
            <TrayStack trays={trays} />
          </CardBody>
        </Card>
        <BinSummary
          bin={bin}
          supply={supply}
          warnings={plan.warnings}
          today={today}
          system={system}
          volumeL={volumeL}
          loggedWorms={logged.worms}
        />
      </div>
      <Card>
        <CardHeader>
          <CardTitle>Worms and castings ahead</CardTitle>
        </CardHeader>
        <CardBody>
          <BinForecastChart data={chart} massUnit={massUnit} />
          <details className="mt-2">
            <summary className="min-h-11 cursor-pointer">The same figures as a table</summary>
            <table className="mt-2 w-full text-left text-sm">
              <thead>
                <tr>
                  <th scope="col">Month</th>
                  <th scope="col">Worms</th>
                  <th scope="col">Castings ({massUnit})</th>
                </tr>
              </thead>
              <tbody>
                {chart.map((c) => (
                  <tr key={c.month}>
                    <td>{c.month}</td>
                    <td>{c.worms.toLocaleString("en-US")}</td>
                    <td>{c.castings}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </details>
        </CardBody>
      </Card>
      <BinWork
        gardenId={gardenId}
        binId={bin.id}
        system={system}
        today={today}
        canLog={roleAtLeast(member.role, "helper") && !bin.retiredOn}
        targets={targets
          .filter((t) => t.binId !== bin.id)
          .map((t) => ({
            gardenId: t.gardenId,
            binId: t.binId,
            label: t.gardenId === gardenId ? t.binName : `${t.binName} (${t.gardenName})`,
          }))}
      />
      <BinCautions
        fullTrayKg={fullTrayKg}
        manureFeedstock={bin.manureFeedstock}
        indoors={bin.indoors}
        system={system}
      />
    </>
  );
}
