import type { Closure, PublicClosure } from '../../shared/schemas/incidents.js';
import type { Store } from '../db/store.js';

/**
 * Spaces closed to visitors now by an incident: closed by it and not opened again since. The
 * latest incident that closed a space gives the date and the public line.
 */
export class ClosureService {
  constructor(private readonly store: Store) {}

  async current(vesselId?: number): Promise<Closure[]> {
    const repos = this.store.repos;
    const seen = new Set<number>();
    const out: Closure[] = [];
    for (const incident of await repos.incidents.closing(vesselId)) {
      for (const id of incident.closedCompartmentIds) {
        if (seen.has(id)) continue;
        seen.add(id);
        const compartment = await repos.compartments.findById(id);
        if (!compartment || compartment.accessStatus !== 'staff-only') continue;
        out.push({ compartmentId: id, label: `${compartment.designation} ${compartment.name}`, since: incident.foundOn, reason: incident.publicNote, incidentId: incident.id });
      }
    }
    return out;
  }

  async publicFor(vesselId: number): Promise<PublicClosure[]> {
    const repos = this.store.repos;
    const closures = await this.current(vesselId);
    const names = await Promise.all(closures.map(async (c) => (await repos.compartments.findById(c.compartmentId))?.name ?? ''));
    return closures.map((c, i) => ({ space: names[i]!, since: c.since, reason: c.reason }));
  }
}
