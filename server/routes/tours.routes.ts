import { idParam } from '../../shared/schemas/common.js';
import { media } from '../../shared/schemas/media.js';
import {
  createStopBody,
  createTourBody,
  reorderStopsBody,
  tour,
  tourPage,
  tourRouteSettings,
  tourStopParams,
  toursQuery,
  updateStopBody,
  updateTourBody,
  updateTourRouteSettingsBody,
  vesselToursParams,
} from '../../shared/schemas/tours.js';
import type { ApiRouter } from '../http/api-router.js';
import { allowed } from '../http/access.js';
import { receiveFile } from '../http/receive-file.js';
import { actorOf } from '../services/audit.service.js';
import type { MediaService } from '../services/media.service.js';
import type { TourService } from '../services/tour.service.js';

export function tourRoutes(api: ApiRouter, tours: TourService, files: MediaService, options: { incomingDir: string; maxBytes: number }) {
  const tag = 'Tours';

  api.route({
    method: 'get',
    path: '/vessels/:vesselId/tours',
    tag,
    summary: 'The tours of a vessel (paged; filter by `state`); `q` searches the words of their titles, summaries and stops, with a snippet of where they were found',
    access: allowed('tour', 'read'),
    params: vesselToursParams,
    query: toursQuery,
    response: tourPage,
    errors: [404],
    handler: ({ params, query }) => tours.list(params.vesselId, query),
  });

  api.route({
    method: 'post',
    path: '/vessels/:vesselId/tours',
    tag,
    summary: 'Start a tour (a draft; its slug is unique on the vessel)',
    access: allowed('tour', 'create'),
    params: vesselToursParams,
    body: createTourBody,
    status: 201,
    response: tour,
    errors: [404, 409, 422],
    handler: ({ req, params, body }) => tours.create(params.vesselId, body, req.user!, actorOf(req)),
  });

  api.route({
    method: 'get',
    path: '/vessels/:vesselId/tour-route-settings',
    tag,
    summary: 'How the vessel’s tour routes are timed: walking pace and the allowance per deck change (version 0: the defaults)',
    access: allowed('tour', 'read'),
    params: vesselToursParams,
    response: tourRouteSettings,
    errors: [404],
    handler: ({ params }) => tours.routeSettings(params.vesselId),
  });

  api.route({
    method: 'put',
    path: '/vessels/:vesselId/tour-route-settings',
    tag,
    summary: 'Set the walking pace and the allowance per deck change',
    access: allowed('tour', 'approve'),
    params: vesselToursParams,
    body: updateTourRouteSettingsBody,
    response: tourRouteSettings,
    errors: [404, 409],
    handler: ({ req, params, body }) => tours.updateRouteSettings(params.vesselId, body, actorOf(req)),
  });

  api.route({
    method: 'get',
    path: '/tours/:id',
    tag,
    summary: 'A tour with its stops, their spaces’ cautions and closures, and the route',
    access: allowed('tour', 'read'),
    params: idParam,
    response: tour,
    errors: [404],
    handler: ({ req, params }) => tours.get(params.id, req.user!),
  });

  api.route({
    method: 'patch',
    path: '/tours/:id',
    tag,
    summary: 'Change a tour’s details (kept as a revision; a published tour’s public version stays until the next approval)',
    access: allowed('tour', 'update'),
    params: idParam,
    body: updateTourBody,
    response: tour,
    errors: [404, 409, 422],
    handler: ({ req, params, body }) => tours.update(params.id, body, req.user!, actorOf(req)),
  });

  api.route({
    method: 'post',
    path: '/tours/:id/stops',
    tag,
    summary: 'Add a stop at the end (its space on the tour’s vessel, its artifacts in that space); the text is rendered and sanitized at save',
    access: allowed('tour', 'update'),
    params: idParam,
    body: createStopBody,
    status: 201,
    response: tour,
    errors: [404, 409, 422],
    handler: ({ req, params, body }) => tours.createStop(params.id, body, req.user!, actorOf(req)),
  });

  api.route({
    method: 'patch',
    path: '/tours/:id/stops/:stopId',
    tag,
    summary: 'Change a stop (409 with the newer version when someone saved it first)',
    access: allowed('tour', 'update'),
    params: tourStopParams,
    body: updateStopBody,
    response: tour,
    errors: [404, 409, 422],
    handler: ({ req, params, body }) => tours.updateStop(params.id, params.stopId, body, req.user!, actorOf(req)),
  });

  api.route({
    method: 'delete',
    path: '/tours/:id/stops/:stopId',
    tag,
    summary: 'Remove a stop (the revisions keep it)',
    access: allowed('tour', 'update'),
    params: tourStopParams,
    response: tour,
    errors: [404, 409],
    handler: ({ req, params }) => tours.removeStop(params.id, params.stopId, req.user!, actorOf(req)),
  });

  api.route({
    method: 'put',
    path: '/tours/:id/stop-order',
    tag,
    summary: 'Put the stops in a new order (every stop once; 409 when the stops changed meanwhile)',
    access: allowed('tour', 'update'),
    params: idParam,
    body: reorderStopsBody,
    response: tour,
    errors: [404, 409],
    handler: ({ req, params, body }) => tours.reorder(params.id, body.stopIds, req.user!, actorOf(req)),
  });

  const receive = receiveFile(options.incomingDir, options.maxBytes, 'an audio clip');
  api.route({
    method: 'post',
    path: '/tours/:id/audio',
    tag,
    summary: 'Upload an audio clip for a stop (MP3, M4A or Ogg, checked by content; multipart field `file`); then set it on the stop with its transcript',
    access: allowed('tour', 'update'),
    params: idParam,
    status: 201,
    response: media,
    errors: [404, 413, 415],
    before: [receive],
    handler: ({ req, params }) => files.upload({ ownerType: 'tour', ownerId: params.id }, req.file, req.user!, actorOf(req), 'audio'),
  });
}

