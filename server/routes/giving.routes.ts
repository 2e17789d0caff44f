import { z } from 'zod';
import { checkoutAnswer, checkoutBody } from '../../shared/schemas/donations.js';
import { publicAppeal, publicAppealList, publicGiftStatus } from '../../shared/schemas/visit.js';
import type { ApiRouter } from '../http/api-router.js';
import { anyone } from '../http/access.js';
import type { FileStore } from '../storage/file-store.js';
import { derivativeFile } from '../services/media-derivatives.js';
import type { CheckoutService } from '../services/checkout.service.js';
import type { StripeWebhookService } from '../services/stripe-webhook.service.js';

const slugParam = z.object({ slug: z.string().min(1).max(200) });

/** The visitor's side of giving, and Stripe's webhook. */
export function givingPublicRoutes(api: ApiRouter, deps: { checkout: CheckoutService; webhooks: StripeWebhookService; files: FileStore }) {
  const tag = 'Visit';

  api.route({
    method: 'get',
    path: '/visit/appeals',
    tag,
    summary: 'Published appeals of repair projects that are fundraising, with their goal and what has been raised',
    access: anyone,
    response: publicAppealList,
    handler: () => deps.checkout.list(),
  });

  api.route({
    method: 'get',
    path: '/visit/appeals/:slug',
    tag,
    summary: 'One published appeal: story, photos with alt text, goal, raised, number of gifts, recent gifts by first name (with consent) or "Anonymous", and the gift bounds',
    access: anyone,
    params: slugParam,
    response: publicAppeal,
    errors: [404],
    handler: ({ params }) => deps.checkout.get(params.slug),
  });

  api.route({
    method: 'get',
    path: '/visit/appeals/:slug/photos/:mediaId',
    tag,
    summary: "A photo of a published appeal, as WebP without metadata",
    access: anyone,
    params: slugParam.extend({ mediaId: z.coerce.number().int().positive() }),
    produces: 'image/webp',
    errors: [404],
    handler: async ({ params, res }) => {
      const media = await deps.checkout.photo(params.slug, params.mediaId);
      res.setHeader('Cache-Control', 'public, max-age=3600');
      res.setHeader('Content-Type', 'image/webp');
      await new Promise<void>((resolve, reject) => res.sendFile(derivativeFile(deps.files.path(media.storageKey), 'display'), (err) => (err ? reject(err) : resolve())));
    },
  });

  api.route({
    method: 'post',
    path: '/visit/appeals/:slug/checkout',
    tag,
    summary: "Starts a gift: checks the amount against the organisation's bounds (422 before anything else), makes a Stripe Checkout session and answers its page; 503 when Stripe cannot be reached (nothing recorded)",
    access: anyone,
    params: slugParam,
    body: checkoutBody,
    response: checkoutAnswer,
    status: 201,
    errors: [404, 422, 503],
    handler: ({ params, body }) => deps.checkout.checkout(params.slug, body),
  });

  api.route({
    method: 'get',
    path: '/visit/gifts/:sessionId',
    tag,
    summary: 'What the thank-you page may say about a gift, by its checkout session (confirmed with Stripe while pending)',
    access: anyone,
    params: z.object({ sessionId: z.string().min(1).max(255) }),
    response: publicGiftStatus,
    errors: [404],
    handler: ({ params }) => deps.checkout.giftStatus(params.sessionId),
  });

  api.route({
    method: 'post',
    path: '/webhooks/stripe',
    tag: 'Giving',
    summary: 'Stripe events, signed (Stripe-Signature checked on the raw body; 400 and nothing recorded when it does not match); each processed once',
    access: anyone,
    response: z.object({ received: z.literal(true), duplicate: z.boolean() }),
    errors: [400, 503],
    handler: ({ req }) => {
      const signature = req.headers['stripe-signature'];
      const event = deps.webhooks.verify(req.body, Array.isArray(signature) ? signature[0] : signature);
      return deps.webhooks.handle(event);
    },
  });
}
