import type { Page } from '@shared/schemas/common';
import type { Media } from '@shared/schemas/media';
import type { CreateStopBody, CreateTourBody, PublishCheck, RevisionCompare, Tour, TourComment, TourRevisionSummary, TourListItem, ToursQuery, TourRouteSettings, UpdateStopBody, UpdateTourBody, UpdateTourRouteSettingsBody } from '@shared/schemas/tours';
import { api, apiUrl, upload } from './client';

export const listTours = (vesselId: number, params: Partial<ToursQuery>) => api.get<Page<TourListItem>>(`/vessels/${vesselId}/tours`, params);
export const createTour = (vesselId: number, body: CreateTourBody) => api.post<Tour>(`/vessels/${vesselId}/tours`, body);
export const getTour = (id: number) => api.get<Tour>(`/tours/${id}`);
export const updateTour = (id: number, body: UpdateTourBody) => api.patch<Tour>(`/tours/${id}`, body);
export const createStop = (id: number, body: CreateStopBody) => api.post<Tour>(`/tours/${id}/stops`, body);
export const updateStop = (id: number, stopId: number, body: UpdateStopBody) => api.patch<Tour>(`/tours/${id}/stops/${stopId}`, body);
export const deleteStop = (id: number, stopId: number) => api.delete<Tour>(`/tours/${id}/stops/${stopId}`);
export const reorderStops = (id: number, stopIds: number[]) => api.put<Tour>(`/tours/${id}/stop-order`, { stopIds });
export const uploadAudio = (id: number, file: File, onProgress?: (fraction: number) => void) => upload<Media>(`/tours/${id}/audio`, file, onProgress);

export const publishCheck = (id: number) => api.get<PublishCheck>(`/tours/${id}/publish-check`);
export const submitTour = (id: number, version: number) => api.post<Tour>(`/tours/${id}/submit`, { version });
export const approveTour = (id: number, version: number, comment: string) => api.post<{ tour: Tour; warnings: PublishCheck['warnings'] }>(`/tours/${id}/approve`, { version, comment });
export const returnTour = (id: number, version: number, comment: string) => api.post<Tour>(`/tours/${id}/return`, { version, comment });
export const retireTour = (id: number, version: number) => api.post<Tour>(`/tours/${id}/retire`, { version });
export const listComments = (id: number) => api.get<TourComment[]>(`/tours/${id}/comments`);
export const addComment = (id: number, stopId: number | null, body: string) => api.post<TourComment>(`/tours/${id}/comments`, { stopId, body });

export const listRevisions = (id: number) => api.get<TourRevisionSummary[]>(`/tours/${id}/revisions`);
export const compareRevisions = (id: number, from: number, to: number) => api.get<RevisionCompare>(`/tours/${id}/revisions/compare`, { from, to });
export const restoreRevision = (id: number, number: number, version: number) => api.post<Tour>(`/tours/${id}/revisions/${number}/restore`, { version });

export const placardsUrl = (id: number, query: { stop?: number; sheet?: 'true' } = {}) => apiUrl(`/tours/${id}/placards.pdf`, query);
export const getRouteSettings = (vesselId: number) => api.get<TourRouteSettings>(`/vessels/${vesselId}/tour-route-settings`);
export const updateRouteSettings = (vesselId: number, body: UpdateTourRouteSettingsBody) => api.put<TourRouteSettings>(`/vessels/${vesselId}/tour-route-settings`, body);
