import { idParam } from '../../shared/schemas/common.js';
import { media, mediaFileParams, mediaList, mediaOwnerQuery, updateMediaBody } from '../../shared/schemas/media.js';
import type { ApiRouter } from '../http/api-router.js';
import { allowed } from '../http/access.js';
import { receiveFile } from '../http/receive-file.js';
import { actorOf } from '../services/audit.service.js';
import type { MediaService } from '../services/media.service.js';

export function mediaRoutes(api: ApiRouter, service: MediaService, options: { incomingDir: string; maxBytes: number }) {
  const tag = 'Media';
  const receive = receiveFile(options.incomingDir, options.maxBytes, 'a photo or document');

  api.route({
    method: 'get',
    path: '/media',
    tag,
    summary: 'The photos and documents of a record (`ownerType` and `ownerId`); files follow their owner’s read rule, so a condition report’s are for the roles that read findings (403 otherwise)',
    access: allowed('media', 'read'),
    query: mediaOwnerQuery,
    response: mediaList,
    errors: [404],
    handler: ({ req, query }) => service.list(query, req.user!),
  });

  api.route({
    method: 'post',
    path: '/media',
    tag,
    summary: 'Upload one photo (JPEG, PNG, WebP) or PDF to a record (multipart field `file`; the owner in the query); checked by content',
    access: allowed('media', 'create'),
    query: mediaOwnerQuery,
    status: 201,
    response: media,
    errors: [404, 413, 415],
    before: [receive],
    handler: ({ req, query }) => service.upload(query, req.file, req.user!, actorOf(req)),
  });

  api.route({
    method: 'get',
    path: '/media/:id',
    tag,
    summary: 'One photo or document with its caption, credit, alt text and rights note',
    access: allowed('media', 'read'),
    params: idParam,
    response: media,
    errors: [404],
    handler: ({ req, params }) => service.get(params.id, req.user!),
  });

  api.route({
    method: 'patch',
    path: '/media/:id',
    tag,
    summary: 'Change the caption, credit, alt text or rights note',
    access: allowed('media', 'update'),
    params: idParam,
    body: updateMediaBody,
    response: media,
    errors: [404, 409],
    handler: ({ req, params, body }) => service.update(params.id, body, req.user!, actorOf(req)),
  });

  api.route({
    method: 'delete',
    path: '/media/:id',
    tag,
    summary: 'Delete a photo or document and its files (409 when a submitted report relies on it)',
    access: allowed('media', 'delete'),
    params: idParam,
    status: 204,
    errors: [404, 409],
    handler: ({ req, params }) => service.remove(params.id, req.user!, actorOf(req)),
  });

  api.route({
    method: 'get',
    path: '/media/:id/:variant',
    tag,
    summary: 'A file: `thumb` (320 px) and `display` (1600 px) WebP without metadata, or the `original` as uploaded (staff only); the same read rule as the file’s owner',
    access: allowed('media', 'read'),
    params: mediaFileParams,
    produces: 'image/webp',
    errors: [404],
    handler: async ({ req, params, res }) => {
      const file = await service.file(params.id, params.variant, req.user!);
      res.setHeader('Cache-Control', 'private, max-age=31536000, immutable');
      res.setHeader('Content-Type', file.type);
      res.setHeader('Content-Disposition', `inline; filename="${file.name.replace(/[^\w.\- ]/g, '_')}"`);
      await new Promise<void>((resolve, reject) => res.sendFile(file.path, (err) => (err ? reject(err) : resolve())));
    },
  });
}
