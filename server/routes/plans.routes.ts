import { idParam } from '../../shared/schemas/common.js';
import { activatePlanBody, deckPlans, plan, planParams, tileParams } from '../../shared/schemas/plans.js';
import type { ApiRouter } from '../http/api-router.js';
import { allowed } from '../http/access.js';
import { receiveFile } from '../http/receive-file.js';
import { actorOf } from '../services/audit.service.js';
import type { PlanService } from '../services/plan.service.js';

export function planRoutes(api: ApiRouter, plans: PlanService, options: { incomingDir: string; maxBytes: number }) {
  const tag = 'Ship map';
  const receive = receiveFile(options.incomingDir, options.maxBytes, 'a deck plan');

  api.route({
    method: 'get',
    path: '/decks/:id/plan',
    tag,
    summary: "The deck's current plan and its latest upload, with the build's progress (tiles done of tiles to do)",
    access: allowed('deck', 'read'),
    params: idParam,
    response: deckPlans,
    errors: [404],
    handler: ({ params }) => plans.status(params.id),
  });

  api.route({
    method: 'post',
    path: '/decks/:id/plan',
    tag,
    summary: 'Upload a plan (multipart field `file`: PNG, JPEG, WebP or TIFF); answers at once while the tiles are built',
    access: allowed('deck', 'update'),
    params: idParam,
    status: 202,
    response: plan,
    errors: [404, 413, 415],
    before: [receive],
    handler: ({ req, params }) => plans.upload(params.id, req.file, req.user!, actorOf(req)),
  });

  api.route({
    method: 'post',
    path: '/decks/:id/plan/:planId/cancel',
    tag,
    summary: 'Cancel a build, or drop a new plan that waits for a choice of fit; the deck keeps its plan',
    access: allowed('deck', 'update'),
    params: planParams,
    response: deckPlans,
    errors: [404, 422],
    handler: ({ req, params }) => plans.cancel(params.id, params.planId, actorOf(req)),
  });

  api.route({
    method: 'post',
    path: '/decks/:id/plan/:planId/activate',
    tag,
    summary: 'Put in place a new plan whose proportions differ, stretching the compartments or keeping their proportions',
    access: allowed('deck', 'update'),
    params: planParams,
    body: activatePlanBody,
    response: deckPlans,
    errors: [404, 422],
    handler: ({ req, params, body }) => plans.activate(params.id, params.planId, body.fit, actorOf(req)),
  });

  api.route({
    method: 'get',
    path: '/decks/:id/tiles/:version/:z/:y/:x',
    tag,
    summary: 'One 256-pixel tile of a plan; the version holds a content hash, so tiles are cached for a year',
    access: allowed('deck', 'read'),
    params: tileParams,
    produces: 'image/png',
    errors: [404],
    handler: async ({ params, res }) => {
      const file = await plans.tilePath(params.id, params.version, params.z, params.y, params.x);
      res.setHeader('Cache-Control', 'private, max-age=31536000, immutable');
      await new Promise<void>((resolve, reject) => res.sendFile(file, (err) => (err ? reject(err) : resolve())));
    },
  });
}
