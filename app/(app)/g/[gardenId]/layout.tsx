import type { ReactNode } from "react";
import { GardenNav } from "@/components/shell/garden-nav";
import { SignedInFrame } from "@/components/shell/signed-in-frame";
import { getGardenById } from "@/db/queries/gardens";
import { requirePageMember } from "@/lib/auth/page-session";
import { notFound } from "next/navigation";

export default async function GardenLayout({
  children,
  params,
}: {
  children: ReactNode;
  params: Promise<{ gardenId: string }>;
}) {
  const { gardenId } = await params;
  const member = await requirePageMember(gardenId, "viewer");
  const garden = await getGardenById({ gardenId });
  if (!garden) notFound();
  return (
    <SignedInFrame user={member.user} currentGardenId={gardenId}>
      <GardenNav gardenId={gardenId} role={member.role} />
      <main className="mx-auto flex max-w-5xl flex-col gap-6 px-4 py-6">{children}</main>
    </SignedInFrame>
  );
}
