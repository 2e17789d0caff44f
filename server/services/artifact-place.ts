import { ABOARD_STATUSES, STATUS_LABELS } from '../../shared/schemas/artifacts.js';
import { pointInPolygon, type Point } from '../../shared/calc/geometry.js';
import type { ArtifactStatus } from '../../shared/schemas/artifacts.js';
import type { CompartmentEntity } from '../db/entities/compartment.entity.js';
import type { Repositories } from '../db/store.js';
import { UnprocessableError } from '../http/errors.js';

/**
 * Checks where an artifact is said to be: a compartment of its vessel and, optionally, a point on
 * that compartment's deck plan and inside its outline when one is drawn. Returns the compartment.
 */
export async function checkPlace(repos: Repositories, vesselId: number, compartmentId: number | null, point: Point | null, status: ArtifactStatus): Promise<CompartmentEntity | null> {
  if (compartmentId === null) {
    checkUnplaced(point, status);
    return null;
  }
  const compartment = await repos.compartments.findById(compartmentId);
  if (!compartment || compartment.vesselId !== vesselId) throw new UnprocessableError('Choose a compartment of this vessel.', { compartmentId: 'Not a compartment of this vessel.' });
  if (!point) return compartment;
  const deck = compartment.deck;
  if (deck.planWidth === null || deck.planHeight === null) {
    throw new UnprocessableError(`${deck.name} has no plan yet, so there is nowhere to put the point.`, { point: 'No plan on this deck.' });
  }
  const [x, y] = point;
  if (!Number.isFinite(x) || !Number.isFinite(y) || x < 0 || y < 0 || x > deck.planWidth || y > deck.planHeight) {
    throw new UnprocessableError('The point is off the deck plan.', { point: 'Off the plan.' });
  }
  if (compartment.outline && !pointInPolygon(point, compartment.outline)) {
    throw new UnprocessableError(`The point is outside ${compartment.designation} (${compartment.name}). Put it inside the compartment's outline, or choose the compartment it is in.`, {
      point: `Outside ${compartment.designation}.`,
    });
  }
  return compartment;
}

/** The rule for an artifact in no compartment: no point, and not in place (the CSV import checks it row by row). */
export function checkUnplaced(point: Point | null, status: ArtifactStatus): void {
  if (point) throw new UnprocessableError('A point on the plan needs a compartment.', { compartmentId: 'Choose the compartment the point is in.' });
  if (ABOARD_STATUSES.includes(status)) throw new UnprocessableError(`An artifact ${STATUS_LABELS[status].toLowerCase()} is aboard: choose its compartment.`, { compartmentId: 'Choose a compartment, or another status.' });
}
