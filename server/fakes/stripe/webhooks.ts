import { createHmac } from 'node:crypto';
import type { FakeStripeStore, StripeEvent } from './store.js';

export interface WebhookOptions {
  /** Our endpoint; with none, events are only kept and listed. */
  url: string | null;
  secret: string;
  /** Delay before the second attempt; each later one waits twice as long. */
  baseDelayMs: number;
  maxAttempts: number;
  timeoutMs: number;
}

/**
 * The `Stripe-Signature` header as Stripe builds it: HMAC-SHA256 of `${t}.${payload}` with the
 * endpoint secret, hex (https://docs.stripe.com/webhooks#verify-manually).
 */
export function signatureHeader(payload: string, secret: string, timestamp = Math.floor(Date.now() / 1000)): string {
  const v1 = createHmac('sha256', secret).update(`${timestamp}.${payload}`, 'utf8').digest('hex');
  return `t=${timestamp},v1=${v1}`;
}

/**
 * Posts each event to the endpoint, signed, and tries again with exponential backoff while the
 * endpoint does not answer 2xx, up to `maxAttempts` (Stripe itself retries for up to three days,
 * https://docs.stripe.com/webhooks#retries). Each attempt is signed afresh and recorded in the store.
 */
export class WebhookDispatcher {
  private readonly timers = new Set<NodeJS.Timeout>();
  private readonly inFlight = new Set<Promise<void>>();
  private waiters: Array<() => void> = [];
  private stopped = false;

  constructor(
    private readonly store: FakeStripeStore,
    readonly options: WebhookOptions,
  ) {}

  deliver(event: StripeEvent): void {
    if (!this.options.url || this.stopped) return;
    event.pending_webhooks = 1;
    this.attempt(event, 1);
  }

  /** Resolves once no attempt is running or waiting for its retry. */
  idle(): Promise<void> {
    if (this.busy === false) return Promise.resolve();
    return new Promise((resolve) => this.waiters.push(resolve));
  }

  stop(): void {
    this.stopped = true;
    for (const t of this.timers) clearTimeout(t);
    this.timers.clear();
    this.settle();
  }

  private get busy(): boolean {
    return this.timers.size > 0 || this.inFlight.size > 0;
  }

  private settle(): void {
    if (this.busy) return;
    const waiters = this.waiters;
    this.waiters = [];
    for (const w of waiters) w();
  }

  private attempt(event: StripeEvent, attempt: number): void {
    const url = this.options.url;
    if (!url || this.stopped) return;
    const run = this.post(url, event).then((result) => {
      this.store.deliveries.push({
        eventId: event.id,
        eventType: event.type,
        attempt,
        at: new Date().toISOString(),
        url,
        status: result.status,
        error: result.error,
        succeeded: result.ok,
      });
      if (result.ok) {
        event.pending_webhooks = 0;
      } else if (attempt < this.options.maxAttempts && !this.stopped) {
        const timer = setTimeout(() => {
          this.timers.delete(timer);
          this.attempt(event, attempt + 1);
        }, this.options.baseDelayMs * 2 ** (attempt - 1));
        this.timers.add(timer);
      }
    });
    this.inFlight.add(run);
    void run.finally(() => {
      this.inFlight.delete(run);
      this.settle();
    });
  }

  private async post(url: string, event: StripeEvent): Promise<{ ok: boolean; status: number | null; error: string | null }> {
    const payload = JSON.stringify(event, null, 2);
    try {
      const res = await fetch(url, {
        method: 'POST',
        headers: {
          'content-type': 'application/json; charset=utf-8',
          'user-agent': 'Stripe/1.0 (+https://stripe.com/docs/webhooks)',
          'stripe-signature': signatureHeader(payload, this.options.secret),
        },
        body: payload,
        signal: AbortSignal.timeout(this.options.timeoutMs),
        redirect: 'manual',
      });
      await res.arrayBuffer().catch(() => undefined);
      return { ok: res.status >= 200 && res.status < 300, status: res.status, error: null };
    } catch (err) {
      return { ok: false, status: null, error: (err as Error).message };
    }
  }
}
