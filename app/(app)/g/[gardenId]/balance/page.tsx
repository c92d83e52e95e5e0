import type { Metadata } from "next";
import { BalanceView } from "@/components/balance/balance-view";
import { gardenNamesFrom } from "@/components/balance/garden-names";
import { parseBalanceRange } from "@/components/balance/balance-range";
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
  const names = gardenNamesFrom(await loadGardenInputs({ gardenId, asOf: today }));
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
