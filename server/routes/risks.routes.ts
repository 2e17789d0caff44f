import { idParam } from '../../shared/schemas/common.js';
import { createRiskBody, deckConditionOverlay, risk, riskPage, risksQuery, updateRiskBody } from '../../shared/schemas/risks.js';
import type { ApiRouter } from '../http/api-router.js';
import { allowed } from '../http/access.js';
import { actorOf } from '../services/audit.service.js';
import type { RiskService } from '../services/risk.service.js';

export function riskRoutes(api: ApiRouter, risks: RiskService) {
  const tag = 'Condition';

  api.route({
    method: 'get',
    path: '/risks',
    tag,
    summary: 'The risk register of a vessel, highest magnitude first; filter by agent, status, band, deck and compartment',
    access: allowed('risk', 'read'),
    query: risksQuery,
    response: riskPage,
    handler: ({ req, query }) => risks.list(query, req.user!),
  });

  api.route({
    method: 'post',
    path: '/risks',
    tag,
    summary: 'Record a risk with its A, B and C scores, each given directly or from its plain input',
    access: allowed('risk', 'create'),
    body: createRiskBody,
    status: 201,
    response: risk,
    errors: [422],
    handler: ({ req, body }) => risks.create(body, req.user!, actorOf(req)),
  });

  api.route({
    method: 'get',
    path: '/risks/:id',
    tag,
    summary: 'One risk with its scores, magnitude and priority band',
    access: allowed('risk', 'read'),
    params: idParam,
    response: risk,
    errors: [404],
    handler: ({ req, params }) => risks.get(params.id, req.user!),
  });

  api.route({
    method: 'patch',
    path: '/risks/:id',
    tag,
    summary: 'Change a risk, its scores or what it concerns',
    access: allowed('risk', 'update'),
    params: idParam,
    body: updateRiskBody,
    response: risk,
    errors: [404, 409, 422],
    handler: ({ req, params, body }) => risks.update(params.id, body, req.user!, actorOf(req)),
  });

  api.route({
    method: 'delete',
    path: '/risks/:id',
    tag,
    summary: 'Remove a risk from the register',
    access: allowed('risk', 'delete'),
    params: idParam,
    status: 204,
    errors: [404],
    handler: ({ req, params }) => risks.remove(params.id, actorOf(req)),
  });

  api.route({
    method: 'get',
    path: '/decks/:id/condition',
    tag,
    summary: "Per compartment of a deck: current condition grade (its latest submitted report) and open risks with the largest MR, for the map's overlays",
    access: allowed('risk', 'read'),
    params: idParam,
    response: deckConditionOverlay,
    errors: [404],
    handler: ({ params }) => risks.deckOverlay(params.id),
  });
}
