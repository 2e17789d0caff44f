import type { ConditionReport, ConditionReportsQuery, CreateConditionReportBody, CreateFindingBody, UpdateConditionReportBody, UpdateFindingBody } from '@shared/schemas/condition';
import type { Page } from '@shared/schemas/common';
import type { ConditionReportSummary } from '@shared/schemas/condition';
import { api } from './client';

export const listReports = (params: Partial<ConditionReportsQuery>) => api.get<Page<ConditionReportSummary>>('/condition-reports', params);
export const getReport = (id: number) => api.get<ConditionReport>(`/condition-reports/${id}`);
export const createReport = (body: CreateConditionReportBody) => api.post<ConditionReport>('/condition-reports', body);
export const updateReport = (id: number, body: UpdateConditionReportBody) => api.patch<ConditionReport>(`/condition-reports/${id}`, body);
export const deleteReport = (id: number) => api.delete<void>(`/condition-reports/${id}`);
export const submitReport = (id: number, version: number) => api.post<ConditionReport>(`/condition-reports/${id}/submit`, { version });
export const amendReport = (id: number) => api.post<ConditionReport>(`/condition-reports/${id}/amend`);
export const addFinding = (reportId: number, body: CreateFindingBody) => api.post<ConditionReport>(`/condition-reports/${reportId}/findings`, body);
export const updateFinding = (reportId: number, findingId: number, body: UpdateFindingBody) => api.patch<ConditionReport>(`/condition-reports/${reportId}/findings/${findingId}`, body);
export const removeFinding = (reportId: number, findingId: number) => api.delete<ConditionReport>(`/condition-reports/${reportId}/findings/${findingId}`);
