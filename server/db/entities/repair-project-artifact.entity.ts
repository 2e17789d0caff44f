import { Entity, Index, JoinColumn, ManyToOne, PrimaryColumn, type Relation } from 'typeorm';
import { ArtifactEntity } from './artifact.entity.js';
import { RepairProjectEntity } from './repair-project.entity.js';

/** An artifact the project works on. */
@Entity('repair_project_artifact')
export class RepairProjectArtifactEntity {
  @PrimaryColumn({ type: 'integer' })
  projectId: number;

  @ManyToOne(() => RepairProjectEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'projectId' })
  project: Relation<RepairProjectEntity>;

  @Index()
  @PrimaryColumn({ type: 'integer' })
  artifactId: number;

  @ManyToOne(() => ArtifactEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'artifactId' })
  target: Relation<ArtifactEntity>;
}
