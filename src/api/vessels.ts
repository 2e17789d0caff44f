import type { Page } from '@shared/schemas/common';
import type { CreateVesselBody, UpdateVesselBody, Vessel } from '@shared/schemas/vessels';
import type { VisitSite } from '@shared/schemas/visit';
import { api } from './client';

export const listVessels = (params: { page: number; pageSize: number; sort: string; includeArchived?: boolean }) =>
  api.get<Page<Vessel>>('/vessels', { ...params, includeArchived: params.includeArchived ? 'true' : undefined });
export const getVessel = (id: number) => api.get<Vessel>(`/vessels/${id}`);
export const createVessel = (body: CreateVesselBody) => api.post<Vessel>('/vessels', body);
export const updateVessel = (id: number, body: UpdateVesselBody) => api.patch<Vessel>(`/vessels/${id}`, body);
export const archiveVessel = (id: number) => api.post<Vessel>(`/vessels/${id}/archive`);
export const restoreVessel = (id: number) => api.post<Vessel>(`/vessels/${id}/restore`);
export const fetchVisitSite = () => api.get<VisitSite>('/visit/site');
