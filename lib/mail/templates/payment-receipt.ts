import { greeting, renderMail, type RenderedMail } from "./layout";

export interface PaymentReceiptMailInput {
  name: string;
  /** What was paid for, e.g. "Spanlark subscription, monthly". */
  description: string;
  /** The amount in the currency's smallest unit (cents). */
  amountCents: number;
  /** ISO 4217 code, e.g. "usd". */
  currency: string;
  paidAt: Date;
  /** The end of the period paid for, when the payment is a subscription. */
  periodEnd?: Date | null;
  /** The payment's reference (invoice or payment number) to quote in questions. */
  reference: string;
  /** The billing page, where the subscription can be managed or canceled. */
  billingLink: string;
}

function money(amountCents: number, currency: string): string {
  return new Intl.NumberFormat("en-US", { style: "currency", currency: currency.toUpperCase() }).format(amountCents / 100);
}

function day(date: Date): string {
  return new Intl.DateTimeFormat("en-US", { year: "numeric", month: "long", day: "numeric", timeZone: "UTC" }).format(date);
}

/** Sent by the payments part once a payment has gone through. */
export function paymentReceiptMail(input: PaymentReceiptMailInput): RenderedMail {
  const rows: Array<readonly [string, string]> = [
    ["For", input.description],
    ["Amount", money(input.amountCents, input.currency)],
    ["Paid on", day(input.paidAt)],
  ];
  if (input.periodEnd) rows.push(["Paid through", day(input.periodEnd)]);
  rows.push(["Reference", input.reference]);
  return renderMail(`Spanlark receipt ${input.reference}`, [
    { kind: "para", text: greeting(input.name) },
    { kind: "para", text: "Thank you: your payment went through. Keep this mail as your receipt." },
    { kind: "rows", rows },
    { kind: "link", label: "See or change your plan", href: input.billingLink },
    { kind: "caution" },
  ]);
}
