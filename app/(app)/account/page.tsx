import type { Metadata } from "next";
import { ChangePasswordForm } from "@/components/account/change-password-form";
import { SignOutEverywhere } from "@/components/account/sign-out-everywhere";
import { SignedInFrame } from "@/components/shell/signed-in-frame";
import { Card, CardBody, CardHeader, CardTitle } from "@/components/ui";
import { listGardensForUser } from "@/db/queries/memberships";
import { requirePageUser } from "@/lib/auth/page-session";

export const metadata: Metadata = { title: "Your account" };

export default async function AccountPage() {
  const user = await requirePageUser("/account");
  const gardens = await listGardensForUser({ userId: user.id });
  return (
    <SignedInFrame userName={user.name} gardens={gardens}>
      <main className="mx-auto flex max-w-xl flex-col gap-6 px-4 py-6">
        <h1 className="text-3xl">Your account</h1>
        <p className="text-soil-700">
          {user.name} · {user.email}
        </p>
        <Card>
          <CardHeader>
            <CardTitle>Change password</CardTitle>
          </CardHeader>
          <CardBody>
            <ChangePasswordForm />
          </CardBody>
        </Card>
        <Card>
          <CardHeader>
            <CardTitle>Devices</CardTitle>
          </CardHeader>
          <CardBody>
            <SignOutEverywhere />
          </CardBody>
        </Card>
      </main>
    </SignedInFrame>
  );
}
