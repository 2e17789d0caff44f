import type { DataSource } from 'typeorm';
import { RepairProjectEntity } from '../entities/repair-project.entity.js';
import { applyStripeTruth } from '../../services/giving-ledger.js';
import { renderRichText } from '../../richtext/render.js';
import { Store } from '../store.js';
import { DEMO_AMOUNTS, DEMO_APPEALS, DEMO_DONOR_FIRST, DEMO_DONOR_LAST } from './demo-giving.js';

const DAY = 86_400_000;

/**
 * Appeals on the demo's fundraising repair projects and a few dozen invented gifts, recorded
 * through the same ledger path as Stripe's events (so the kept totals agree with the gifts).
 * Runs after the repair projects' demo; when that has made no fundraising project, the two the
 * appeals need are made here (by slug, so a later projects demo finds them).
 */
export async function seedDemoGiving(dataSource: DataSource): Promise<void> {
  const store = new Store(dataSource);
  const [vessel] = await store.repos.vessels.listActive();
  if (!vessel) return;
  const projects = dataSource.getRepository(RepairProjectEntity);
  const settings = await store.repos.settings.get();
  settings.giving = { ...settings.giving, legalName: settings.organisationName, taxId: '00-0000000' };
  await store.repos.settings.save(settings);

  let seq = 0;
  for (const demo of DEMO_APPEALS) {
    let project = (await projects.findOneBy({ vesselId: vessel.id, slug: demo.slug })) ?? (await projects.findOneBy({ vesselId: vessel.id, title: demo.title }));
    project ??= await projects.save(projects.create({
      vesselId: vessel.id, title: demo.title, slug: demo.slug, status: 'fundraising', estimateCents: demo.goalCents,
      scope: { type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'text', text: demo.story[1]! }] }] },
      scopeHtml: `<p>${demo.story[1]}</p>`, scopeText: demo.story[1]!,
    }));
    if (project.status !== 'fundraising' || (await store.repos.appeals.findByProject(project.id))) continue;
    const storyDoc = { type: 'doc' as const, content: demo.story.map((text) => ({ type: 'paragraph', content: [{ type: 'text', text }] })) };
    const rendered = renderRichText(storyDoc, 'storyDoc');
    const now = Date.now();
    await store.transaction(async (repos) => {
      const appeal = await repos.appeals.create({
        vesselId: vessel.id, repairProjectId: project.id, storyDoc, storyHtml: rendered.html, storyText: rendered.text,
        goalCents: project.estimateCents || demo.goalCents, photos: [], publishedAt: new Date(now - 120 * DAY),
      });
      for (let i = 0; i < demo.gifts; i++) {
        seq += 1;
        const first = DEMO_DONOR_FIRST[(seq * 7) % DEMO_DONOR_FIRST.length]!;
        const last = DEMO_DONOR_LAST[(seq * 3) % DEMO_DONOR_LAST.length]!;
        const amountCents = DEMO_AMOUNTS[(seq * 5) % DEMO_AMOUNTS.length]!;
        const at = new Date(now - (110 - Math.floor((i * 108) / demo.gifts)) * DAY - (seq % 9) * 3_600_000);
        const anonymous = seq % 4 === 0;
        const donation = await repos.donations.create({
          vesselId: vessel.id, appealId: appeal.id, reference: `demo-${String(seq).padStart(4, '0')}`, checkoutSessionId: `cs_demo_${String(seq).padStart(4, '0')}`,
          paymentIntentId: null, amountCents, currency: settings.currency, status: 'pending', refundedCents: 0,
          donorName: `${first} ${last}`, donorEmail: `${first.toLowerCase()}.${last.toLowerCase().replace(/[^a-z]/g, '')}@example.test`,
          anonymous, showFirstName: !anonymous, dedicationKind: seq % 6 === 0 ? 'memory' : seq % 9 === 0 ? 'honour' : null,
          dedicationName: seq % 6 === 0 ? 'Able Seaman J. Corrick' : seq % 9 === 0 ? 'the volunteer engine crew' : '', failureMessage: '', succeededAt: null, createdAt: at,
        });
        const refunded = seq % 13 === 0 ? amountCents : 0;
        const status = refunded ? 'refunded' as const : 'succeeded' as const;
        await applyStripeTruth(repos, donation, { status, amountCents, currency: settings.currency, paymentIntentId: `pi_demo_${String(seq).padStart(4, '0')}`, refundedCents: refunded, failureMessage: '' }, at);
      }
    });
  }
}
