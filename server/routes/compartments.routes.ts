import { idParam } from '../../shared/schemas/common.js';
import { compartment, compartmentPage, compartmentsQuery, createCompartmentBody, updateCompartmentBody } from '../../shared/schemas/compartments.js';
import { vesselParam } from '../../shared/schemas/decks.js';
import type { ApiRouter } from '../http/api-router.js';
import { allowed } from '../http/access.js';
import { actorOf } from '../services/audit.service.js';
import type { CompartmentService } from '../services/compartment.service.js';

export function compartmentRoutes(api: ApiRouter, compartments: CompartmentService) {
  const tag = 'Ship map';

  api.route({
    method: 'get',
    path: '/vessels/:vesselId/compartments',
    tag,
    summary: "A vessel's compartments (paged; filter by deck, access and hazard)",
    access: allowed('compartment', 'read'),
    params: vesselParam,
    query: compartmentsQuery,
    response: compartmentPage,
    errors: [404],
    handler: ({ req, params, query }) => compartments.list(params.vesselId, query, req.user!),
  });

  api.route({
    method: 'post',
    path: '/vessels/:vesselId/compartments',
    tag,
    summary: 'Add a compartment, optionally with its outline on the deck plan',
    access: allowed('compartment', 'create'),
    params: vesselParam,
    body: createCompartmentBody,
    status: 201,
    response: compartment,
    errors: [404, 409, 422],
    handler: ({ req, params, body }) => compartments.create(params.vesselId, body, req.user!, actorOf(req)),
  });

  api.route({
    method: 'get',
    path: '/compartments/:id',
    tag,
    summary: 'One compartment with its floor area, designation in words and entry caution',
    access: allowed('compartment', 'read'),
    params: idParam,
    response: compartment,
    errors: [404],
    handler: ({ req, params }) => compartments.get(params.id, req.user!),
  });

  api.route({
    method: 'patch',
    path: '/compartments/:id',
    tag,
    summary: 'Change a compartment or reshape its outline',
    access: allowed('compartment', 'update'),
    params: idParam,
    body: updateCompartmentBody,
    response: compartment,
    errors: [404, 409, 422],
    handler: ({ req, params, body }) => compartments.update(params.id, body, req.user!, actorOf(req)),
  });

  api.route({
    method: 'delete',
    path: '/compartments/:id',
    tag,
    summary: 'Delete a compartment and its hazard register',
    access: allowed('compartment', 'delete'),
    params: idParam,
    status: 204,
    errors: [404],
    handler: ({ req, params }) => compartments.remove(params.id, actorOf(req)),
  });
}
