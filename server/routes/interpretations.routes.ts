import { z } from 'zod';
import { idParam } from '../../shared/schemas/common.js';
import {
  interpretation,
  interpretationActionBody,
  interpretationPage,
  interpretationRevisionParams,
  interpretationRevisions,
  interpretationsQuery,
  publicInterpretation,
  returnInterpretationBody,
  saveInterpretationBody,
  type InterpretationSubject,
} from '../../shared/schemas/interpretation.js';
import { vesselParam } from '../../shared/schemas/decks.js';
import type { ApiRouter } from '../http/api-router.js';
import { allowed, anyone } from '../http/access.js';
import { actorOf } from '../services/audit.service.js';
import type { InterpretationService } from '../services/interpretation.service.js';
import type { MediaService } from '../services/media.service.js';

const SUBJECTS: { type: InterpretationSubject; base: string; noun: string }[] = [
  { type: 'artifact', base: '/artifacts/:id/interpretation', noun: 'an artifact' },
  { type: 'compartment', base: '/compartments/:id/interpretation', noun: 'a compartment' },
];

/** Interpretive text of artifacts and compartments, its review, and the public read of what is published. */
export function interpretationRoutes(api: ApiRouter, interpretations: InterpretationService, media: MediaService) {
  const tag = 'Interpretation';

  api.route({
    method: 'get',
    path: '/vessels/:vesselId/interpretations',
    tag,
    summary: "A vessel's interpretive texts (paged): filter by state (the review queue is `in-review`) and kind of subject; `q` searches their words, with a snippet",
    access: allowed('interpretation', 'read'),
    params: vesselParam,
    query: interpretationsQuery,
    response: interpretationPage,
    errors: [404],
    handler: ({ params, query }) => interpretations.list(params.vesselId, query),
  });

  for (const { type, base, noun } of SUBJECTS) {
    api.route({
      method: 'get',
      path: base,
      tag,
      summary: `The interpretive text of ${noun}: its draft per audience, its published snapshot, state and reading targets`,
      access: allowed('interpretation', 'read'),
      params: idParam,
      response: interpretation,
      errors: [404],
      handler: ({ req, params }) => interpretations.get(type, params.id, req.user!),
    });

    api.route({
      method: 'get',
      path: `${base}/revisions`,
      tag,
      summary: `Every kept save of ${noun}'s draft, newest first, with who saved it and the texts as they were`,
      access: allowed('interpretation', 'read'),
      params: idParam,
      response: interpretationRevisions,
      errors: [404],
      handler: ({ params }) => interpretations.revisions(type, params.id),
    });

    api.route({
      method: 'post',
      path: `${base}/revisions/:number/restore`,
      tag,
      summary: `Restore a revision (by its number) of ${noun}'s draft, kept as a new revision; the text goes back to draft (out of review, or a new draft beside what is published)`,
      access: allowed('interpretation', 'update'),
      params: interpretationRevisionParams,
      body: interpretationActionBody,
      response: interpretation,
      errors: [404, 409],
      handler: ({ req, params, body }) => interpretations.restore(type, params.id, params.number, body.version, req.user!, actorOf(req)),
    });

    api.route({
      method: 'put',
      path: base,
      tag,
      summary: `Save the draft of ${noun}'s interpretive text (every audience's label and story; each save is a revision; version 0 for the first)`,
      access: allowed('interpretation', 'update'),
      params: idParam,
      body: saveInterpretationBody,
      response: interpretation,
      errors: [404, 409, 422],
      handler: ({ req, params, body }) => interpretations.save(type, params.id, body, req.user!, actorOf(req)),
    });

    api.route({
      method: 'post',
      path: `${base}/submit`,
      tag,
      summary: `Submit ${noun}'s draft for a curator's review (curators are told by e-mail)`,
      access: allowed('interpretation', 'submit'),
      params: idParam,
      body: interpretationActionBody,
      response: interpretation,
      errors: [404, 409, 422],
      handler: ({ req, params, body }) => interpretations.submit(type, params.id, body.version, req.user!, actorOf(req)),
    });

    api.route({
      method: 'post',
      path: `${base}/approve`,
      tag,
      summary: `Approve ${noun}'s text in review (or a curator's own draft) and publish it as a snapshot that later drafts leave alone`,
      access: allowed('interpretation', 'approve'),
      params: idParam,
      body: interpretationActionBody,
      response: interpretation,
      errors: [404, 409, 422],
      handler: ({ req, params, body }) => interpretations.approve(type, params.id, body.version, req.user!, actorOf(req)),
    });

    api.route({
      method: 'post',
      path: `${base}/return`,
      tag,
      summary: `Return ${noun}'s text in review to its author with a comment (the author is told by e-mail)`,
      access: allowed('interpretation', 'return'),
      params: idParam,
      body: returnInterpretationBody,
      response: interpretation,
      errors: [404, 409],
      handler: ({ req, params, body }) => interpretations.returnToAuthor(type, params.id, body, req.user!, actorOf(req)),
    });

    api.route({
      method: 'get',
      path: `/visit${base}`,
      tag: 'Visit',
      summary: `The published interpretive text of ${noun} as sanitized HTML per audience; 404 when nothing is published`,
      access: anyone,
      params: idParam,
      response: publicInterpretation,
      errors: [404],
      handler: ({ params }) => interpretations.publicRead(type, params.id),
    });

    api.route({
      method: 'get',
      path: `/visit${base}/media/:mediaId/:variant`,
      tag: 'Visit',
      summary: `A photo (WebP \`thumb\` or \`display\`) of ${noun}'s published interpretive text; only the photos that text shows, while they are marked for public use and have alt text`,
      access: anyone,
      params: idParam.extend({ mediaId: z.coerce.number().int().positive(), variant: z.enum(['thumb', 'display']) }),
      produces: 'image/webp',
      errors: [404],
      handler: async ({ params, res }) => {
        await interpretations.assertPublishedPhoto(type, params.id, params.mediaId);
        const file = await media.publicFile(params.mediaId, params.variant);
        res.setHeader('Cache-Control', 'public, max-age=3600');
        res.setHeader('Content-Type', file.type);
        await new Promise<void>((resolve, reject) => res.sendFile(file.path, (err) => (err ? reject(err) : resolve())));
      },
    });
  }
}
