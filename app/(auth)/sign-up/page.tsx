import type { Metadata } from "next";
import { SignUpForm } from "@/components/auth/sign-up-form";
import { Card, CardBody } from "@/components/ui";
import { safeNextPath } from "@/lib/safe-next";

export const metadata: Metadata = { title: "Make an account" };

export default async function SignUpPage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | string[]>>;
}) {
  const next = safeNextPath((await searchParams).next);
  return (
    <>
      <h1 className="text-3xl">Make an account</h1>
      <Card>
        <CardBody>
          <SignUpForm next={next} />
        </CardBody>
      </Card>
    </>
  );
}
