import { createHmac } from "node:crypto";
import type { EventObject } from "./objects";

/**
 * Stripe's webhook signature: header `Stripe-Signature: t=<unix seconds>,v1=<hex HMAC-SHA256>`, where the
 * HMAC key is the endpoint secret (the whole `whsec_…` string) and the signed text is `<t>.<raw body>`.
 */
export function signatureHeader(payload: string, secret: string, timestampSec: number): string {
  const v1 = createHmac("sha256", secret).update(`${timestampSec}.${payload}`, "utf8").digest("hex");
  return `t=${timestampSec},v1=${v1}`;
}

interface DeliveryRecord {
  eventId: string;
  type: string;
  status: number | null;
  attempts: number;
  error?: string;
}

interface WebhookSenderOptions {
  url: string;
  secret: string;
  /** Attempts per event before giving up (Stripe retries for days; the stand-in keeps it short). */
  attempts?: number;
  retryDelayMs?: number;
  log?: (line: string) => void;
}

/**
 * Sends events to one endpoint, one at a time in the order they were created (as they were created, so
 * one request's events arrive together). `settled()` resolves when the queue is empty.
 */
export class WebhookSender {
  private queue: Promise<void> = Promise.resolve();
  readonly deliveries: DeliveryRecord[] = [];

  constructor(private readonly options: WebhookSenderOptions) {}

  enqueue(event: EventObject, onDelivered: (ok: boolean) => void = () => {}): void {
    this.queue = this.queue.then(async () => onDelivered(await this.deliver(event)));
  }

  settled(): Promise<void> {
    return this.queue;
  }

  private async deliver(event: EventObject): Promise<boolean> {
    const attempts = this.options.attempts ?? 3;
    const record: DeliveryRecord = { eventId: event.id, type: event.type, status: null, attempts: 0 };
    this.deliveries.push(record);
    const payload = JSON.stringify(event, null, 2);
    for (let attempt = 1; attempt <= attempts; attempt += 1) {
      record.attempts = attempt;
      try {
        const res = await fetch(this.options.url, {
          method: "POST",
          headers: {
            "content-type": "application/json; charset=utf-8",
            "user-agent": "Stripe/1.0 (+https://stripe.com/docs/webhooks) spanlark-standin",
            "stripe-signature": signatureHeader(payload, this.options.secret, Math.floor(Date.now() / 1000)),
          },
          body: payload,
          signal: AbortSignal.timeout(15_000),
        });
        record.status = res.status;
        await res.arrayBuffer();
        this.options.log?.(`webhook ${event.type} ${event.id} -> ${res.status}`);
        if (res.ok) return true;
      } catch (err) {
        record.error = (err as Error).message;
        this.options.log?.(`webhook ${event.type} ${event.id} failed: ${record.error}`);
      }
      if (attempt < attempts) await new Promise((r) => setTimeout(r, (this.options.retryDelayMs ?? 300) * attempt));
    }
    return false;
  }
}
