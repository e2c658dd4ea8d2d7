import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { safeReturnPath } from "@/lib/auth/return-path";
import { env } from "@/lib/env";
import { openPortalAction } from "@/components/billing/actions";
import { BillingActionForm } from "@/components/billing/action-form";
import { FreeTier } from "@/components/billing/plan-cards";
import { SubscriptionCard } from "@/components/billing/subscription-card";
import { ButtonLink } from "@/components/ui/button";
import { PageHeader } from "@/components/ui/page-header";
import { getSessionUser } from "@/lib/auth/session";
import { logger } from "@/lib/logger";
import { getBillingOverview } from "@/lib/payments/overview";
import { syncCheckoutSession } from "@/lib/payments/webhooks";

export const metadata: Metadata = { title: "Billing" };
export const dynamic = "force-dynamic";

type BillingPageProps = { searchParams: Promise<Record<string, string | string[] | undefined>> };

export default async function BillingPage({ searchParams }: BillingPageProps) {
  const user = await getSessionUser();
  if (!user) redirect("/sign-in?callbackUrl=%2Fbilling");
  const params = await searchParams;
  const sessionId = typeof params.session_id === "string" && /^cs_[A-Za-z0-9_]{1,200}$/.test(params.session_id) ? params.session_id : null;
  if (sessionId) {
    // Back from Checkout: read the result from Stripe now rather than wait for the webhooks.
    await syncCheckoutSession(user.id, sessionId).catch((err: unknown) => logger.warn({ err }, "checkout return sync failed"));
  }
  const overview = await getBillingOverview(user.id);
  if (!overview) redirect("/sign-in?callbackUrl=%2Fbilling");
  const { role, subscription, limits, hasCustomer } = overview;
  // Back from a checkout that started on a job's "Save job sheet": once paid, straight back to the job.
  const next = typeof params.next === "string" && params.next ? safeReturnPath(params.next, env().APP_URL) : null;
  if (params.checkout === "success" && next && subscription?.active) redirect(next);
  const live = Boolean(subscription && subscription.status !== "canceled" && subscription.status !== "incomplete_expired");

  return (
    <div className="flex flex-col gap-4 pb-8">
      <PageHeader title="Billing" lead="Your plan, when it renews, and how to cancel or resume it." />
      {params.checkout === "success" ? (
        <p role="status" className="rounded-card border-2 border-sound bg-sound-bg p-3 font-bold text-sound-ink" data-testid="checkout-result">
          {subscription?.active
            ? "Payment received. Your subscription is active — thank you."
            : "Payment received. Confirming it with the payment service; refresh in a moment."}
          {next ? (
            <a href={next} className="mt-2 block font-bold">
              Back to the job
            </a>
          ) : null}
        </p>
      ) : null}
      <SubscriptionCard role={role} subscription={subscription} />
      {hasCustomer && subscription ? (
        <section className="flex flex-col gap-2" aria-labelledby="manage">
          <h2 id="manage" className="text-lg font-bold">
            {live ? "Change, cancel or resume" : "Past payments"}
          </h2>
          <p className="text-ink-soft">
            {live
              ? "Opens the subscription settings of our payment service. Canceling keeps every paid feature until the end of the period you paid for."
              : "Opens the subscription settings of our payment service, with your receipts."}
          </p>
          <BillingActionForm action={openPortalAction} label="Manage subscription" variant="secondary" testId="manage-subscription" />
        </section>
      ) : null}
      {!limits.canSaveSheets ? (
        <>
          <ButtonLink href="/pricing" size="lg" fullWidth className="md:w-fit">
            See plans
          </ButtonLink>
          <FreeTier />
        </>
      ) : null}
    </div>
  );
}
