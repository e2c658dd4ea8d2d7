import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { SignInForm } from "@/components/auth/sign-in-form";
import { PageHeader } from "@/components/ui/page-header";
import { safeReturnPath } from "@/lib/auth/return-path";
import { getSessionUser } from "@/lib/auth/session";
import { env } from "@/lib/env";

export const metadata: Metadata = { title: "Sign in" };
export const dynamic = "force-dynamic";

type SignInPageProps = { searchParams: Promise<Record<string, string | string[] | undefined>> };

const NOTICES: Record<string, string> = {
  verified: "Your e-mail is confirmed. Sign in to carry on.",
  reset: "Password changed. Sign in with the new one.",
};

export default async function SignInPage({ searchParams }: SignInPageProps) {
  const params = await searchParams;
  const callbackUrl = typeof params.callbackUrl === "string" ? params.callbackUrl : undefined;
  if (await getSessionUser()) redirect(safeReturnPath(callbackUrl, env().APP_URL));
  const from = typeof params.from === "string" ? params.from : "";
  return (
    <>
      <PageHeader title="Sign in" lead="Sign in to save jobs, share them with your crew and print job sheets. Sizing works without an account." />
      <SignInForm callbackUrl={callbackUrl} notice={NOTICES[from]} />
    </>
  );
}
