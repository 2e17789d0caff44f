import { expect } from 'vitest';
import type { Store } from '../../server/db/store.js';
import type { Client } from './http.js';

/**
 * A deck with a (stand-in) 2000 × 1000 plan and two drawn compartments side by side:
 * 1-10-1-Q (x 100..900) and 1-40-2-M (x 1000..1900), both y 100..900.
 */
export async function deckWithCompartments(store: Store, curator: Client, vesselId: number) {
  const deckRes = await curator.post(`/api/v1/vessels/${vesselId}/decks`, { name: 'Main deck', levelCode: '1' });
  expect(deckRes.status).toBe(201);
  const deck = (await store.repos.decks.findById(deckRes.body.id))!;
  deck.planWidth = 2000;
  deck.planHeight = 1000;
  await store.repos.decks.save(deck);
  const square = (x0: number, x1: number) => [[x0, 100], [x1, 100], [x1, 900], [x0, 900]];
  const store1 = await curator.post(`/api/v1/vessels/${vesselId}/compartments`, { deckId: deck.id, designation: '1-10-1-Q', name: 'Store room', outline: square(100, 900) });
  const room2 = await curator.post(`/api/v1/vessels/${vesselId}/compartments`, { deckId: deck.id, designation: '1-40-2-M', name: 'Magazine', outline: square(1000, 1900) });
  expect(store1.status).toBe(201);
  expect(room2.status).toBe(201);
  return { deckId: deck.id, first: store1.body.id as number, second: room2.body.id as number };
}

export async function addArtifact(curator: Client, vesselId: number, fields: Record<string, unknown>) {
  const res = await curator.post(`/api/v1/vessels/${vesselId}/artifacts`, { name: 'Test object', category: 'tools', status: fields.compartmentId ? 'in-place' : 'in-store', ...fields });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body;
}
