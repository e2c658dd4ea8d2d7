import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { SignUpForm } from "@/components/auth/sign-up-form";
import { PageHeader } from "@/components/ui/page-header";
import { getSessionUser } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Open an account" };
export const dynamic = "force-dynamic";

export default async function SignUpPage() {
  if (await getSessionUser()) redirect("/account");
  return (
    <>
      <PageHeader title="Open an account" lead="Free. Save your jobs, share them with the crew, print job sheets." />
      <SignUpForm />
    </>
  );
}
