import { randomUUID } from 'node:crypto';
import Stripe from 'stripe';
import { formatCents } from '../../shared/calc/money.js';
import { netCents } from '../../shared/calc/giving-ledger.js';
import { excerpt } from '../../shared/richtext/excerpt.js';
import type { CheckoutBody } from '../../shared/schemas/donations.js';
import type { PublicAppeal, PublicAppealSummary, PublicGiftStatus } from '../../shared/schemas/visit.js';
import type { AppealEntity } from '../db/entities/appeal.entity.js';
import type { MediaEntity } from '../db/entities/media.entity.js';
import type { AppealWithProject } from '../db/repositories/appeal.repository.js';
import type { Store } from '../db/store.js';
import { NotFoundError, ServiceUnavailableError, UnprocessableError } from '../http/errors.js';
import type { StripeClient } from '../payments/stripe-client.js';
import type { StripeWebhookService } from './stripe-webhook.service.js';

const RECENT_GIFTS = 8;
export const GIVING_UNAVAILABLE = 'Giving is unavailable for now: our payment provider cannot be reached. Nothing was charged or recorded; please try again later.';

/** The first word of a name, the most a public list shows of a donor. */
export function firstName(name: string): string {
  return name.trim().split(/\s+/)[0] ?? '';
}

export const publicPhotoUrl = (slug: string, mediaId: number) => `/api/v1/visit/appeals/${encodeURIComponent(slug)}/photos/${mediaId}`;

/** The public side of giving: published appeals, the checkout session, and what the thank-you page may know. */
export class CheckoutService {
  constructor(
    private readonly store: Store,
    private readonly stripe: StripeClient,
    private readonly webhooks: StripeWebhookService,
    private readonly publicUrl: string,
  ) {}

  /**
   * The appeal's photos that may still be shown: a photo withdrawn from public use (or whose alt
   * text was emptied, or that was deleted) after the appeal was published leaves the public page.
   */
  private async shownPhotos(appeal: AppealEntity) {
    if (!appeal.photos.length) return [];
    const media = await this.store.repos.media.findByIds(appeal.photos.map((p) => p.mediaId));
    const allowed = new Set(media.filter((m) => isPublicPhoto(m, appeal.vesselId)).map((m) => m.id));
    return appeal.photos.filter((p) => allowed.has(p.mediaId));
  }

  private async summary({ appeal, project }: AppealWithProject, currency: string, photos?: AppealEntity['photos']): Promise<PublicAppealSummary> {
    const vessel = await this.store.repos.vessels.findById(appeal.vesselId);
    const cover = (photos ?? (await this.shownPhotos(appeal)))[0];
    return {
      slug: project.slug,
      title: project.title,
      vesselName: vessel?.name ?? '',
      summary: excerpt(appeal.storyText, 240),
      coverPhoto: cover ? { url: publicPhotoUrl(project.slug, cover.mediaId), altText: cover.altText } : null,
      currency,
      goalCents: appeal.goalCents,
      raisedCents: netCents(appeal),
      giftCount: appeal.giftCount,
    };
  }

  async list(): Promise<{ items: PublicAppealSummary[] }> {
    const settings = await this.store.repos.settings.get();
    const rows = await this.store.repos.appeals.publicList();
    return { items: await Promise.all(rows.map((row) => this.summary(row, settings.currency))) };
  }

  private async published(slug: string): Promise<AppealWithProject> {
    const found = await this.store.repos.appeals.publicBySlug(slug);
    if (!found) throw new NotFoundError('The appeal');
    return found;
  }

  async get(slug: string): Promise<PublicAppeal> {
    const found = await this.published(slug);
    const settings = await this.store.repos.settings.get();
    const photos = await this.shownPhotos(found.appeal);
    const recent = await this.store.repos.donations.recentReceived(found.appeal.id, RECENT_GIFTS);
    const { minimumCents, maximumCents, presetCents } = settings.giving;
    return {
      ...(await this.summary(found, settings.currency, photos)),
      storyHtml: found.appeal.storyHtml,
      photos: photos.map((p) => ({ url: publicPhotoUrl(slug, p.mediaId), altText: p.altText, caption: p.caption })),
      recentGifts: recent.map((d) => ({ name: d.showFirstName && !d.anonymous ? firstName(d.donorName) : 'Anonymous', at: (d.succeededAt ?? d.createdAt).toISOString() })),
      giving: { minimumCents, maximumCents, presetCents },
    };
  }

  /** The file of a photo shown on a published appeal (its display derivative, without metadata). */
  async photo(slug: string, mediaId: number) {
    const found = await this.published(slug);
    if (!found.appeal.photos.some((p) => p.mediaId === mediaId)) throw new NotFoundError('The photo');
    const media = await this.store.repos.media.findById(mediaId);
    if (!media || !isPublicPhoto(media, found.appeal.vesselId)) throw new NotFoundError('The photo');
    return media;
  }

  /** Checks the amount against the settings (422) before anything is asked of Stripe. */
  private amountOf(value: unknown, giving: { minimumCents: number; maximumCents: number }, currency: string): number {
    const field = (message: string) => new UnprocessableError(message, { amountCents: message });
    if (typeof value !== 'number' || !Number.isFinite(value)) throw field('Give the amount as a number of cents.');
    if (!Number.isInteger(value)) throw field('Give the amount in whole cents.');
    if (value < giving.minimumCents) throw field(`The smallest gift we can take is ${formatCents(giving.minimumCents, currency)}.`);
    if (value > giving.maximumCents) throw field(`The largest gift we can take online is ${formatCents(giving.maximumCents, currency)}. Please write to us for a larger gift.`);
    return value;
  }

  async checkout(slug: string, body: CheckoutBody & { amountCents: unknown; anonymous: boolean; dedication: { kind: 'honour' | 'memory'; name: string } | null }): Promise<{ url: string }> {
    const { appeal, project } = await this.published(slug);
    const settings = await this.store.repos.settings.get();
    const currency = settings.currency.toUpperCase();
    const amountCents = this.amountOf(body.amountCents, settings.giving, currency);
    const reference = randomUUID();
    const base = `${this.publicUrl}/visit/appeals/${encodeURIComponent(slug)}`;
    let session: Stripe.Checkout.Session;
    try {
      session = await this.stripe.stripe.checkout.sessions.create({
        mode: 'payment',
        line_items: [{ quantity: 1, price_data: { currency: currency.toLowerCase(), unit_amount: amountCents, product_data: { name: `Gift towards ${project.title}`.slice(0, 200) } } }],
        customer_email: body.email,
        client_reference_id: reference,
        metadata: { donation_reference: reference, appeal_id: String(appeal.id) },
        payment_intent_data: { metadata: { donation_reference: reference, appeal_id: String(appeal.id) } },
        submit_type: 'donate',
        success_url: `${base}/thanks?session_id={CHECKOUT_SESSION_ID}`,
        cancel_url: `${base}/cancelled`,
      }, { idempotencyKey: `checkout-${reference}` });
    } catch (err) {
      if (err instanceof Stripe.errors.StripeError) {
        console.error(`Checkout session for ${slug} failed: ${err.type} ${err.message}`);
        throw new ServiceUnavailableError(GIVING_UNAVAILABLE);
      }
      throw err;
    }
    try {
      await this.store.transaction((repos) => this.record(repos, appeal, session, { ...body, amountCents, reference, currency }));
    } catch (err) {
      // the session must not stay payable when we hold no record of it
      await this.stripe.stripe.checkout.sessions.expire(session.id).catch(() => undefined);
      throw err;
    }
    return { url: session.url! };
  }

  private record(repos: Parameters<Parameters<Store['transaction']>[0]>[0], appeal: AppealEntity, session: Stripe.Checkout.Session, gift: { amountCents: number; reference: string; currency: string; name: string; email: string; anonymous: boolean; dedication: { kind: 'honour' | 'memory'; name: string } | null }) {
    return repos.donations.create({
      vesselId: appeal.vesselId,
      appealId: appeal.id,
      reference: gift.reference,
      checkoutSessionId: session.id,
      paymentIntentId: null,
      amountCents: gift.amountCents,
      currency: gift.currency,
      status: 'pending',
      refundedCents: 0,
      donorName: gift.name,
      donorEmail: gift.email,
      anonymous: gift.anonymous,
      showFirstName: !gift.anonymous,
      dedicationKind: gift.dedication?.kind ?? null,
      dedicationName: gift.dedication?.name ?? '',
      failureMessage: '',
      succeededAt: null,
    });
  }

  /**
   * The state of a gift for its thank-you page. A gift still pending is confirmed with Stripe first
   * (a webhook may be late), through the same ledger path, so the page and the ledger agree.
   */
  async giftStatus(sessionId: string): Promise<PublicGiftStatus> {
    let donation = await this.store.repos.donations.findBySession(sessionId);
    if (!donation) throw new NotFoundError('The gift');
    if (donation.status === 'pending' || donation.status === 'failed') {
      donation = (await this.webhooks.reconcile(donation.id).catch(() => null)) ?? donation;
    }
    const found = await this.store.repos.appeals.withProject(donation.appealId);
    const status = ({ pending: 'pending', succeeded: 'received', partially_refunded: 'received', failed: 'failed', expired: 'expired', refunded: 'refunded' } as const)[donation.status];
    return { status, amountCents: donation.amountCents, currency: donation.currency, projectTitle: found?.project.title ?? '', slug: found?.project.slug ?? '', failureMessage: donation.failureMessage };
  }
}

function isPublicPhoto(media: MediaEntity, vesselId: number): boolean {
  return media.kind === 'photo' && media.vesselId === vesselId && media.publicUse && media.altText.trim().length > 0;
}
