import { idParam } from '../../shared/schemas/common.js';
import { archiveArtifactBody, artifact, artifactMarkers, artifactMoves, artifactPage, artifactsQuery, createArtifactBody, moveArtifactBody, updateArtifactBody } from '../../shared/schemas/artifacts.js';
import { vesselParam } from '../../shared/schemas/decks.js';
import type { ApiRouter } from '../http/api-router.js';
import { allowed } from '../http/access.js';
import { actorOf } from '../services/audit.service.js';
import type { ArtifactService } from '../services/artifact.service.js';

export function artifactRoutes(api: ApiRouter, artifacts: ArtifactService) {
  const tag = 'Collection';

  api.route({
    method: 'get',
    path: '/vessels/:vesselId/artifacts',
    tag,
    summary: "A vessel's artifacts (paged, sorted, filtered); `q` searches the full text, best match first, with highlights",
    access: allowed('artifact', 'read'),
    params: vesselParam,
    query: artifactsQuery,
    response: artifactPage,
    errors: [404],
    handler: ({ req, params, query }) => artifacts.list(params.vesselId, query, req.user!),
  });

  api.route({
    method: 'post',
    path: '/vessels/:vesselId/artifacts',
    tag,
    summary: 'Record an artifact, optionally with its compartment and a point on the deck plan',
    access: allowed('artifact', 'create'),
    params: vesselParam,
    body: createArtifactBody,
    status: 201,
    response: artifact,
    errors: [404, 409, 422],
    handler: ({ req, params, body }) => artifacts.create(params.vesselId, body, req.user!, actorOf(req)),
  });

  api.route({
    method: 'get',
    path: '/decks/:id/artifacts',
    tag,
    summary: 'The artifacts placed on a deck plan, as markers',
    access: allowed('artifact', 'read'),
    params: idParam,
    response: artifactMarkers,
    errors: [404],
    handler: ({ params }) => artifacts.markers(params.id),
  });

  api.route({
    method: 'get',
    path: '/artifacts/:id',
    tag,
    summary: 'One artifact with its place',
    access: allowed('artifact', 'read'),
    params: idParam,
    response: artifact,
    errors: [404],
    handler: ({ req, params }) => artifacts.get(params.id, req.user!),
  });

  api.route({
    method: 'patch',
    path: '/artifacts/:id',
    tag,
    summary: 'Change what describes an artifact (its place and status change by a move); 409 names what others changed',
    access: allowed('artifact', 'update'),
    params: idParam,
    body: updateArtifactBody,
    response: artifact,
    errors: [404, 409, 422],
    handler: ({ req, params, body }) => artifacts.update(params.id, body, req.user!, actorOf(req)),
  });

  api.route({
    method: 'get',
    path: '/artifacts/:id/moves',
    tag,
    summary: "An artifact's location history, newest first",
    access: allowed('artifact', 'read'),
    params: idParam,
    response: artifactMoves,
    errors: [404],
    handler: ({ params }) => artifacts.moves(params.id),
  });

  api.route({
    method: 'post',
    path: '/artifacts/:id/moves',
    tag,
    summary: 'Record a move or a change of status, with its date and reason',
    access: allowed('artifact', 'move'),
    params: idParam,
    body: moveArtifactBody,
    status: 201,
    response: artifact,
    errors: [404, 409, 422],
    handler: ({ req, params, body }) => artifacts.move(params.id, body, req.user!, actorOf(req)),
  });

  api.route({
    method: 'post',
    path: '/artifacts/:id/archive',
    tag,
    summary: 'Deaccession an artifact with a reason; artifacts are never deleted',
    access: allowed('artifact', 'archive'),
    params: idParam,
    body: archiveArtifactBody,
    response: artifact,
    errors: [404, 409, 422],
    handler: ({ req, params, body }) => artifacts.archive(params.id, body, req.user!, actorOf(req)),
  });
}
