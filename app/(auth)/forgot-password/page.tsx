import type { Metadata } from "next";
import { ForgotPasswordForm } from "@/components/auth/forgot-password-form";
import { PageHeader } from "@/components/ui/page-header";

export const metadata: Metadata = { title: "Forgot your password" };

export default function ForgotPasswordPage() {
  return (
    <>
      <PageHeader title="Forgot your password?" lead="Give the e-mail you signed up with. We will send a link to choose a new password." />
      <ForgotPasswordForm />
    </>
  );
}
