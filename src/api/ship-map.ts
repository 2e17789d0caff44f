import type { Page } from '@shared/schemas/common';
import type { Compartment, CompartmentsQuery, CreateCompartmentBody, UpdateCompartmentBody } from '@shared/schemas/compartments';
import type { CalibrateDeckBody, CreateDeckBody, Deck, UpdateDeckBody } from '@shared/schemas/decks';
import type { CreateHazardBody, Hazard, UpdateHazardBody } from '@shared/schemas/hazards';
import type { DeckPlans, Plan, PlanFit } from '@shared/schemas/plans';
import { api, upload } from './client';

export const listDecks = (vesselId: number) => api.get<Deck[]>(`/vessels/${vesselId}/decks`);
export const createDeck = (vesselId: number, body: CreateDeckBody) => api.post<Deck>(`/vessels/${vesselId}/decks`, body);
export const updateDeck = (id: number, body: UpdateDeckBody) => api.patch<Deck>(`/decks/${id}`, body);
export const deleteDeck = (id: number) => api.delete<void>(`/decks/${id}`);
export const calibrateDeck = (id: number, body: CalibrateDeckBody) => api.post<Deck>(`/decks/${id}/calibration`, body);

export const getDeckPlans = (deckId: number) => api.get<DeckPlans>(`/decks/${deckId}/plan`);
export const uploadPlan = (deckId: number, file: File, onProgress?: (fraction: number) => void) => upload<Plan>(`/decks/${deckId}/plan`, file, onProgress);
export const cancelPlan = (deckId: number, planId: number) => api.post<DeckPlans>(`/decks/${deckId}/plan/${planId}/cancel`);
export const activatePlan = (deckId: number, planId: number, fit: PlanFit) => api.post<DeckPlans>(`/decks/${deckId}/plan/${planId}/activate`, { fit });

export const listCompartments = (vesselId: number, params: Partial<CompartmentsQuery>) =>
  api.get<Page<Compartment>>(`/vessels/${vesselId}/compartments`, params);
/** Every compartment of a vessel, page after page (a vessel may have more than one page of them). */
export async function listAllCompartments(vesselId: number): Promise<Compartment[]> {
  const items: Compartment[] = [];
  for (let page = 1; ; page++) {
    const result = await listCompartments(vesselId, { page, pageSize: 100, sort: 'designation' });
    items.push(...result.items);
    if (items.length >= result.total || result.items.length === 0) return items;
  }
}
export const getCompartment = (id: number) => api.get<Compartment>(`/compartments/${id}`);
export const createCompartment = (vesselId: number, body: CreateCompartmentBody) => api.post<Compartment>(`/vessels/${vesselId}/compartments`, body);
export const updateCompartment = (id: number, body: UpdateCompartmentBody) => api.patch<Compartment>(`/compartments/${id}`, body);
export const deleteCompartment = (id: number) => api.delete<void>(`/compartments/${id}`);

export const listHazards = (compartmentId: number) => api.get<Hazard[]>(`/compartments/${compartmentId}/hazards`);
export const createHazard = (compartmentId: number, body: CreateHazardBody) => api.post<Hazard>(`/compartments/${compartmentId}/hazards`, body);
export const updateHazard = (compartmentId: number, hazardId: number, body: UpdateHazardBody) =>
  api.patch<Hazard>(`/compartments/${compartmentId}/hazards/${hazardId}`, body);
export const deleteHazard = (compartmentId: number, hazardId: number) => api.delete<void>(`/compartments/${compartmentId}/hazards/${hazardId}`);
