import type { Metadata } from "next";
import { FormAlert } from "@/components/auth/form-alert";
import { ResetPasswordForm } from "@/components/auth/reset-password-form";
import { ButtonLink } from "@/components/ui/button";
import { PageHeader } from "@/components/ui/page-header";

export const metadata: Metadata = { title: "Choose a new password" };

type ResetPasswordPageProps = { searchParams: Promise<Record<string, string | string[] | undefined>> };

export default async function ResetPasswordPage({ searchParams }: ResetPasswordPageProps) {
  const { token } = await searchParams;
  return (
    <>
      <PageHeader title="Choose a new password" />
      {typeof token === "string" && token.length >= 20 ? (
        <ResetPasswordForm token={token} />
      ) : (
        <div className="flex flex-col gap-4">
          <FormAlert tone="error">This link is incomplete. Open it again from the mail, or ask for a new one.</FormAlert>
          <ButtonLink href="/forgot-password" size="lg" fullWidth>
            Send me a new link
          </ButtonLink>
        </div>
      )}
    </>
  );
}
