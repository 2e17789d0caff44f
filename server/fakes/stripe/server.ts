import { createServer, type IncomingMessage, type Server, type ServerResponse } from 'node:http';
import type { AddressInfo } from 'node:net';
import qs from 'qs';
import { handleCheckoutPage } from './checkout-page.js';
import { createSession, expireIfDue, expireSession, findSession, lineItemList, presentSession } from './checkout-sessions.js';
import { StripeApiError, invalidParam, noSuch } from './errors.js';
import { listEvents, retrieveEvent, type EventSource } from './events.js';
import { authenticate, readBody, sendHtml, sendJson } from './http.js';
import { FAKE_STRIPE_API_VERSION, FAKE_STRIPE_SECRET_KEY, FAKE_STRIPE_WEBHOOK_SECRET } from './keys.js';
import type { Params } from './params.js';
import { createRefund, retrieveRefund } from './refunds.js';
import { FakeStripeStore, newId } from './store.js';
import { WebhookDispatcher } from './webhooks.js';

export const DEFAULT_STRIPE_FAKE_PORT = 12111;

export interface FakeStripeOptions {
  secretKey?: string;
  webhookUrl?: string | null;
  webhookSecret?: string;
  /** First retry delay; each later retry waits twice as long (Stripe itself backs off over days). */
  retryBaseDelayMs?: number;
  maxDeliveryAttempts?: number;
  deliveryTimeoutMs?: number;
  /** How often open sessions past `expires_at` are expired. */
  sweepIntervalMs?: number;
}

interface Ctx extends EventSource {
  method: string;
  path: string;
  params: Record<string, string>;
  body: Params;
}

type Handler = (ctx: Ctx) => unknown;

/**
 * A local stand-in for the parts of the Stripe API Shipkeeper uses, in Stripe's wire format:
 * form-encoded requests with Bearer (or Basic) secret-key auth, Stripe's JSON objects and error
 * shapes, a hosted checkout page, and signed webhook delivery with retries.
 */
export class FakeStripeServer {
  readonly store = new FakeStripeStore();
  readonly webhooks: WebhookDispatcher;
  private server: Server | null = null;
  private sweeper: NodeJS.Timeout | null = null;
  private readonly secretKey: string;
  private readonly sweepIntervalMs: number;
  private readonly routes: Array<{ method: string; pattern: RegExp; keys: string[]; handler: Handler }> = [];
  port: number | null = null;

  constructor(options: FakeStripeOptions = {}) {
    this.secretKey = options.secretKey ?? FAKE_STRIPE_SECRET_KEY;
    this.sweepIntervalMs = options.sweepIntervalMs ?? 5000;
    this.webhooks = new WebhookDispatcher(this.store, {
      url: options.webhookUrl ?? null,
      secret: options.webhookSecret ?? FAKE_STRIPE_WEBHOOK_SECRET,
      baseDelayMs: options.retryBaseDelayMs ?? 2000,
      maxAttempts: options.maxDeliveryAttempts ?? 8,
      timeoutMs: options.deliveryTimeoutMs ?? 10_000,
    });
    this.defineRoutes();
  }

  get baseUrl(): string {
    if (this.port === null) throw new Error('The Stripe fake is not running.');
    return `http://127.0.0.1:${this.port}`;
  }

  get running(): boolean {
    return this.server !== null;
  }

  /** The endpoint events are posted to (settable once our own server knows its port). */
  setWebhookUrl(url: string | null): void {
    this.webhooks.options.url = url;
  }

  /** Listens on 127.0.0.1:`port`; if that port is taken, on any free one. */
  async start(port = DEFAULT_STRIPE_FAKE_PORT): Promise<number> {
    const server = createServer((req, res) => {
      this.handle(req, res).catch((err: Error) => {
        if (res.headersSent) return void res.destroy();
        const status = err instanceof URIError ? 400 : 500;
        sendJson(res, status, { error: { type: status === 400 ? 'invalid_request_error' : 'api_error', message: status === 400 ? 'Malformed request URL.' : `The local Stripe fake failed: ${err.message}` } });
      });
    });
    const listen = (p: number) => new Promise<void>((resolve, reject) => {
      server.once('error', reject);
      server.listen(p, '127.0.0.1', () => {
        server.off('error', reject);
        resolve();
      });
    });
    try {
      await listen(port);
    } catch (err) {
      if ((err as NodeJS.ErrnoException).code !== 'EADDRINUSE' || port === 0) throw err;
      await listen(0);
    }
    this.server = server;
    this.port = (server.address() as AddressInfo).port;
    this.sweeper = setInterval(() => this.sweep(), this.sweepIntervalMs);
    this.sweeper.unref();
    return this.port;
  }

  async stop(): Promise<void> {
    this.webhooks.stop();
    if (this.sweeper) clearInterval(this.sweeper);
    this.sweeper = null;
    const server = this.server;
    if (!server) return;
    this.server = null;
    this.port = null;
    await new Promise<void>((resolve) => {
      server.close(() => resolve());
      server.closeAllConnections();
    });
  }

  private sweep(): void {
    const source = { requestId: null, idempotencyKey: null, apiVersion: FAKE_STRIPE_API_VERSION };
    for (const session of this.store.sessions.values()) this.emitting(() => expireIfDue(this.store, source, session));
  }

  /** Runs a change and hands every event it recorded to the webhook dispatcher. */
  private emitting<T>(change: () => T): T {
    const before = this.store.events.length;
    try {
      return change();
    } finally {
      for (const event of this.store.events.slice(before)) this.webhooks.deliver(event);
    }
  }

  private route(method: string, path: string, handler: Handler): void {
    const keys: string[] = [];
    const pattern = new RegExp(`^${path.replace(/:(\w+)/g, (_m, k: string) => {
      keys.push(k);
      return '([^/]+)';
    })}$`);
    this.routes.push({ method, pattern, keys, handler });
  }

  private defineRoutes(): void {
    const s = this.store;
    const pageUrl = (id: string) => `${this.baseUrl}/pay/${id}`;
    this.route('POST', '/v1/checkout/sessions', (c) => createSession(s, c.body, pageUrl));
    this.route('GET', '/v1/checkout/sessions/:id', (c) => {
      const session = findSession(s, c.params.id!);
      expireIfDue(s, c, session);
      return presentSession(s, session, c.body);
    });
    this.route('GET', '/v1/checkout/sessions/:id/line_items', (c) => lineItemList(s, findSession(s, c.params.id!)));
    this.route('POST', '/v1/checkout/sessions/:id/expire', (c) => presentSession(s, expireSession(s, c, findSession(s, c.params.id!)), c.body));
    this.route('GET', '/v1/events', (c) => listEvents(s, c.body));
    this.route('GET', '/v1/events/:id', (c) => retrieveEvent(s, c.params.id!));
    this.route('POST', '/v1/refunds', (c) => createRefund(s, c, c.body));
    this.route('GET', '/v1/refunds/:id', (c) => retrieveRefund(s, c.params.id!));
    this.route('GET', '/v1/payment_intents/:id', (c) => s.paymentIntents.get(c.params.id!) ?? (() => { throw noSuch('payment_intent', c.params.id!); })());
    this.route('GET', '/v1/charges/:id', (c) => s.charges.get(c.params.id!) ?? (() => { throw noSuch('charge', c.params.id!); })());
    this.route('POST', '/_control/events/:id/redeliver', (c) => {
      const event = retrieveEvent(s, c.params.id!);
      if (!this.webhooks.options.url) throw invalidParam('No webhook endpoint is configured on this fake.', 'id');
      this.webhooks.deliver(event);
      return { object: 'redelivery', event: event.id, url: this.webhooks.options.url };
    });
    this.route('GET', '/_control/deliveries', (c) => {
      const eventId = typeof c.body.event === 'string' ? c.body.event : null;
      const data = s.deliveries.filter((d) => !eventId || d.eventId === eventId);
      return { object: 'list', data, has_more: false, url: '/_control/deliveries' };
    });
  }

  private async handle(req: IncomingMessage, res: ServerResponse): Promise<void> {
    const url = new URL(req.url ?? '/', 'http://127.0.0.1');
    const requestId = newId('req');
    const apiVersion = String(req.headers['stripe-version'] ?? FAKE_STRIPE_API_VERSION);
    const idempotencyKey = typeof req.headers['idempotency-key'] === 'string' ? req.headers['idempotency-key'] : null;
    const method = req.method ?? 'GET';
    res.setHeader('request-id', requestId);
    let raw: string;
    try {
      raw = await readBody(req);
    } catch (err) {
      return sendJson(res, 413, new StripeApiError(413, 'invalid_request_error', (err as Error).message).toJSON());
    }
    const source: EventSource = { requestId, idempotencyKey, apiVersion };

    const page = /^\/pay\/([^/]+)(\/authenticate)?$/.exec(url.pathname);
    if (page) {
      const form = method === 'POST' ? qs.parse(raw, { depth: 0 }) : {};
      const answer = this.emitting(() =>
        handleCheckoutPage(this.store, { ...source, requestId: null }, method, decodeURIComponent(page[1]!), page[2] ? 'authenticate' : 'pay', form));
      if (!answer) return sendHtml(res, 404, '<!doctype html><title>Not found</title><p>No such checkout session.</p>');
      if ('redirect' in answer) {
        res.writeHead(303, { location: answer.redirect, 'cache-control': 'no-store' });
        return void res.end();
      }
      return sendHtml(res, answer.status, answer.html);
    }

    const auth = authenticate(req, this.secretKey);
    if (auth) return sendJson(res, 401, auth);

    const found = this.match(method, url.pathname);
    if (!found) {
      return sendJson(res, 404, new StripeApiError(404, 'invalid_request_error',
        `Unrecognized request URL (${method}: ${url.pathname}).`).toJSON());
    }
    const memoKey = method === 'POST' && idempotencyKey ? `${url.pathname}\n${idempotencyKey}` : null;
    const memo = memoKey ? this.store.idempotent.get(memoKey) : undefined;
    if (memo) {
      if (memo.request !== raw) {
        return sendJson(res, 400, new StripeApiError(400, 'idempotency_error',
          `Keys for idempotent requests can only be used with the same parameters they were first used with. Try using a key other than '${idempotencyKey}' if you meant to execute a different request.`).toJSON());
      }
      res.setHeader('idempotent-replayed', 'true');
      return sendJson(res, memo.status, memo.body);
    }
    let status = 200;
    let body: unknown;
    try {
      const params = qs.parse(method === 'GET' ? url.search.slice(1) : raw, { depth: 10, arrayLimit: 100, parameterLimit: 2000 }) as Params;
      body = this.emitting(() => found.handler({ ...source, method, path: url.pathname, params: found.params, body: params }));
    } catch (err) {
      if (!(err instanceof StripeApiError)) {
        status = 500;
        body = { error: { type: 'api_error', message: `The local Stripe fake failed: ${(err as Error).message}` } };
      } else {
        status = err.status;
        body = err.toJSON();
      }
    }
    if (memoKey && status !== 500) this.store.idempotent.set(memoKey, { status, body, request: raw });
    sendJson(res, status, body);
  }

  private match(method: string, path: string) {
    for (const r of this.routes) {
      const m = r.method === method ? r.pattern.exec(path) : null;
      if (m) return { handler: r.handler, params: Object.fromEntries(r.keys.map((k, i) => [k, decodeURIComponent(m[i + 1]!)])) };
    }
    return null;
  }

}
