import type { Metadata } from "next";
import { ForgotPasswordForm } from "@/components/auth/forgot-password-form";
import { Card, CardBody } from "@/components/ui";

export const metadata: Metadata = { title: "Forgot password" };

export default function ForgotPasswordPage() {
  return (
    <>
      <h1 className="text-3xl">Forgot your password?</h1>
      <p className="text-soil-700">
        We will e-mail you a link to choose a new one. It works once, for one hour.
      </p>
      <Card>
        <CardBody>
          <ForgotPasswordForm />
        </CardBody>
      </Card>
    </>
  );
}
