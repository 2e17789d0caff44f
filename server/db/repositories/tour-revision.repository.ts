import type { EntityManager } from 'typeorm';
import { TourCommentEntity } from '../entities/tour-comment.entity.js';
import { TourRevisionEntity } from '../entities/tour-revision.entity.js';

/** A tour's revisions and its review comments. */
export class TourRevisionRepository {
  constructor(private readonly manager: EntityManager) {}

  private get repo() {
    return this.manager.getRepository(TourRevisionEntity);
  }

  private get comments() {
    return this.manager.getRepository(TourCommentEntity);
  }

  add(fields: Pick<TourRevisionEntity, 'tourId' | 'number' | 'note' | 'snapshot' | 'authorId'>) {
    return this.repo.save(this.repo.create(fields));
  }

  /** Newest first. */
  listFor(tourId: number) {
    return this.repo.find({ where: { tourId }, relations: { author: true }, order: { number: 'DESC' } });
  }

  find(tourId: number, number: number) {
    return this.repo.findOne({ where: { tourId, number }, relations: { author: true } });
  }

  addComment(fields: Pick<TourCommentEntity, 'tourId' | 'stopId' | 'body' | 'revision' | 'authorId'>) {
    return this.comments.save(this.comments.create(fields));
  }

  commentsFor(tourId: number) {
    return this.comments.find({ where: { tourId }, relations: { author: true }, order: { createdAt: 'ASC', id: 'ASC' } });
  }

  /** Comments made on one revision (those a return sends back). */
  commentsOn(tourId: number, revision: number) {
    return this.comments.find({ where: { tourId, revision }, relations: { author: true }, order: { id: 'ASC' } });
  }
}
