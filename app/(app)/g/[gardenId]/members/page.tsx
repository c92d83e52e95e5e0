import type { Metadata } from "next";
import { InvitationList } from "@/components/members/invitation-list";
import { InviteForm } from "@/components/members/invite-form";
import { MemberList } from "@/components/members/member-list";
import { Card, CardBody, CardHeader, CardTitle } from "@/components/ui";
import { getGardenById } from "@/db/queries/gardens";
import { listOpenInvitations } from "@/db/queries/invitations";
import { listMembers } from "@/db/queries/memberships";
import { requirePageMember } from "@/lib/auth/page-session";

export const metadata: Metadata = { title: "Members" };

export default async function MembersPage({ params }: { params: Promise<{ gardenId: string }> }) {
  const { gardenId } = await params;
  const member = await requirePageMember(gardenId, "viewer");
  const isOwner = member.role === "owner";
  const [garden, members, invitations] = await Promise.all([
    getGardenById({ gardenId }),
    listMembers({ gardenId }),
    isOwner ? listOpenInvitations({ gardenId }) : Promise.resolve([]),
  ]);
  return (
    <>
      <h1 className="text-3xl">Members</h1>
      <Card>
        <CardBody>
          <MemberList
            gardenId={gardenId}
            gardenName={garden?.name ?? ""}
            meId={member.user.id}
            canManage={isOwner}
            initial={members.map(({ since: _since, ...m }) => m)}
          />
        </CardBody>
      </Card>
      {isOwner ? (
        <>
          <Card>
            <CardHeader>
              <CardTitle>Invite someone</CardTitle>
            </CardHeader>
            <CardBody>
              <InviteForm gardenId={gardenId} />
            </CardBody>
          </Card>
          <Card>
            <CardHeader>
              <CardTitle>Open invitations</CardTitle>
            </CardHeader>
            <CardBody>
              <InvitationList
                gardenId={gardenId}
                timeZone={garden?.timeZone ?? "UTC"}
                initial={invitations.map((i) => ({ ...i, expiresAt: i.expiresAt.toISOString() }))}
              />
            </CardBody>
          </Card>
        </>
      ) : null}
    </>
  );
}
