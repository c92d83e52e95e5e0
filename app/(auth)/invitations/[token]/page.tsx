import type { Metadata } from "next";
import Link from "next/link";
import { AcceptInvitationButton } from "@/components/auth/accept-invitation-button";
import { Alert, buttonStyles, Card, CardBody } from "@/components/ui";
import { getInvitationPreview } from "@/db/queries/invitations";
import { getPageUser } from "@/lib/auth/page-session";
import { roleDescriptions, roleLabels } from "@/lib/auth/roles";
import { hashLinkToken } from "@/lib/auth/tokens";
import { invitationProblems } from "@/lib/messages";

export const metadata: Metadata = { title: "Invitation" };
export const dynamic = "force-dynamic";

function problemOf(inv: NonNullable<Awaited<ReturnType<typeof getInvitationPreview>>>) {
  if (inv.revokedAt) return invitationProblems.revoked;
  if (inv.acceptedAt) return invitationProblems.used;
  if (inv.expiresAt.getTime() <= Date.now()) return invitationProblems.expired;
  return null;
}

export default async function InvitationPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const invitation =
    token.length >= 20 && token.length <= 200
      ? await getInvitationPreview({ tokenHash: hashLinkToken(token) })
      : null;
  const problem = invitation ? problemOf(invitation) : invitationProblems.invalid;
  const user = await getPageUser();
  const here = `/invitations/${token}`;

  return (
    <>
      <h1 className="text-3xl">{invitation ? `Join ${invitation.gardenName}` : "Invitation"}</h1>
      {problem || !invitation ? (
        <Alert tone="danger">{problem}</Alert>
      ) : (
        <Card>
          <CardBody className="flex flex-col gap-4">
            <p>
              You are invited as <strong>{roleLabels[invitation.role]}</strong>:{" "}
              {roleDescriptions[invitation.role].toLowerCase()}.
            </p>
            {user && user.email !== invitation.email ? (
              <Alert tone="caution">
                You are signed in as {user.email}, but this invitation is for {invitation.email}.{" "}
                {invitationProblems.wrong_account}
              </Alert>
            ) : user ? (
              <>
                <p className="text-sm text-soil-700">Signed in as {user.email}.</p>
                <AcceptInvitationButton token={token} gardenName={invitation.gardenName} />
              </>
            ) : (
              <div className="flex flex-wrap gap-3">
                <p className="w-full text-sm text-soil-700">
                  This invitation is for {invitation.email}.
                </p>
                <Link
                  className={buttonStyles({ variant: "primary" })}
                  href={`/sign-up?next=${encodeURIComponent(here)}`}
                >
                  Make an account to join
                </Link>
                <Link
                  className={buttonStyles({ variant: "secondary" })}
                  href={`/sign-in?next=${encodeURIComponent(here)}`}
                >
                  I have an account
                </Link>
              </div>
            )}
          </CardBody>
        </Card>
      )}
    </>
  );
}
