import type { PublicTour } from '@shared/schemas/tours';
import { api } from './client';

type PublicTourSummary = Omit<PublicTour, 'stops'>;

export const listPublicTours = () => api.get<PublicTourSummary[]>('/visit/tours');
export const fetchPublicTour = (slug: string) => api.get<PublicTour>(`/visit/tours/${encodeURIComponent(slug)}`);
