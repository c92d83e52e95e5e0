import type { Metadata } from "next";
import { SignInForm } from "@/components/auth/sign-in-form";
import { Card, CardBody, inlineLinkStyles, Table, TBody, Td, Th, THead, Tr } from "@/components/ui";
import { demoMembers } from "@/db/seed/demo-garden";
import { safeNextPath } from "@/lib/safe-next";
import { getEnv } from "@/lib/env";

export const metadata: Metadata = { title: "Sign in" };
export const dynamic = "force-dynamic";

export default async function SignInPage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | string[]>>;
}) {
  const next = safeNextPath((await searchParams).next);
  // Demo passwords are public by design and shown only when the demo garden is loaded.
  const demo = getEnv().CASTLINE_DEMO;
  return (
    <>
      <h1 className="text-3xl">Sign in</h1>
      <Card>
        <CardBody>
          <SignInForm next={next} />
        </CardBody>
      </Card>
      {demo ? (
        // The table is its own bordered region (no card around it), two columns so it
        // fits the 375 px phone this column narrows to without scrolling sideways.
        <section className="flex flex-col gap-3">
          <Table caption="Demo accounts for the Hollis Street Garden">
            <THead>
              <Tr>
                <Th>Role</Th>
                <Th>E-mail and password</Th>
              </Tr>
            </THead>
            <TBody>
              {demoMembers.map((m) => (
                <Tr key={m.email}>
                  <Th scope="row" className="align-top font-normal capitalize">
                    {m.role}
                  </Th>
                  <Td>
                    <span className="block break-all">{m.email}</span>
                    <code className="block break-all">{m.password}</code>
                  </Td>
                </Tr>
              ))}
            </TBody>
          </Table>
          <p className="text-sm text-soil-700">
            The demo sends no real e-mail: it lands in the{" "}
            <a className={inlineLinkStyles} href="/dev/outbox">
              local outbox
            </a>
            , where each signed-in person reads only mail to their own address. To follow an
            invitation, sign up with the invited address first, then open the outbox.
          </p>
        </section>
      ) : null}
    </>
  );
}
