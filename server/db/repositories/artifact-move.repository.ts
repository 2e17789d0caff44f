import type { EntityManager } from 'typeorm';
import { ArtifactMoveEntity } from '../entities/artifact-move.entity.js';

export class ArtifactMoveRepository {
  constructor(private readonly manager: EntityManager) {}

  private get repo() {
    return this.manager.getRepository(ArtifactMoveEntity);
  }

  /** Newest first: by date of the move, then by when it was recorded. */
  forArtifact(artifactId: number) {
    return this.repo.find({ where: { artifactId }, relations: { actor: true }, order: { movedOn: 'DESC', id: 'DESC' } });
  }

  create(fields: Omit<ArtifactMoveEntity, 'id' | 'artifact' | 'actor' | 'createdAt'>) {
    return this.repo.save(this.repo.create(fields));
  }
}
