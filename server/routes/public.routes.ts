import { z } from 'zod';
import { healthResponse } from '../../shared/schemas/health.js';
import { publicTour, publicTourList, slugParam } from '../../shared/schemas/tours.js';
import { visitSite } from '../../shared/schemas/visit.js';
import type { ApiRouter } from '../http/api-router.js';
import { anyone } from '../http/access.js';
import type { ClosureService } from '../services/closure.service.js';
import type { HealthService } from '../services/health.service.js';
import type { SettingsService } from '../services/settings.service.js';
import type { TourPublicService } from '../services/tour-public.service.js';
import type { VesselService } from '../services/vessel.service.js';

export function publicRoutes(api: ApiRouter, deps: { health: HealthService; vessels: VesselService; settings: SettingsService; closures: ClosureService; tours: TourPublicService; openApi: () => object }) {
  api.route({
    method: 'get',
    path: '/health',
    tag: 'Service',
    summary: "Whether the service is up; administrators also see the version, the database's state and the local fakes",
    access: anyone,
    response: healthResponse,
    handler: async ({ req, res }) => {
      const health = await deps.health.check();
      if (health.status !== 'ok') res.status(503);
      return req.user?.role === 'admin' ? health : { status: health.status };
    },
  });

  api.route({
    method: 'get',
    path: '/openapi.json',
    tag: 'Service',
    summary: 'This document',
    access: anyone,
    response: z.object({}).passthrough(),
    handler: () => deps.openApi(),
  });

  api.route({
    method: 'get',
    path: '/visit/site',
    tag: 'Visit',
    summary: 'What the public site shows: the organisation, the vessels it keeps, and the spaces closed today with the public line why',
    access: anyone,
    response: visitSite,
    handler: async () => {
      const vessels = await deps.vessels.listPublic();
      const withClosures = await Promise.all(vessels.map(async (v) => ({ ...v, closures: await deps.closures.publicFor(v.id) })));
      return { organisationName: (await deps.settings.get()).organisationName, vessels: withClosures };
    },
  });

  api.route({
    method: 'get',
    path: '/visit/tours',
    tag: 'Visit',
    summary: 'The published tours, as a curator approved them',
    access: anyone,
    response: publicTourList,
    handler: () => deps.tours.list(),
  });

  api.route({
    method: 'get',
    path: '/visit/tours/:slug',
    tag: 'Visit',
    summary: 'A published tour and its stops (HTML sanitized at save); a stop whose space is closed today is shown as virtual, with a notice',
    access: anyone,
    params: slugParam,
    response: publicTour,
    errors: [404],
    handler: async ({ params, res }) => {
      // Serialized once per publication and closure state (TourPublicService).
      res.type('application/json').send(await deps.tours.get(params.slug));
    },
  });

  api.route({
    method: 'get',
    path: '/visit/tours/:slug/media/:mediaId/:variant',
    tag: 'Visit',
    summary: 'A photo (WebP `thumb` or `display`) or the `audio` of a published tour; only the files the tour shows',
    access: anyone,
    params: slugParam.extend({ mediaId: z.coerce.number().int().positive(), variant: z.enum(['thumb', 'display', 'audio']) }),
    produces: 'image/webp',
    errors: [404],
    handler: async ({ params, res }) => {
      const file = await deps.tours.file(params.slug, params.mediaId, params.variant);
      res.setHeader('Cache-Control', 'public, max-age=3600');
      res.setHeader('Content-Type', file.type);
      await new Promise<void>((resolve, reject) => res.sendFile(file.path, (err) => (err ? reject(err) : resolve())));
    },
  });
}
