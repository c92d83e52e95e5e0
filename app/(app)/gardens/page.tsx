import type { Metadata } from "next";
import Link from "next/link";
import { CreateGardenForm } from "@/components/garden/create-garden-form";
import { SignedInFrame } from "@/components/shell/signed-in-frame";
import { Badge, Card, CardBody, CardHeader, CardTitle, EmptyState } from "@/components/ui";
import { listGardensForUser } from "@/db/queries/memberships";
import { requirePageUser } from "@/lib/auth/page-session";
import { roleLabels } from "@/lib/auth/roles";

export const metadata: Metadata = { title: "Your gardens" };

export default async function GardensPage() {
  const user = await requirePageUser("/gardens");
  const gardens = await listGardensForUser({ userId: user.id });
  return (
    <SignedInFrame userName={user.name} gardens={gardens}>
      <main className="mx-auto flex max-w-3xl flex-col gap-6 px-4 py-6">
        <h1 className="text-3xl">Your gardens</h1>
        {gardens.length === 0 ? (
          <EmptyState
            title="No gardens yet"
            text="Start one for your own plot below, or open the invitation link someone sent you to join theirs."
          />
        ) : (
          <ul className="grid gap-3 sm:grid-cols-2">
            {gardens.map((g) => (
              <li key={g.id}>
                <Link
                  href={`/g/${g.id}`}
                  className="block rounded-card focus-visible:outline-offset-4"
                >
                  <Card className="hover:border-leaf-700">
                    <CardBody className="flex items-center justify-between gap-3">
                      <span className="font-display text-xl">{g.name}</span>
                      <Badge>{roleLabels[g.role]}</Badge>
                    </CardBody>
                  </Card>
                </Link>
              </li>
            ))}
          </ul>
        )}
        <Card>
          <CardHeader>
            <CardTitle>Start a garden</CardTitle>
          </CardHeader>
          <CardBody>
            <CreateGardenForm />
          </CardBody>
        </Card>
      </main>
    </SignedInFrame>
  );
}
