import { ButtonLink } from "@/components/ui/button";
import { CheckIcon } from "@/components/ui/icons";
import { formatMoney, FREE_LIMITS, PLANS, type PlanId } from "@/lib/payments/plans";
import { startCheckoutAction } from "./actions";
import { BillingActionForm } from "./action-form";

const PAID_FEATURES = ["Save job sheets and print them again whenever you need", "As many saved jobs as you like", "As many live crew links as you like"];

export type PlanCardsProps = {
  /** "subscribe": buttons start checkout; "sign-in": they lead to sign-in; "none": the user already subscribes. */
  mode: "subscribe" | "sign-in" | "none";
  signInHref?: string;
  /** the job whose sheet the builder was saving: checkout brings them back to it with the sheet saved */
  returnJobId?: string;
};

function PlanCard({ plan, mode, signInHref, highlight, returnJobId }: { plan: PlanId; highlight?: string } & PlanCardsProps) {
  const p = PLANS[plan];
  const per = p.interval === "month" ? "month" : "year";
  return (
    <li className="flex flex-col gap-3 rounded-card border-2 border-rule bg-paper-raised p-4" data-plan={plan}>
      <div className="flex items-baseline justify-between gap-2">
        <h2 className="text-xl font-bold text-ink">{p.name}</h2>
        {highlight ? <span className="rounded-full bg-amber-light px-2.5 py-0.5 text-sm font-bold text-amber-dark">{highlight}</span> : null}
      </div>
      <p className="text-ink">
        <span className="text-4xl font-bold">{formatMoney(p.amountCents, p.currency)}</span>
        <span className="text-lg text-ink-soft"> a {per}</span>
      </p>
      <ul className="flex flex-col gap-1.5">
        {PAID_FEATURES.map((f) => (
          <li key={f} className="flex items-start gap-2">
            <CheckIcon className="mt-1 h-5 w-5 shrink-0 text-sound" />
            <span>{f}</span>
          </li>
        ))}
      </ul>
      <div className="mt-auto pt-2">
        {mode === "subscribe" ? (
          <BillingActionForm
            action={startCheckoutAction}
            fields={returnJobId ? { plan, job: returnJobId } : { plan }}
            label={`Subscribe ${p.name.toLowerCase()}`}
            testId={`subscribe-${plan}`}
          />
        ) : mode === "sign-in" ? (
          <ButtonLink href={signInHref ?? "/sign-in"} size="lg" fullWidth>
            Sign in to subscribe
          </ButtonLink>
        ) : null}
      </div>
    </li>
  );
}

/** The two paid plans side by side on wide screens, stacked on a phone, and what stays free. */
export function PlanCards(props: PlanCardsProps) {
  const yearlySaving = PLANS.monthly.amountCents * 12 - PLANS.yearly.amountCents;
  return (
    <div className="flex flex-col gap-4">
      <ul className="grid gap-4 md:grid-cols-2">
        <PlanCard plan="monthly" {...props} />
        <PlanCard plan="yearly" highlight={yearlySaving > 0 ? `Save ${formatMoney(yearlySaving)} a year` : undefined} {...props} />
      </ul>
      <FreeTier />
    </div>
  );
}

/** What a free account keeps; stated once here and on the billing page, from FREE_LIMITS. */
export function FreeTier() {
  return (
    <section className="rounded-card border-2 border-dashed border-rule-strong p-4" aria-labelledby="free-tier">
      <h2 id="free-tier" className="text-lg font-bold text-ink">
        Free, always
      </h2>
      <ul className="mt-2 flex list-disc flex-col gap-1 pl-6 text-ink">
        <li>Size joists, headers, beams, deck framing and rafters as often as you like</li>
        <li>Keep up to {FREE_LIMITS.savedJobs} saved jobs</li>
        <li>Share up to {FREE_LIMITS.activeCrewLinks} live crew links at a time</li>
        <li>Job sheets you saved while subscribed stay readable; nothing is deleted when a subscription ends</li>
      </ul>
    </section>
  );
}
