import type { CheckoutSessionObject, PortalSessionObject, PriceObject, ProductObject, SubscriptionObject } from "./objects";

/**
 * The stand-in's own plain pages: a checkout form and a subscription portal. They say plainly that they
 * are a local test stand-in, so nobody mistakes them for a real payment page.
 */
export function escapeHtml(value: string): string {
  return value.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c] ?? c);
}

export function money(amountMinor: number, currency: string): string {
  return new Intl.NumberFormat("en-US", { style: "currency", currency: currency.toUpperCase() }).format(amountMinor / 100);
}

function dateText(epochSec: number): string {
  return new Intl.DateTimeFormat("en-US", { dateStyle: "long", timeZone: "UTC" }).format(new Date(epochSec * 1000));
}

function every(price: PriceObject): string {
  if (!price.recurring) return "";
  const { interval, interval_count: n } = price.recurring;
  return n === 1 ? ` / ${interval}` : ` every ${n} ${interval}s`;
}

const STYLE = `
  *{box-sizing:border-box}
  body{margin:0;font:17px/1.55 system-ui,sans-serif;background:#f2f2f0;color:#1b1b1b}
  main{max-width:30rem;margin:0 auto;padding:1.25rem 1rem 3rem}
  .tag{display:inline-block;font-size:.85rem;font-weight:700;letter-spacing:.04em;text-transform:uppercase;background:#1b1b1b;color:#fff;padding:.2rem .55rem;border-radius:.3rem}
  h1{font-size:1.5rem;margin:.75rem 0 .25rem}
  .box{background:#fff;border:2px solid #cfcfc8;border-radius:.6rem;padding:1rem;margin:1rem 0}
  .row{display:flex;justify-content:space-between;gap:1rem}
  .total{font-size:1.35rem;font-weight:700}
  label{display:block;font-weight:700;margin:.8rem 0 .25rem}
  input{width:100%;min-height:48px;font:inherit;padding:.5rem .7rem;border:2px solid #8a8a80;border-radius:.45rem}
  input:focus{outline:3px solid #0b57d0;outline-offset:1px}
  .pair{display:flex;gap:.75rem}.pair>div{flex:1}
  button{width:100%;min-height:52px;margin-top:1.1rem;font:inherit;font-weight:700;border-radius:.5rem;border:2px solid #243b6b;background:#243b6b;color:#fff;cursor:pointer}
  button.plain{background:#fff;color:#243b6b}
  button.warn{background:#8f1d17;border-color:#8f1d17}
  .err{border:2px solid #8f1d17;background:#fbe7e5;color:#6e1510;border-radius:.5rem;padding:.75rem;font-weight:700}
  .ok{border:2px solid #145c2b;background:#e4f3e8;color:#0f4520;border-radius:.5rem;padding:.75rem;font-weight:700}
  .hint{color:#4a4a44;font-size:.95rem}
  a{color:#243b6b;font-weight:700}
  code{font-size:1rem}
`;

function layout(title: string, body: string): string {
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width,initial-scale=1">
<title>${escapeHtml(title)}</title><style>${STYLE}</style></head><body><main>
<span class="tag">Local payment stand-in · test mode</span>
${body}
</main></body></html>`;
}

interface CheckoutPageInput {
  session: CheckoutSessionObject;
  lines: Array<{ price: PriceObject; product: ProductObject; quantity: number }>;
  email: string | null;
  error?: string;
  values?: { number?: string; expiry?: string; cvc?: string; name?: string };
}

export function checkoutPage({ session, lines, email, error, values = {} }: CheckoutPageInput): string {
  if (session.status !== "open") {
    const word = session.status === "complete" ? "This checkout is already paid." : "This checkout has expired.";
    const back = session.status === "complete" ? session.success_url.replace("{CHECKOUT_SESSION_ID}", session.id) : session.cancel_url;
    return layout("Checkout", `<h1>${word}</h1>${back ? `<p><a href="${escapeHtml(back)}">Return to the site</a></p>` : ""}`);
  }
  const rows = lines
    .map(
      (l) =>
        `<div class="row"><span>${escapeHtml(l.product.name)}${l.quantity > 1 ? ` × ${l.quantity}` : ""}</span><span>${money(
          l.price.unit_amount * l.quantity,
          l.price.currency,
        )}${every(l.price)}</span></div>`,
    )
    .join("");
  const first = lines[0]?.price;
  const due = money(session.amount_total, session.currency);
  return layout(
    "Checkout",
    `<h1>Pay ${due}${first ? escapeHtml(every(first)) : ""}</h1>
<div class="box">${rows}<hr><div class="row total"><span>Due today</span><span>${due}</span></div></div>
${error ? `<p class="err" role="alert" id="card-error">${escapeHtml(error)} Check the card and try again.</p>` : ""}
<form method="post" action="/checkout/${escapeHtml(session.id)}/pay" novalidate>
  <label for="email">E-mail</label>
  <input id="email" name="email" type="email" value="${escapeHtml(email ?? "")}" readonly>
  <label for="number">Card number</label>
  <input id="number" name="number" inputmode="numeric" autocomplete="cc-number" placeholder="1234 1234 1234 1234" value="${escapeHtml(values.number ?? "")}" required>
  <div class="pair">
    <div><label for="expiry">Expiry (MM/YY)</label><input id="expiry" name="expiry" inputmode="numeric" autocomplete="cc-exp" placeholder="MM/YY" value="${escapeHtml(values.expiry ?? "")}" required></div>
    <div><label for="cvc">Security code</label><input id="cvc" name="cvc" inputmode="numeric" autocomplete="cc-csc" placeholder="123" value="${escapeHtml(values.cvc ?? "")}" required></div>
  </div>
  <label for="name">Name on card</label>
  <input id="name" name="name" autocomplete="cc-name" value="${escapeHtml(values.name ?? "")}">
  <button type="submit">Pay ${due}</button>
</form>
<p class="hint">Test cards: <code>4242 4242 4242 4242</code> pays; <code>4000 0000 0000 0002</code> is declined. Any future expiry and any 3 digits.</p>
${session.cancel_url ? `<p><a href="${escapeHtml(session.cancel_url)}">Cancel and return</a></p>` : ""}`,
  );
}

interface PortalPageInput {
  session: PortalSessionObject;
  email: string | null;
  subscriptions: SubscriptionObject[];
  products: Map<string, ProductObject>;
  notice?: string;
  error?: string;
}

export function portalPage({ session, email, subscriptions, products, notice, error }: PortalPageInput): string {
  const cards = subscriptions
    .map((sub) => {
      const item = sub.items.data[0];
      const name = products.get(item.price.product)?.name ?? "Subscription";
      const price = `${money(item.price.unit_amount * item.quantity, item.price.currency)}${every(item.price)}`;
      const end = dateText(item.current_period_end);
      let state: string;
      let actions = "";
      const form = (action: string, label: string, cls = "") =>
        `<form method="post" action="/portal/${escapeHtml(session.id)}/${action}"><input type="hidden" name="subscription" value="${escapeHtml(
          sub.id,
        )}"><button type="submit" class="${cls}">${label}</button></form>`;
      if (sub.status === "canceled") {
        state = `Ended on ${dateText(sub.ended_at ?? item.current_period_end)}.`;
      } else if (sub.cancel_at_period_end) {
        state = `Canceled — stays active until ${end}, then ends.`;
        actions = form("resume", "Keep my subscription");
      } else {
        state = sub.status === "past_due" ? `Payment overdue. Renews ${end}.` : `Active. Renews ${end}.`;
        actions = form("cancel", "Cancel at end of period", "warn") + form("cancel-now", "Cancel now", "plain");
      }
      return `<div class="box" data-subscription="${escapeHtml(sub.id)}"><div class="row"><strong>${escapeHtml(name)}</strong><span>${price}</span></div>
<p data-state>${escapeHtml(state)}</p>${actions}</div>`;
    })
    .join("");
  return layout(
    "Manage subscription",
    `<h1>Your subscription</h1>
${email ? `<p class="hint">Signed in to the portal as ${escapeHtml(email)}</p>` : ""}
${notice ? `<p class="ok" role="status">${escapeHtml(notice)}</p>` : ""}
${error ? `<p class="err" role="alert">${escapeHtml(error)}</p>` : ""}
${cards || "<p>No subscriptions yet.</p>"}
${session.return_url ? `<p><a href="${escapeHtml(session.return_url)}">Return to the site</a></p>` : ""}`,
  );
}

export function messagePage(title: string, text: string): string {
  return layout(title, `<h1>${escapeHtml(title)}</h1><p>${escapeHtml(text)}</p>`);
}
