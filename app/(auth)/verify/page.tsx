import type { Metadata } from "next";
import Link from "next/link";
import { VerifyEmail } from "@/components/auth/verify-email";
import { FormAlert } from "@/components/auth/form-alert";
import { PageHeader } from "@/components/ui/page-header";

export const metadata: Metadata = { title: "Confirm your e-mail" };

type VerifyPageProps = { searchParams: Promise<Record<string, string | string[] | undefined>> };

export default async function VerifyPage({ searchParams }: VerifyPageProps) {
  const { token } = await searchParams;
  return (
    <>
      <PageHeader title="Confirm your e-mail" lead="One tap and your account is ready." />
      {typeof token === "string" && token.length >= 20 ? (
        <VerifyEmail token={token} />
      ) : (
        <div className="flex flex-col gap-4">
          <FormAlert tone="error">This link is incomplete. Open it again from the mail, or copy the whole address into the browser.</FormAlert>
          <Link href="/sign-in" className="inline-flex min-h-touch items-center font-bold">
            Go to sign in (it can send a new link)
          </Link>
        </div>
      )}
    </>
  );
}
