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

  return (
    <div className="flex flex-col gap-4 pb-8">
      <PageHeader
        title="Plans"
        lead="Sizing members is free. A subscription saves job sheets you can print again, and lifts the limits on saved jobs and crew links."
      />
      {params.checkout === "cancelled" ? (
        <p role="status" className="rounded-card border-2 border-rule bg-paper-raised p-3 font-bold">
          Checkout cancelled. Nothing was charged.
        </p>
      ) : null}
      {subscribed ? (
        <div className="flex flex-col gap-3 rounded-card border-2 border-sound bg-sound-bg p-4 text-sound-ink">
          <p className="font-bold">Your account already has every paid feature.</p>
          <ButtonLink href="/billing" variant="secondary" className="w-fit">
            See your billing
          </ButtonLink>
        </div>
      ) : null}
      {mode === "subscribe" && isTestMode() ? <TestModeNote /> : null}
      <PlanCards mode={mode} signInHref="/sign-in?callbackUrl=%2Fpricing" />
      <p className="text-ink-soft">Prices in US dollars. Cancel whenever you like: you keep the paid features until the end of the period you paid for.</p>
    </div>
  );
}
