import { ArtifactMoveEntity } from './artifact-move.entity.js';
import { ArtifactEntity } from './artifact.entity.js';
import { ConditionFindingEntity } from './condition-finding.entity.js';
import { ConditionReportEntity } from './condition-report.entity.js';
import { IncidentSubjectEntity } from './incident-subject.entity.js';
import { IncidentEntity } from './incident.entity.js';
import { RiskSubjectEntity } from './risk-subject.entity.js';
import { RiskEntity } from './risk.entity.js';
import { AuditEventEntity } from './audit-event.entity.js';
import { CompartmentEntity } from './compartment.entity.js';
import { DeckEntity } from './deck.entity.js';
import { HazardEntity } from './hazard.entity.js';
import { MediaEntity } from './media.entity.js';
import { InvitationEntity } from './invitation.entity.js';
import { OrganisationSettingsEntity } from './organisation-settings.entity.js';
import { PasswordResetEntity } from './password-reset.entity.js';
import { PlanEntity } from './plan.entity.js';
import { SessionEntity } from './session.entity.js';
import { UserEntity } from './user.entity.js';
import { VesselEntity } from './vessel.entity.js';
import { TourEntity } from './tour.entity.js';
import { TourStopEntity } from './tour-stop.entity.js';
import { TourRevisionEntity } from './tour-revision.entity.js';
import { TourCommentEntity } from './tour-comment.entity.js';
import { TourRouteSettingsEntity } from './tour-route-settings.entity.js';

export { RiskEntity, RiskSubjectEntity, IncidentEntity, IncidentSubjectEntity, ConditionReportEntity, ConditionFindingEntity, ArtifactEntity, ArtifactMoveEntity, MediaEntity, AuditEventEntity, CompartmentEntity, DeckEntity, HazardEntity, InvitationEntity, OrganisationSettingsEntity, PasswordResetEntity, PlanEntity, SessionEntity, UserEntity, VesselEntity, TourEntity, TourStopEntity, TourRevisionEntity, TourCommentEntity, TourRouteSettingsEntity };

export const entities = [UserEntity, VesselEntity, OrganisationSettingsEntity, AuditEventEntity, SessionEntity, InvitationEntity, PasswordResetEntity, DeckEntity, CompartmentEntity, HazardEntity, PlanEntity, ArtifactEntity, ArtifactMoveEntity, MediaEntity, ConditionReportEntity, ConditionFindingEntity, IncidentEntity, IncidentSubjectEntity, RiskEntity, RiskSubjectEntity, TourEntity, TourStopEntity, TourRevisionEntity, TourCommentEntity, TourRouteSettingsEntity];
