import type { Metadata } from "next";
import { Link } from "@/components/ui/link";
import { VerifyEmail } from "@/components/auth/verify-email";
import { FormAlert } from "@/components/auth/form-alert";
import { PageHeader } from "@/components/ui/page-header";
import { DEFAULT_RETURN_PATH, safeReturnPath } from "@/lib/auth/return-path";
import { env } from "@/lib/env";

export const metadata: Metadata = { title: "Confirm your e-mail" };

type VerifyPageProps = { searchParams: Promise<Record<string, string | string[] | undefined>> };

export default async function VerifyPage({ searchParams }: VerifyPageProps) {
  const { token, next } = await searchParams;
  // the page the builder signed up from (carried through the mailed link), only if it stays on our origin
  const returnPath = typeof next === "string" ? safeReturnPath(next, env().APP_URL) : DEFAULT_RETURN_PATH;
  const returnTo = returnPath === DEFAULT_RETURN_PATH ? undefined : returnPath;
  return (
    <>
      <PageHeader title="Confirm your e-mail" lead="One tap and your account is ready." />
      {typeof token === "string" && token.length >= 20 ? (
        <VerifyEmail token={token} returnTo={returnTo} />
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
