import { z } from 'zod';
import { idParam } from '../../shared/schemas/common.js';
import { calibrateDeckBody, createDeckBody, deck, updateDeckBody, vesselParam } from '../../shared/schemas/decks.js';
import type { ApiRouter } from '../http/api-router.js';
import { allowed } from '../http/access.js';
import { actorOf } from '../services/audit.service.js';
import type { DeckService } from '../services/deck.service.js';

export function deckRoutes(api: ApiRouter, decks: DeckService) {
  const tag = 'Ship map';

  api.route({
    method: 'get',
    path: '/vessels/:vesselId/decks',
    tag,
    summary: "A vessel's decks, from the top down",
    access: allowed('deck', 'read'),
    params: vesselParam,
    response: z.array(deck),
    errors: [404],
    handler: ({ req, params }) => decks.list(params.vesselId, req.user!),
  });

  api.route({
    method: 'post',
    path: '/vessels/:vesselId/decks',
    tag,
    summary: 'Add a deck below the others',
    access: allowed('deck', 'create'),
    params: vesselParam,
    body: createDeckBody,
    status: 201,
    response: deck,
    errors: [404, 409],
    handler: ({ req, params, body }) => decks.create(params.vesselId, body, req.user!, actorOf(req)),
  });

  api.route({
    method: 'get',
    path: '/decks/:id',
    tag,
    summary: 'One deck with its scale',
    access: allowed('deck', 'read'),
    params: idParam,
    response: deck,
    errors: [404],
    handler: ({ req, params }) => decks.get(params.id, req.user!),
  });

  api.route({
    method: 'patch',
    path: '/decks/:id',
    tag,
    summary: "Rename or reorder a deck, or set its level, centerline and the bow's direction on the plan",
    access: allowed('deck', 'update'),
    params: idParam,
    body: updateDeckBody,
    response: deck,
    errors: [404, 409, 422],
    handler: ({ req, params, body }) => decks.update(params.id, body, req.user!, actorOf(req)),
  });

  api.route({
    method: 'post',
    path: '/decks/:id/calibration',
    tag,
    summary: "Set the deck's scale from two points and their real distance, or from frames and the frame spacing",
    access: allowed('deck', 'update'),
    params: idParam,
    body: calibrateDeckBody,
    response: deck,
    errors: [404, 409, 422],
    handler: ({ req, params, body }) => decks.calibrate(params.id, body, req.user!, actorOf(req)),
  });

  api.route({
    method: 'delete',
    path: '/decks/:id',
    tag,
    summary: 'Delete a deck that has no compartments',
    access: allowed('deck', 'delete'),
    params: idParam,
    status: 204,
    errors: [404, 409],
    handler: ({ req, params }) => decks.remove(params.id, actorOf(req)),
  });
}
