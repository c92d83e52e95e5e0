import type { Metadata } from "next";
import { BalanceView } from "@/components/balance/balance-view";
import { gardenNamesFrom } from "@/components/balance/garden-names";
import { parseBalanceRange } from "@/components/balance/balance-range";
import { listBins } from "@/db/queries/bins";
import { getGardenById } from "@/db/queries/gardens";
import { loadGardenInputs } from "@/db/queries/garden-inputs";
import { requirePageMember } from "@/lib/auth/page-session";
import { todayIn } from "@/lib/garden-today";

export const metadata: Metadata = { title: "Balance" };

export default async function BalancePage({
  params,
  searchParams,
}: {
  params: Promise<{ gardenId: string }>;
  searchParams: Promise<{ from?: string | string[]; months?: string | string[] }>;
}) {
  const { gardenId } = await params;
  const member = await requirePageMember(gardenId, "viewer");
  const garden = await getGardenById({ gardenId });
  if (!garden) return null;
  const today = todayIn(garden.timeZone);
  const range = parseBalanceRange(await searchParams, today);
  // Names for the engine's ids; the figures themselves come from the balance API.
  const [inputs, bins] = await Promise.all([
    loadGardenInputs({ gardenId, asOf: today }),
    listBins({ gardenId }),
  ]);
  const names = gardenNamesFrom(inputs, bins);
  return (
    <BalanceView
      gardenId={gardenId}
      role={member.role}
      unitSystem={garden.unitSystem}
      range={range}
      names={names}
    />
  );
}
