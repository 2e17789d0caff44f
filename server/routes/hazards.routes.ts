import { z } from 'zod';
import { idParam } from '../../shared/schemas/common.js';
import { createHazardBody, hazard, hazardParams, updateHazardBody } from '../../shared/schemas/hazards.js';
import type { ApiRouter } from '../http/api-router.js';
import { allowed } from '../http/access.js';
import { actorOf } from '../services/audit.service.js';
import type { HazardService } from '../services/hazard.service.js';

export function hazardRoutes(api: ApiRouter, hazards: HazardService) {
  const tag = 'Hazards';

  api.route({
    method: 'get',
    path: '/compartments/:id/hazards',
    tag,
    summary: "A compartment's hazard register",
    access: allowed('hazard', 'read'),
    params: idParam,
    response: z.array(hazard),
    errors: [404],
    handler: ({ req, params }) => hazards.list(params.id, req.user!),
  });

  api.route({
    method: 'post',
    path: '/compartments/:id/hazards',
    tag,
    summary: 'Record a hazard (the date of the last check is signed by you)',
    access: allowed('hazard', 'create'),
    params: idParam,
    body: createHazardBody,
    status: 201,
    response: hazard,
    errors: [404],
    handler: ({ req, params, body }) => hazards.create(params.id, body, req.user!, actorOf(req)),
  });

  api.route({
    method: 'patch',
    path: '/compartments/:id/hazards/:hazardId',
    tag,
    summary: 'Change a hazard or record a new check',
    access: allowed('hazard', 'update'),
    params: hazardParams,
    body: updateHazardBody,
    response: hazard,
    errors: [404, 409],
    handler: ({ req, params, body }) => hazards.update(params.id, params.hazardId, body, req.user!, actorOf(req)),
  });

  api.route({
    method: 'delete',
    path: '/compartments/:id/hazards/:hazardId',
    tag,
    summary: 'Remove a hazard from the register',
    access: allowed('hazard', 'delete'),
    params: hazardParams,
    status: 204,
    errors: [404],
    handler: ({ req, params }) => hazards.remove(params.id, params.hazardId, actorOf(req)),
  });
}
