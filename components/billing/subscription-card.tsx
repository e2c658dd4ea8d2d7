import { Card } from "@/components/ui/card";
import { StatusBadge } from "@/components/ui/status-badge";
import type { Role } from "@/lib/auth/role-list";
import { formatMoney, PLANS } from "@/lib/payments/plans";
import type { SubscriptionSummary } from "@/lib/payments/subscriptions";

export function formatDay(date: Date): string {
  return new Intl.DateTimeFormat("en-US", { year: "numeric", month: "long", day: "numeric", timeZone: "UTC" }).format(date);
}

const ROLE_WORDS: Record<Role, string> = { builder: "Free account", subscriber: "Subscriber", admin: "Administrator" };

/** The account's standing as a word and an icon, never color alone. */
export function RoleBadge({ role }: { role: Role }) {
  return (
    <span data-testid="billing-role" data-role={role} className="w-fit">
      {role === "builder" ? (
        <span className="inline-flex items-center rounded-full border-2 border-rule-strong bg-paper-sunk px-3 py-1 text-lg font-bold text-ink">
          {ROLE_WORDS[role]}
        </span>
      ) : (
        <StatusBadge status="pass" label={ROLE_WORDS[role]} size="lg" />
      )}
    </span>
  );
}

/** One sentence on where the subscription stands, with the date that matters. */
export function subscriptionSentence(s: SubscriptionSummary): string {
  const end = s.currentPeriodEnd ? formatDay(s.currentPeriodEnd) : null;
  if (s.status === "canceled" || s.status === "incomplete_expired") {
    return `Ended${s.endedAt ? ` on ${formatDay(s.endedAt)}` : ""}. Your saved job sheets stay readable.`;
  }
  if (s.status === "past_due" || s.status === "unpaid") {
    return "The last payment did not go through. Update your card in the subscription settings to keep saving job sheets.";
  }
  if (s.cancelAtPeriodEnd) return `Canceled. You keep every paid feature until ${end ?? "the end of the period"}, then the account goes back to free.`;
  if (s.active) return `Active. Renews on ${end ?? "the next billing date"}.`;
  return "Waiting for the payment to be confirmed.";
}

export type SubscriptionCardProps = {
  role: Role;
  subscription: SubscriptionSummary | null;
};

/** The plan, its price, its state and the renewal or end date. */
export function SubscriptionCard({ role, subscription }: SubscriptionCardProps) {
  const plan = subscription?.plan ? PLANS[subscription.plan] : null;
  return (
    <Card title="Your plan" data-testid="subscription-card">
      <div className="flex flex-col gap-3">
        <RoleBadge role={role} />
        {subscription ? (
          <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1">
            <dt className="font-bold">Plan</dt>
            <dd data-testid="billing-plan">
              {plan ? `${plan.name} — ${formatMoney(plan.amountCents, plan.currency)} a ${plan.interval}` : subscription.planName}
            </dd>
            <dt className="font-bold">Status</dt>
            <dd data-testid="billing-status">{subscriptionSentence(subscription)}</dd>
          </dl>
        ) : role === "builder" ? (
          <p>You are on the free plan. Subscribe to save and reprint job sheets.</p>
        ) : role === "admin" ? (
          <p>Administrators have every paid feature without a subscription.</p>
        ) : (
          <p>Your account has every paid feature (granted without a card payment).</p>
        )}
      </div>
    </Card>
  );
}
