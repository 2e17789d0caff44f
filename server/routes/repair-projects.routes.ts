import { idParam } from '../../shared/schemas/common.js';
import { vesselParam } from '../../shared/schemas/decks.js';
import { changeRepairProjectStatusBody, createRepairProjectBody, repairProject, repairProjectPage, repairProjectsQuery, updateRepairProjectBody } from '../../shared/schemas/repair-projects.js';
import { createTreatmentBody, treatment, treatmentList, updateTreatmentBody } from '../../shared/schemas/treatments.js';
import type { ApiRouter } from '../http/api-router.js';
import { allowed } from '../http/access.js';
import { actorOf } from '../services/audit.service.js';
import type { RepairProjectService } from '../services/repair-project.service.js';
import type { TreatmentService } from '../services/treatment.service.js';

export function repairProjectRoutes(api: ApiRouter, projects: RepairProjectService, treatments: TreatmentService) {
  const tag = 'Care';

  api.route({
    method: 'get',
    path: '/vessels/:vesselId/repair-projects',
    tag,
    summary: 'The repair projects of a vessel, most recently changed first; filter by status',
    access: allowed('repairProject', 'read'),
    params: vesselParam,
    query: repairProjectsQuery,
    response: repairProjectPage,
    errors: [404],
    handler: ({ params, query }) => projects.list(params.vesselId, query),
  });

  api.route({
    method: 'post',
    path: '/vessels/:vesselId/repair-projects',
    tag,
    summary: 'Propose a repair project: title, slug, scope, estimate lines with contingency, and what it addresses',
    access: allowed('repairProject', 'create'),
    params: vesselParam,
    body: createRepairProjectBody,
    status: 201,
    response: repairProject,
    errors: [404, 409, 422],
    handler: ({ req, params, body }) => projects.create(params.vesselId, body, req.user!, actorOf(req)),
  });

  api.route({
    method: 'get',
    path: '/repair-projects/:id',
    tag,
    summary: 'One repair project with its estimate, links, cautions, status changes and the findings it addresses beside their next survey',
    access: allowed('repairProject', 'read'),
    params: idParam,
    response: repairProject,
    errors: [404],
    handler: ({ req, params }) => projects.get(params.id, req.user!),
  });

  api.route({
    method: 'patch',
    path: '/repair-projects/:id',
    tag,
    summary: 'Change a repair project (its `version` as read; 409 when someone changed it since)',
    access: allowed('repairProject', 'update'),
    params: idParam,
    body: updateRepairProjectBody,
    response: repairProject,
    errors: [404, 409, 422],
    handler: ({ req, params, body }) => projects.update(params.id, body, req.user!, actorOf(req)),
  });

  api.route({
    method: 'post',
    path: '/repair-projects/:id/status',
    tag,
    summary: 'Move a project one step along proposed → approved → fundraising → funded → underway → complete, or cancel it before complete; approving is for a curator (422 otherwise)',
    access: allowed('repairProject', 'changeStatus'),
    params: idParam,
    body: changeRepairProjectStatusBody,
    response: repairProject,
    errors: [404, 409, 422],
    handler: ({ req, params, body }) => projects.changeStatus(params.id, body, req.user!, actorOf(req)),
  });

  api.route({
    method: 'get',
    path: '/repair-projects/:id/treatments',
    tag,
    summary: 'The treatments recorded under a project, oldest first, with their before and after photos',
    access: allowed('treatment', 'read'),
    params: idParam,
    response: treatmentList,
    errors: [404],
    handler: ({ req, params }) => treatments.list(params.id, req.user!),
  });

  api.route({
    method: 'post',
    path: '/repair-projects/:id/treatments',
    tag,
    summary: 'Record a treatment: date, who (a user or a named contractor), method, materials and the findings it addresses',
    access: allowed('treatment', 'create'),
    params: idParam,
    body: createTreatmentBody,
    status: 201,
    response: treatment,
    errors: [404, 422],
    handler: ({ req, params, body }) => treatments.create(params.id, body, req.user!, actorOf(req)),
  });

  api.route({
    method: 'patch',
    path: '/treatments/:id',
    tag,
    summary: 'Change a treatment (its `version` as read; 409 when someone changed it since)',
    access: allowed('treatment', 'update'),
    params: idParam,
    body: updateTreatmentBody,
    response: treatment,
    errors: [404, 409, 422],
    handler: ({ req, params, body }) => treatments.update(params.id, body, req.user!, actorOf(req)),
  });
}
