import { In, type EntityManager } from 'typeorm';
import type { IncidentsQuery } from '../../../shared/schemas/incidents.js';
import { IncidentSubjectEntity } from '../entities/incident-subject.entity.js';
import { IncidentEntity } from '../entities/incident.entity.js';
import { pageOf } from './paging.js';

export class IncidentRepository {
  constructor(private readonly manager: EntityManager) {}

  private get repo() {
    return this.manager.getRepository(IncidentEntity);
  }

  private get subjects() {
    return this.manager.getRepository(IncidentSubjectEntity);
  }

  findById(id: number) {
    return this.repo.findOne({ where: { id }, relations: { loggedBy: true } });
  }

  page(query: IncidentsQuery) {
    const qb = this.repo.createQueryBuilder('incident').leftJoinAndSelect('incident.loggedBy', 'loggedBy').where('incident.vesselId = :vesselId', { vesselId: query.vesselId });
    if (query.kind) qb.andWhere('incident.kind = :kind', { kind: query.kind });
    for (const [type, id] of [['artifact', query.artifactId], ['compartment', query.compartmentId]] as const) {
      if (!id) continue;
      qb.andWhere(`incident.id IN (SELECT s.incidentId FROM incident_subjects s WHERE s.subjectType = :${type}Type AND s.subjectId = :${type}Id)`, { [`${type}Type`]: type, [`${type}Id`]: id });
    }
    return pageOf(qb, query);
  }

  /** Incidents that closed spaces, newest first; of one vessel or of all. */
  closing(vesselId?: number) {
    const qb = this.repo.createQueryBuilder('incident').where(`incident.closedCompartmentIds != '[]'`);
    if (vesselId !== undefined) qb.andWhere('incident.vesselId = :vesselId', { vesselId });
    return qb.orderBy('incident.foundOn', 'DESC').addOrderBy('incident.id', 'DESC').getMany();
  }

  /** Incidents that affected a subject, newest first. */
  forSubject(subjectType: 'artifact' | 'compartment', subjectId: number) {
    return this.repo
      .createQueryBuilder('incident')
      .where('incident.id IN (SELECT s.incidentId FROM incident_subjects s WHERE s.subjectType = :subjectType AND s.subjectId = :subjectId)', { subjectType, subjectId })
      .orderBy('incident.foundOn', 'DESC')
      .getMany();
  }

  subjectsOf(incidentIds: number[]) {
    return incidentIds.length ? this.subjects.find({ where: { incidentId: In(incidentIds) } }) : Promise.resolve([]);
  }

  create(fields: Partial<IncidentEntity>) {
    return this.repo.save(this.repo.create(fields));
  }

  save(incident: IncidentEntity) {
    return this.repo.save(incident);
  }

  async link(incidentId: number, subjectType: 'artifact' | 'compartment', subjectId: number) {
    await this.subjects.save(this.subjects.create({ incidentId, subjectType, subjectId }));
  }
}
