import { z } from 'zod';
import { idParam } from '../../shared/schemas/common.js';
import { approveTourBody, compareQuery, createCommentBody, publishCheck, returnTourBody, revisionCompare, revisionParams, tour, tourComment, tourRevisionSummary, versionBody } from '../../shared/schemas/tours.js';
import type { ApiRouter } from '../http/api-router.js';
import { allowed } from '../http/access.js';
import { actorOf } from '../services/audit.service.js';
import type { TourReviewService } from '../services/tour-review.service.js';
import type { TourRevisionService } from '../services/tour-revisions.service.js';

export function tourReviewRoutes(api: ApiRouter, review: TourReviewService, revisions: TourRevisionService) {
  const tag = 'Tour review';

  api.route({
    method: 'get',
    path: '/tours/:id/publish-check',
    tag,
    summary: 'What stops the tour from being published (every problem) and what is said before it is (warnings)',
    access: allowed('tour', 'read'),
    params: idParam,
    response: publishCheck,
    errors: [404],
    handler: ({ params }) => review.check(params.id),
  });

  api.route({
    method: 'post',
    path: '/tours/:id/submit',
    tag,
    summary: 'Submit a draft for review (422 listing every problem that would stop publishing); e-mails the curators',
    access: allowed('tour', 'submit'),
    params: idParam,
    body: versionBody,
    response: tour,
    errors: [404, 409, 422],
    handler: ({ req, params, body }) => review.submit(params.id, body.version, req.user!, actorOf(req)),
  });

  api.route({
    method: 'post',
    path: '/tours/:id/approve',
    tag,
    summary: 'Approve a tour in review: freezes the published snapshot the public site serves; e-mails the docent who submitted it',
    access: allowed('tour', 'approve'),
    params: idParam,
    body: approveTourBody,
    response: z.object({ tour, warnings: publishCheck.shape.warnings }),
    errors: [404, 409, 422],
    handler: ({ req, params, body }) => review.approve(params.id, body.version, body.comment, req.user!, actorOf(req)),
  });

  api.route({
    method: 'post',
    path: '/tours/:id/return',
    tag,
    summary: 'Return a tour in review to its docent with a comment (and the comments on its stops), by e-mail',
    access: allowed('tour', 'return'),
    params: idParam,
    body: returnTourBody,
    response: tour,
    errors: [404, 409],
    handler: ({ req, params, body }) => review.return(params.id, body.version, body.comment, req.user!, actorOf(req)),
  });

  api.route({
    method: 'post',
    path: '/tours/:id/retire',
    tag,
    summary: 'Take a published tour off the public site',
    access: allowed('tour', 'retire'),
    params: idParam,
    body: versionBody,
    response: tour,
    errors: [404, 409, 422],
    handler: ({ req, params, body }) => review.retire(params.id, body.version, req.user!, actorOf(req)),
  });

  api.route({
    method: 'get',
    path: '/tours/:id/placards.pdf',
    tag,
    summary: 'Printable QR placards of the published tour: one per page for every stop or one `stop`, or with `sheet=true` all stops on A4 sheets',
    access: allowed('tour', 'read'),
    params: idParam,
    query: z.object({ stop: z.coerce.number().int().positive().optional(), sheet: z.enum(['true', 'false']).optional() }),
    produces: 'application/pdf',
    errors: [404, 422],
    handler: async ({ params, query, res }) => {
      const { pdf, fileName } = await review.placards(params.id, query.stop, query.sheet === 'true');
      res.setHeader('Content-Type', 'application/pdf');
      res.setHeader('Content-Disposition', `inline; filename="${fileName}"`);
      res.end(pdf);
    },
  });

  api.route({
    method: 'get',
    path: '/tours/:id/comments',
    tag,
    summary: 'Review comments on the tour and its stops, oldest first',
    access: allowed('tour', 'read'),
    params: idParam,
    response: z.array(tourComment),
    errors: [404],
    handler: ({ params }) => review.comments(params.id),
  });

  api.route({
    method: 'post',
    path: '/tours/:id/comments',
    tag,
    summary: 'Comment on the tour or on one of its stops (`stopId`)',
    access: allowed('tour', 'comment'),
    params: idParam,
    body: createCommentBody,
    status: 201,
    response: tourComment,
    errors: [404, 409, 422],
    handler: ({ req, params, body }) => review.comment(params.id, body, req.user!, actorOf(req)),
  });

  api.route({
    method: 'get',
    path: '/tours/:id/revisions',
    tag,
    summary: 'Every saved revision of the tour, newest first',
    access: allowed('tour', 'read'),
    params: idParam,
    response: z.array(tourRevisionSummary),
    errors: [404],
    handler: ({ params }) => revisions.list(params.id),
  });

  api.route({
    method: 'get',
    path: '/tours/:id/revisions/compare',
    tag,
    summary: 'Two revisions side by side (`from`, `to`), with what changed between them',
    access: allowed('tour', 'read'),
    params: idParam,
    query: compareQuery,
    response: revisionCompare,
    errors: [404],
    handler: ({ params, query }) => revisions.compare(params.id, query.from, query.to),
  });

  api.route({
    method: 'post',
    path: '/tours/:id/revisions/:number/restore',
    tag,
    summary: 'Make the tour as it was in a revision, kept as a new revision',
    access: allowed('tour', 'update'),
    params: revisionParams,
    body: versionBody,
    response: tour,
    errors: [404, 409, 422],
    handler: ({ req, params, body }) => revisions.restore(params.id, params.number, body.version, req.user!, actorOf(req)),
  });
}
