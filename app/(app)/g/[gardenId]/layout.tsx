import type { ReactNode } from "react";
import { notFound } from "next/navigation";
import { SignedInFrame } from "@/components/shell/signed-in-frame";
import { getGardenById } from "@/db/queries/gardens";
import { listGardensForUser } from "@/db/queries/memberships";
import { requirePageMember } from "@/lib/auth/page-session";

export default async function GardenLayout({
  children,
  params,
}: {
  children: ReactNode;
  params: Promise<{ gardenId: string }>;
}) {
  const { gardenId } = await params;
  const member = await requirePageMember(gardenId, "viewer");
  const [garden, gardens] = await Promise.all([
    getGardenById({ gardenId }),
    listGardensForUser({ userId: member.user.id }),
  ]);
  if (!garden) notFound();
  return (
    <SignedInFrame
      userName={member.user.name}
      gardens={gardens}
      garden={{ id: gardenId, role: member.role }}
    >
      <main className="mx-auto flex max-w-5xl flex-col gap-6 px-4 py-6">{children}</main>
    </SignedInFrame>
  );
}
