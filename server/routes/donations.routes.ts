import { z } from 'zod';
import { appeal, saveAppealBody } from '../../shared/schemas/appeals.js';
import { idParam } from '../../shared/schemas/common.js';
import { vesselParam } from '../../shared/schemas/decks.js';
import { donation, donationPage, donationsExportQuery, donationsQuery, givingTotals, refundBody } from '../../shared/schemas/donations.js';
import type { ApiRouter } from '../http/api-router.js';
import { allowed } from '../http/access.js';
import type { AppealService } from '../services/appeal.service.js';
import { actorOf } from '../services/audit.service.js';
import type { DonationService } from '../services/donation.service.js';

/** The fundraiser's workspace: gifts, totals, refunds, the export, and each project's appeal. */
export function donationRoutes(api: ApiRouter, donations: DonationService, appeals: AppealService) {
  const tag = 'Giving';

  api.route({
    method: 'get',
    path: '/donations',
    tag,
    summary: "A vessel's gifts, newest first; search donors and dedications, filter by status, project and dates. Donors' e-mail addresses only for fundraisers and administrators",
    access: allowed('donation', 'read'),
    query: donationsQuery,
    response: donationPage,
    handler: ({ req, query }) => donations.page(query, req.user!),
  });

  api.route({
    method: 'get',
    path: '/donations/export',
    tag,
    summary: 'The gifts the filters select, as CSV; each export is written to the audit trail',
    access: allowed('donation', 'export'),
    query: donationsExportQuery,
    produces: 'text/csv',
    handler: async ({ req, query, res }) => {
      const stamp = new Date().toISOString().slice(0, 10);
      res.status(200).setHeader('Content-Type', 'text/csv; charset=utf-8');
      res.setHeader('Content-Disposition', `attachment; filename="gifts-vessel-${query.vesselId}-${stamp}.csv"`);
      await donations.export(query, req.user!, actorOf(req), (chunk) => res.write(chunk));
      res.end();
    },
  });

  api.route({
    method: 'post',
    path: '/donations/:id/refund',
    tag,
    summary: 'Refunds a received gift through Stripe, wholly or in part, with a reason; the totals fall and the donor gets a corrected acknowledgment',
    access: allowed('donation', 'refund'),
    params: idParam,
    body: refundBody,
    response: donation,
    errors: [404, 409, 422, 503],
    handler: ({ req, params, body }) => donations.refund(params.id, body, req.user!, actorOf(req)),
  });

  api.route({
    method: 'get',
    path: '/vessels/:vesselId/giving/totals',
    tag,
    summary: "Totals by project and by month from the kept ledger",
    access: allowed('donation', 'read'),
    params: vesselParam,
    response: givingTotals,
    handler: ({ params }) => donations.totals(params.vesselId),
  });

  api.route({
    method: 'get',
    path: '/vessels/:vesselId/appeals',
    tag,
    summary: "The vessel's repair projects (but cancelled ones) with their appeal and its kept totals, or an empty draft",
    access: allowed('appeal', 'read'),
    params: vesselParam,
    response: z.array(appeal),
    handler: ({ req, params }) => appeals.ofVessel(params.vesselId, req.user!),
  });

  api.route({
    method: 'get',
    path: '/repair-projects/:id/appeal',
    tag,
    summary: "A repair project's appeal (an empty draft with version 0 when none is written yet)",
    access: allowed('appeal', 'read'),
    params: idParam,
    response: appeal,
    errors: [404],
    handler: ({ req, params }) => appeals.get(params.id, req.user!),
  });

  api.route({
    method: 'put',
    path: '/repair-projects/:id/appeal',
    tag,
    summary: "Writes a repair project's appeal: story (rich text), goal, photos (alt text required to publish), published or not",
    access: allowed('appeal', 'update'),
    params: idParam,
    body: saveAppealBody,
    response: appeal,
    errors: [404, 409, 422],
    handler: ({ req, params, body }) => appeals.save(params.id, body, req.user!, actorOf(req)),
  });
}
