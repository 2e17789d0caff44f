import type { EntityManager } from 'typeorm';
import type { InterpretationSubject } from '../../../shared/schemas/interpretation.js';
import { InterpretationRevisionEntity } from '../entities/interpretation-revision.entity.js';
import { InterpretationEntity } from '../entities/interpretation.entity.js';

const PEOPLE = { publishedBy: true, submittedBy: true, lastEditedBy: true, returnedBy: true } as const;

export class InterpretationRepository {
  constructor(private readonly manager: EntityManager) {}

  private get repo() {
    return this.manager.getRepository(InterpretationEntity);
  }

  private get revisions() {
    return this.manager.getRepository(InterpretationRevisionEntity);
  }

  findFor(subjectType: InterpretationSubject, subjectId: number) {
    return this.repo.findOne({ where: { subjectType, subjectId }, relations: PEOPLE });
  }

  /** The row alone, to change: with its people loaded, TypeORM would write their old ids back over the new ones. */
  findForChange(subjectType: InterpretationSubject, subjectId: number) {
    return this.repo.findOneBy({ subjectType, subjectId });
  }

  create(fields: Partial<InterpretationEntity>) {
    return this.repo.save(this.repo.create(fields));
  }

  save(record: InterpretationEntity) {
    return this.repo.save(record);
  }

  addRevision(fields: Omit<InterpretationRevisionEntity, 'id' | 'interpretation' | 'savedBy'>) {
    return this.revisions.save(this.revisions.create(fields));
  }

  revisionCount(interpretationId: number) {
    return this.revisions.countBy({ interpretationId });
  }

  /** Removes a subject's interpretation and its revisions (a compartment deleted). */
  async removeFor(subjectType: InterpretationSubject, subjectId: number) {
    await this.repo.delete({ subjectType, subjectId });
  }
}
