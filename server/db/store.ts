import type { DataSource, EntityManager } from 'typeorm';
import { AppealRepository } from './repositories/appeal.repository.js';
import { DonationRepository } from './repositories/donation.repository.js';
import { ArtifactMoveRepository } from './repositories/artifact-move.repository.js';
import { ArtifactRepository } from './repositories/artifact.repository.js';
import { ConditionReportRepository } from './repositories/condition-report.repository.js';
import { IncidentRepository } from './repositories/incident.repository.js';
import { InterpretationRepository } from './repositories/interpretation.repository.js';
import { RiskRepository } from './repositories/risk.repository.js';
import { RepairProjectRepository } from './repositories/repair-project.repository.js';
import { TreatmentRepository } from './repositories/treatment.repository.js';
import { AuditEventRepository } from './repositories/audit-event.repository.js';
import { CompartmentRepository } from './repositories/compartment.repository.js';
import { DeckRepository } from './repositories/deck.repository.js';
import { HazardRepository } from './repositories/hazard.repository.js';
import { InvitationRepository } from './repositories/invitation.repository.js';
import { MediaRepository } from './repositories/media.repository.js';
import { PasswordResetRepository } from './repositories/password-reset.repository.js';
import { PlanRepository } from './repositories/plan.repository.js';
import { SettingsRepository } from './repositories/settings.repository.js';
import { UserRepository } from './repositories/user.repository.js';
import { VesselRepository } from './repositories/vessel.repository.js';
import { TourRepository } from './repositories/tour.repository.js';
import { TourStopRepository } from './repositories/tour-stop.repository.js';
import { TourRevisionRepository } from './repositories/tour-revision.repository.js';
import { TourRouteSettingsRepository } from './repositories/tour-route-settings.repository.js';
import { SearchIndex } from '../search/search-index.js';
import { writeLock } from './write-lock.js';

export interface Repositories {
  users: UserRepository;
  invitations: InvitationRepository;
  passwordResets: PasswordResetRepository;
  vessels: VesselRepository;
  auditEvents: AuditEventRepository;
  settings: SettingsRepository;
  decks: DeckRepository;
  compartments: CompartmentRepository;
  hazards: HazardRepository;
  plans: PlanRepository;
  artifacts: ArtifactRepository;
  artifactMoves: ArtifactMoveRepository;
  media: MediaRepository;
  search: SearchIndex;
  conditionReports: ConditionReportRepository;
  incidents: IncidentRepository;
  risks: RiskRepository;
  tours: TourRepository;
  tourStops: TourStopRepository;
  tourRevisions: TourRevisionRepository;
  tourRouteSettings: TourRouteSettingsRepository;
  repairProjects: RepairProjectRepository;
  treatments: TreatmentRepository;
  appeals: AppealRepository;
  donations: DonationRepository;
  interpretations: InterpretationRepository;
}

function repositories(manager: EntityManager): Repositories {
  return {
    users: new UserRepository(manager),
    invitations: new InvitationRepository(manager),
    passwordResets: new PasswordResetRepository(manager),
    vessels: new VesselRepository(manager),
    auditEvents: new AuditEventRepository(manager),
    settings: new SettingsRepository(manager),
    decks: new DeckRepository(manager),
    compartments: new CompartmentRepository(manager),
    hazards: new HazardRepository(manager),
    plans: new PlanRepository(manager),
    artifacts: new ArtifactRepository(manager),
    artifactMoves: new ArtifactMoveRepository(manager),
    media: new MediaRepository(manager),
    search: new SearchIndex(manager),
    conditionReports: new ConditionReportRepository(manager),
    incidents: new IncidentRepository(manager),
    risks: new RiskRepository(manager),
    tours: new TourRepository(manager),
    tourStops: new TourStopRepository(manager),
    tourRevisions: new TourRevisionRepository(manager),
    tourRouteSettings: new TourRouteSettingsRepository(manager),
    repairProjects: new RepairProjectRepository(manager),
    treatments: new TreatmentRepository(manager),
    appeals: new AppealRepository(manager),
    donations: new DonationRepository(manager),
    interpretations: new InterpretationRepository(manager),
  };
}

/** Repositories outside a transaction, and a way to run a change in one. */
export class Store {
  readonly repos: Repositories;

  constructor(readonly dataSource: DataSource) {
    this.repos = repositories(dataSource.manager);
  }

  /** The database file, for a job on a worker thread that opens a connection of its own. */
  get databasePath(): string {
    return this.dataSource.options.database as string;
  }

  /**
   * Runs work that writes through a connection of its own (a job on a worker thread) while no
   * other change of the app runs: it holds the same lock as transaction().
   */
  exclusive<T>(work: () => Promise<T>): Promise<T> {
    return writeLock(this.dataSource).run(work);
  }

  /** Runs a change in one transaction, one at a time; nothing but database work may wait inside it. */
  transaction<T>(work: (repos: Repositories) => Promise<T>): Promise<T> {
    return writeLock(this.dataSource).run(() => this.dataSource.transaction((manager) => work(repositories(manager))));
  }
}
