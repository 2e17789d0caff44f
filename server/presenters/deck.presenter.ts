import { can } from '../../shared/permissions.js';
import type { Deck } from '../../shared/schemas/decks.js';
import type { DeckEntity } from '../db/entities/deck.entity.js';

export function presentDeck(deck: DeckEntity, compartmentCount: number, viewer: Express.User): Deck {
  return {
    id: deck.id,
    vesselId: deck.vesselId,
    name: deck.name,
    position: deck.position,
    levelCode: deck.levelCode,
    calibration: deck.calibration && deck.metresPerUnit ? { ...deck.calibration, metresPerUnit: deck.metresPerUnit } : null,
    centerlineY: deck.centerlineY,
    frames: deck.frames,
    bowTo: deck.bowTo,
    compartmentCount,
    version: deck.version,
    abilities: {
      update: can(viewer.role, 'deck', 'update'),
      delete: compartmentCount === 0 && can(viewer.role, 'deck', 'delete'),
    },
  };
}
