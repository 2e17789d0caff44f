import { idParam } from '../../shared/schemas/common.js';
import { conditionHistory, conditionReport, conditionReportPage, historyQuery, conditionReportsQuery, createConditionReportBody, createFindingBody, reportFindingParams, updateConditionReportBody, updateFindingBody, versionBody } from '../../shared/schemas/condition.js';
import type { ApiRouter } from '../http/api-router.js';
import { allowed } from '../http/access.js';
import { actorOf } from '../services/audit.service.js';
import type { ConditionReportService } from '../services/condition-report.service.js';

export function conditionReportRoutes(api: ApiRouter, reports: ConditionReportService) {
  const tag = 'Condition';

  api.route({
    method: 'get',
    path: '/condition-reports',
    tag,
    summary: 'Condition reports (summaries) by vessel, artifact or compartment; `q` searches a vessel’s reports and findings',
    access: allowed('conditionReport', 'read'),
    query: conditionReportsQuery,
    response: conditionReportPage,
    handler: ({ req, query }) => reports.list(query, req.user!),
  });

  api.route({
    method: 'get',
    path: '/condition-history',
    tag,
    summary: "An artifact's or compartment's reports and incidents over time, with grades, and its photos by date for comparison (its reports' photos for the roles that read findings)",
    access: allowed('conditionReport', 'read'),
    query: historyQuery,
    response: conditionHistory,
    errors: [404],
    handler: ({ req, query }) => reports.history(query.subjectType, query.subjectId, req.user!),
  });

  api.route({
    method: 'post',
    path: '/condition-reports',
    tag,
    summary: 'Start a condition report (a draft) on an artifact or a compartment',
    access: allowed('conditionReport', 'create'),
    body: createConditionReportBody,
    status: 201,
    response: conditionReport,
    errors: [422],
    handler: ({ req, body }) => reports.create(body, req.user!, actorOf(req)),
  });

  api.route({
    method: 'get',
    path: '/condition-reports/:id',
    tag,
    summary: 'One condition report; its findings for the roles that read them',
    access: allowed('conditionReport', 'read'),
    params: idParam,
    response: conditionReport,
    errors: [404],
    handler: ({ req, params }) => reports.get(params.id, req.user!),
  });

  api.route({
    method: 'get',
    path: '/condition-reports/:id/pdf',
    tag,
    summary: 'The report as a PDF with its findings and photos, to send to a grant maker or an insurer',
    access: allowed('conditionReport', 'readFindings'),
    params: idParam,
    produces: 'application/pdf',
    errors: [404],
    handler: async ({ params, res }) => {
      const { pdf, fileName } = await reports.pdf(params.id);
      res.setHeader('Content-Type', 'application/pdf');
      res.setHeader('Content-Disposition', `attachment; filename="${fileName}"`);
      res.end(pdf);
    },
  });

  api.route({
    method: 'get',
    path: '/condition-reports/:id/summary.pdf',
    tag,
    summary: 'The report as a summary PDF for grant applications: grade, rule, summary, hazards and publishable photos, without the findings',
    access: allowed('conditionReport', 'read'),
    params: idParam,
    produces: 'application/pdf',
    errors: [404],
    handler: async ({ params, res }) => {
      const { pdf, fileName } = await reports.summaryPdf(params.id);
      res.setHeader('Content-Type', 'application/pdf');
      res.setHeader('Content-Disposition', `attachment; filename="${fileName}"`);
      res.end(pdf);
    },
  });

  api.route({
    method: 'patch',
    path: '/condition-reports/:id',
    tag,
    summary: 'Change a draft report (a submitted one answers 409: amend it)',
    access: allowed('conditionReport', 'update'),
    params: idParam,
    body: updateConditionReportBody,
    response: conditionReport,
    errors: [404, 409, 422],
    handler: ({ req, params, body }) => reports.update(params.id, body, req.user!, actorOf(req)),
  });

  api.route({
    method: 'delete',
    path: '/condition-reports/:id',
    tag,
    summary: 'Delete a draft report; a submitted report is never deleted (409)',
    access: allowed('conditionReport', 'delete'),
    params: idParam,
    status: 204,
    errors: [404, 409],
    handler: ({ req, params }) => reports.remove(params.id, actorOf(req)),
  });

  api.route({
    method: 'post',
    path: '/condition-reports/:id/submit',
    tag,
    summary: 'Submit a draft: signed with the name of who submits and the time; from then on immutable',
    access: allowed('conditionReport', 'submit'),
    params: idParam,
    body: versionBody,
    response: conditionReport,
    errors: [404, 409],
    handler: ({ req, params, body }) => reports.submit(params.id, body.version, req.user!, actorOf(req)),
  });

  api.route({
    method: 'post',
    path: '/condition-reports/:id/amend',
    tag,
    summary: 'Amend a submitted report: a new draft revision, with its findings, that supersedes it once submitted',
    access: allowed('conditionReport', 'amend'),
    params: idParam,
    status: 201,
    response: conditionReport,
    errors: [404, 409],
    handler: ({ req, params }) => reports.amend(params.id, req.user!, actorOf(req)),
  });

  api.route({
    method: 'post',
    path: '/condition-reports/:id/findings',
    tag,
    summary: 'Add a finding to a draft report; answers the report with its new grade',
    access: allowed('conditionReport', 'update'),
    params: idParam,
    body: createFindingBody,
    status: 201,
    response: conditionReport,
    errors: [404, 409, 422],
    handler: ({ req, params, body }) => reports.addFinding(params.id, body, req.user!, actorOf(req)),
  });

  api.route({
    method: 'patch',
    path: '/condition-reports/:id/findings/:findingId',
    tag,
    summary: 'Change a finding of a draft report',
    access: allowed('conditionReport', 'update'),
    params: reportFindingParams,
    body: updateFindingBody,
    response: conditionReport,
    errors: [404, 409, 422],
    handler: ({ req, params, body }) => reports.updateFinding(params.id, params.findingId, body, req.user!, actorOf(req)),
  });

  api.route({
    method: 'delete',
    path: '/condition-reports/:id/findings/:findingId',
    tag,
    summary: 'Remove a finding from a draft report',
    access: allowed('conditionReport', 'update'),
    params: reportFindingParams,
    response: conditionReport,
    errors: [404, 409],
    handler: ({ req, params }) => reports.removeFinding(params.id, params.findingId, req.user!, actorOf(req)),
  });
}
