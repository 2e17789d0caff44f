import type { Page } from '@shared/schemas/common';
import type { ChangeRepairProjectStatusBody, CreateRepairProjectBody, RepairProject, RepairProjectsQuery, RepairProjectSummary, UpdateRepairProjectBody } from '@shared/schemas/repair-projects';
import type { CreateTreatmentBody, Treatment, UpdateTreatmentBody } from '@shared/schemas/treatments';
import { api } from './client';

export const listRepairProjects = (vesselId: number, params: Partial<RepairProjectsQuery>) => api.get<Page<RepairProjectSummary>>(`/vessels/${vesselId}/repair-projects`, params);
export const getRepairProject = (id: number) => api.get<RepairProject>(`/repair-projects/${id}`);
export const createRepairProject = (vesselId: number, body: CreateRepairProjectBody) => api.post<RepairProject>(`/vessels/${vesselId}/repair-projects`, body);
export const updateRepairProject = (id: number, body: UpdateRepairProjectBody) => api.patch<RepairProject>(`/repair-projects/${id}`, body);
export const changeRepairProjectStatus = (id: number, body: ChangeRepairProjectStatusBody) => api.post<RepairProject>(`/repair-projects/${id}/status`, body);

export const listTreatments = (projectId: number) => api.get<Treatment[]>(`/repair-projects/${projectId}/treatments`);
export const createTreatment = (projectId: number, body: CreateTreatmentBody) => api.post<Treatment>(`/repair-projects/${projectId}/treatments`, body);
export const updateTreatment = (id: number, body: UpdateTreatmentBody) => api.patch<Treatment>(`/treatments/${id}`, body);
