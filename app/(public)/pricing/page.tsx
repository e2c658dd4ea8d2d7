import type { Metadata } from "next";
import { ButtonLink } from "@/components/ui/button";
import { PageHeader } from "@/components/ui/page-header";
import { PlanCards } from "@/components/billing/plan-cards";
import { TestModeNote } from "@/components/billing/test-mode-note";
import { getSessionUser } from "@/lib/auth/session";
import { isTestMode } from "@/lib/payments/overview";
import { getSubscription } from "@/lib/payments/subscriptions";

export const metadata: Metadata = { title: "Plans" };
export const dynamic = "force-dynamic";

type PricingPageProps = { searchParams: Promise<Record<string, string | string[] | undefined>> };

export default async function PricingPage({ searchParams }: PricingPageProps) {
  const params = await searchParams;
  const user = await getSessionUser();
  const subscription = user ? await getSubscription(user.id) : null;
  const subscribed = Boolean(subscription?.active) || user?.role === "admin";
  const mode = !user ? "sign-in" : subscribed ? "none" : "subscribe";
  // Sent here by "Save job sheet" on a job: after paying, back to that job with the sheet saved.
  const job = typeof params.job === "string" && /^[0-9a-f-]{36}$/i.test(params.job) ? params.job : undefined;
  const here = job ? `/pricing?job=${job}` : "/pricing";

  return (
    <div className="flex flex-col gap-4 pb-8">
      <PageHeader
        title="Plans"
        lead="Sizing members is free. A subscription saves job sheets you can print again, and lifts the limits on saved jobs and crew links."
      />
      {params.checkout === "canceled" ? (
        <p role="status" className="rounded-card border-2 border-rule bg-paper-raised p-3 font-bold">
          Checkout canceled. Nothing was charged.
        </p>
      ) : null}
      {subscribed ? (
        <div className="flex flex-col gap-3 rounded-card border-2 border-sound bg-sound-bg p-4 text-sound-ink">
          <p className="font-bold">Your account already has every paid feature.</p>
          <ButtonLink href={job ? `/jobs/${job}` : "/billing"} variant="secondary" className="w-fit">
            {job ? "Back to the job" : "See your billing"}
          </ButtonLink>
        </div>
      ) : null}
      {job && !subscribed ? (
        <p className="rounded-card border-2 border-spruce bg-spruce-light p-3 text-ink" data-testid="pricing-for-sheet">
          <strong>Saving a job sheet needs a subscription.</strong> Choose a plan: once it is paid you come straight back to your job with the sheet saved.{" "}
          <a href={`/jobs/${job}`} className="font-bold">
            Back to the job
          </a>
        </p>
      ) : null}
      {mode === "subscribe" && isTestMode() ? <TestModeNote /> : null}
      <PlanCards mode={mode} signInHref={`/sign-in?callbackUrl=${encodeURIComponent(here)}`} returnJobId={job} />
      <p className="text-ink-soft">Prices in US dollars. Cancel whenever you like: you keep the paid features until the end of the period you paid for.</p>
    </div>
  );
}
