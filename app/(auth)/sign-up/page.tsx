import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { SignUpForm } from "@/components/auth/sign-up-form";
import { PageHeader } from "@/components/ui/page-header";
import { safeReturnPath } from "@/lib/auth/return-path";
import { env } from "@/lib/env";
import { getSessionUser } from "@/lib/auth/session";
import { FREE_LIMITS } from "@/lib/payments/plans";

export const metadata: Metadata = { title: "Open an account" };
export const dynamic = "force-dynamic";

type SignUpPageProps = { searchParams: Promise<Record<string, string | string[] | undefined>> };

export default async function SignUpPage({ searchParams }: SignUpPageProps) {
  const params = await searchParams;
  const callbackUrl = typeof params.callbackUrl === "string" ? params.callbackUrl : undefined;
  if (await getSessionUser()) redirect(safeReturnPath(callbackUrl, env().APP_URL));
  return (
    <>
      <PageHeader
        title="Open an account"
        lead={`Free: size members as often as you like, keep up to ${FREE_LIMITS.savedJobs} saved jobs and share up to ${FREE_LIMITS.activeCrewLinks} live crew links. Job sheets come with a subscription.`}
      />
      <SignUpForm callbackUrl={callbackUrl} />
    </>
  );
}
