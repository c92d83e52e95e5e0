import type { Metadata } from "next";
import { DeleteGarden } from "@/components/garden/delete-garden";
import { GardenSettingsForm } from "@/components/garden/garden-settings-form";
import { OwnersOnlyNotice } from "@/components/garden/owners-only-notice";
import { Card, CardBody, CardHeader, CardTitle } from "@/components/ui";
import { getGardenById } from "@/db/queries/gardens";
import { listMembers } from "@/db/queries/memberships";
import { requirePageMember } from "@/lib/auth/page-session";

export const metadata: Metadata = { title: "Settings" };

export default async function GardenSettingsPage({
  params,
}: {
  params: Promise<{ gardenId: string }>;
}) {
  const { gardenId } = await params;
  // Any member may open the page; only owners get the form (the PATCH and DELETE routes
  // check the role again). Others are told why and who to ask, not silently sent away.
  const member = await requirePageMember(gardenId, "viewer");
  const garden = await getGardenById({ gardenId });
  if (!garden) return null;
  if (member.role !== "owner") {
    const owners = (await listMembers({ gardenId })).filter((m) => m.role === "owner");
    return (
      <>
        <h1 className="text-3xl">Settings</h1>
        <OwnersOnlyNotice gardenId={gardenId} owners={owners} />
      </>
    );
  }
  return (
    <>
      <h1 className="text-3xl">Settings</h1>
      <Card>
        <CardBody>
          <GardenSettingsForm
            gardenId={gardenId}
            initial={{
              name: garden.name,
              timeZone: garden.timeZone,
              unitSystem: garden.unitSystem,
              lastSpringFrost: garden.lastSpringFrost,
              firstFallFrost: garden.firstFallFrost,
              location: garden.location ?? "",
            }}
          />
        </CardBody>
      </Card>
      <Card className="border-bloom-200">
        <CardHeader>
          <CardTitle>Delete the garden</CardTitle>
        </CardHeader>
        <CardBody>
          <DeleteGarden gardenId={gardenId} gardenName={garden.name} />
        </CardBody>
      </Card>
    </>
  );
}
