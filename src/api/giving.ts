import type { Appeal, SaveAppealBody } from '@shared/schemas/appeals';
import type { CheckoutBody, Donation, DonationStatus, GivingTotals } from '@shared/schemas/donations';
import type { Page } from '@shared/schemas/common';
import type { PublicAppeal, PublicAppealSummary, PublicGiftStatus } from '@shared/schemas/visit';
import { api, apiUrl } from './client';

// The visitor's side
export const listPublicAppeals = () => api.get<{ items: PublicAppealSummary[] }>('/visit/appeals');
export const fetchPublicAppeal = (slug: string) => api.get<PublicAppeal>(`/visit/appeals/${encodeURIComponent(slug)}`);
export const startCheckout = (slug: string, body: CheckoutBody) => api.post<{ url: string }>(`/visit/appeals/${encodeURIComponent(slug)}/checkout`, body);
export const fetchGiftStatus = (sessionId: string) => api.get<PublicGiftStatus>(`/visit/gifts/${encodeURIComponent(sessionId)}`);

// The fundraiser's side
export interface DonationListParams {
  vesselId: number;
  page: number;
  pageSize: number;
  sort: string;
  q?: string;
  status?: DonationStatus;
  repairProjectId?: number;
  from?: string;
  to?: string;
}

export const listDonations = (params: DonationListParams) => api.get<Page<Donation>>('/donations', { ...params });
export const donationsExportUrl = (params: Omit<DonationListParams, 'page' | 'pageSize' | 'sort'>) => apiUrl('/donations/export', { ...params });
export const refundDonation = (id: number, body: { amountCents?: number; reason: string; version: number }) => api.post<Donation>(`/donations/${id}/refund`, body);
export const fetchGivingTotals = (vesselId: number) => api.get<GivingTotals>(`/vessels/${vesselId}/giving/totals`);
export const listAppeals = (vesselId: number) => api.get<Appeal[]>(`/vessels/${vesselId}/appeals`);
export const fetchAppeal = (repairProjectId: number) => api.get<Appeal>(`/repair-projects/${repairProjectId}/appeal`);
export const saveAppeal = (repairProjectId: number, body: SaveAppealBody) => api.put<Appeal>(`/repair-projects/${repairProjectId}/appeal`, body);
