import { idParam } from '../../shared/schemas/common.js';
import { createVesselBody, updateVesselBody, vessel, vesselPage, vesselsQuery } from '../../shared/schemas/vessels.js';
import type { ApiRouter } from '../http/api-router.js';
import { allowed } from '../http/access.js';
import { actorOf } from '../services/audit.service.js';
import type { VesselService } from '../services/vessel.service.js';

export function vesselRoutes(api: ApiRouter, vessels: VesselService) {
  const tag = 'Vessels';

  api.route({
    method: 'get',
    path: '/vessels',
    tag,
    summary: 'List the vessels the organisation keeps',
    access: allowed('vessel', 'read'),
    query: vesselsQuery,
    response: vesselPage,
    handler: ({ req, query }) => vessels.list(query, req.user!),
  });

  api.route({
    method: 'post',
    path: '/vessels',
    tag,
    summary: 'Add a vessel',
    access: allowed('vessel', 'create'),
    body: createVesselBody,
    status: 201,
    response: vessel,
    errors: [409],
    handler: ({ req, body }) => vessels.create(body, req.user!, actorOf(req)),
  });

  api.route({
    method: 'get',
    path: '/vessels/:id',
    tag,
    summary: 'One vessel',
    access: allowed('vessel', 'read'),
    params: idParam,
    response: vessel,
    errors: [404],
    handler: ({ req, params }) => vessels.get(params.id, req.user!),
  });

  api.route({
    method: 'patch',
    path: '/vessels/:id',
    tag,
    summary: "Change a vessel's details",
    access: allowed('vessel', 'update'),
    params: idParam,
    body: updateVesselBody,
    response: vessel,
    errors: [404, 409],
    handler: ({ req, params, body }) => vessels.update(params.id, body, req.user!, actorOf(req)),
  });

  api.route({
    method: 'post',
    path: '/vessels/:id/archive',
    tag,
    summary: 'Archive a vessel (its records stay; it leaves the switcher and the public site)',
    access: allowed('vessel', 'archive'),
    params: idParam,
    response: vessel,
    errors: [404],
    handler: ({ req, params }) => vessels.setArchived(params.id, true, req.user!, actorOf(req)),
  });

  api.route({
    method: 'post',
    path: '/vessels/:id/restore',
    tag,
    summary: 'Bring an archived vessel back',
    access: allowed('vessel', 'archive'),
    params: idParam,
    response: vessel,
    errors: [404],
    handler: ({ req, params }) => vessels.setArchived(params.id, false, req.user!, actorOf(req)),
  });
}
