import type { Closure, CreateIncidentBody, Incident, IncidentsQuery, UpdateIncidentBody } from '@shared/schemas/incidents';
import type { CreateRiskBody, DeckConditionOverlay, Risk, RisksQuery, UpdateRiskBody } from '@shared/schemas/risks';
import type { ConditionReport, ConditionReportsQuery, CreateConditionReportBody, CreateFindingBody, UpdateConditionReportBody, UpdateFindingBody } from '@shared/schemas/condition';
import type { Page } from '@shared/schemas/common';
import type { ConditionHistory, ConditionReportSummary } from '@shared/schemas/condition';
import { api, apiUrl } from './client';

export const listReports = (params: Partial<ConditionReportsQuery>) => api.get<Page<ConditionReportSummary>>('/condition-reports', params);
export const getReport = (id: number) => api.get<ConditionReport>(`/condition-reports/${id}`);
export const createReport = (body: CreateConditionReportBody) => api.post<ConditionReport>('/condition-reports', body);
export const updateReport = (id: number, body: UpdateConditionReportBody) => api.patch<ConditionReport>(`/condition-reports/${id}`, body);
export const deleteReport = (id: number) => api.delete<void>(`/condition-reports/${id}`);
export const submitReport = (id: number, version: number) => api.post<ConditionReport>(`/condition-reports/${id}/submit`, { version });
export const amendReport = (id: number) => api.post<ConditionReport>(`/condition-reports/${id}/amend`);
export const addFinding = (reportId: number, body: CreateFindingBody) => api.post<ConditionReport>(`/condition-reports/${reportId}/findings`, body);
export const updateFinding = (reportId: number, findingId: number, body: UpdateFindingBody) => api.patch<ConditionReport>(`/condition-reports/${reportId}/findings/${findingId}`, body);
/** Link that downloads the report as a PDF. */
export const reportPdfUrl = (id: number) => apiUrl(`/condition-reports/${id}/pdf`);
/** Grade, rule, summary, hazards and publishable photos: for every role that reads the report. */
export const reportSummaryPdfUrl = (id: number) => apiUrl(`/condition-reports/${id}/summary.pdf`);
export const removeFinding = (reportId: number, findingId: number) => api.delete<ConditionReport>(`/condition-reports/${reportId}/findings/${findingId}`);

export const listIncidents = (params: Partial<IncidentsQuery> & { vesselId: number }) => api.get<Page<Incident>>('/incidents', params);
export const getIncident = (id: number) => api.get<Incident>(`/incidents/${id}`);
export const listClosures = (vesselId: number) => api.get<Closure[]>(`/vessels/${vesselId}/closures`);
export const createIncident = (body: CreateIncidentBody) => api.post<Incident>('/incidents', body);
export const updateIncident = (id: number, body: UpdateIncidentBody) => api.patch<Incident>(`/incidents/${id}`, body);

export const listRisks = (params: Partial<RisksQuery> & { vesselId: number }) => api.get<Page<Risk>>('/risks', params);
export const getRisk = (id: number) => api.get<Risk>(`/risks/${id}`);
export const createRisk = (body: CreateRiskBody) => api.post<Risk>('/risks', body);
export const updateRisk = (id: number, body: UpdateRiskBody) => api.patch<Risk>(`/risks/${id}`, body);
export const deleteRisk = (id: number) => api.delete<void>(`/risks/${id}`);
export const getDeckCondition = (deckId: number) => api.get<DeckConditionOverlay>(`/decks/${deckId}/condition`);
export const getConditionHistory = (subjectType: 'artifact' | 'compartment', subjectId: number) => api.get<ConditionHistory>('/condition-history', { subjectType, subjectId });
