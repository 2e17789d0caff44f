import { idParam } from '../../shared/schemas/common.js';
import { z } from 'zod';
import { vesselParam } from '../../shared/schemas/decks.js';
import { closure, createIncidentBody, incident, incidentPage, incidentsQuery, updateIncidentBody } from '../../shared/schemas/incidents.js';
import type { ApiRouter } from '../http/api-router.js';
import { allowed } from '../http/access.js';
import { actorOf } from '../services/audit.service.js';
import type { ClosureService } from '../services/closure.service.js';
import type { IncidentService } from '../services/incident.service.js';

export function incidentRoutes(api: ApiRouter, incidents: IncidentService, closures: ClosureService) {
  const tag = 'Condition';

  api.route({
    method: 'get',
    path: '/vessels/:vesselId/closures',
    tag,
    summary: 'Spaces closed to visitors now by an incident: since when, the public line, and the incident',
    access: allowed('incident', 'read'),
    params: vesselParam,
    response: z.array(closure),
    handler: ({ params }) => closures.current(params.vesselId),
  });

  api.route({
    method: 'get',
    path: '/incidents',
    tag,
    summary: "A vessel's incidents, newest first; filter by kind, artifact or compartment",
    access: allowed('incident', 'read'),
    query: incidentsQuery,
    response: incidentPage,
    handler: ({ req, query }) => incidents.list(query, req.user!),
  });

  api.route({
    method: 'post',
    path: '/incidents',
    tag,
    summary: 'Log an incident: may close affected compartments to visitors, opens a draft report with a finding on each affected item, and e-mails the curators and conservators',
    access: allowed('incident', 'create'),
    body: createIncidentBody,
    status: 201,
    response: incident,
    errors: [422],
    handler: ({ req, body }) => incidents.create(body, req.user!, actorOf(req)),
  });

  api.route({
    method: 'get',
    path: '/incidents/:id',
    tag,
    summary: 'One incident',
    access: allowed('incident', 'read'),
    params: idParam,
    response: incident,
    errors: [404],
    handler: ({ req, params }) => incidents.get(params.id, req.user!),
  });

  api.route({
    method: 'patch',
    path: '/incidents/:id',
    tag,
    summary: 'Add to what is known of an incident (who it was reported to, actions taken)',
    access: allowed('incident', 'update'),
    params: idParam,
    body: updateIncidentBody,
    response: incident,
    errors: [404, 409, 422],
    handler: ({ req, params, body }) => incidents.update(params.id, body, req.user!, actorOf(req)),
  });
}
