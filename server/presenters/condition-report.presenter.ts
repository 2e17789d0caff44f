import { cautionsFor } from '../../shared/schemas/hazard-cautions.js';
import type { HazardKind } from '../../shared/schemas/hazards.js';
import { gradeFromFindings } from '../../shared/calc/condition-grade.js';
import { can } from '../../shared/permissions.js';
import type { ConditionReport, ConditionReportSummary, Finding } from '../../shared/schemas/condition.js';
import type { ConditionFindingEntity } from '../db/entities/condition-finding.entity.js';
import type { ConditionReportEntity } from '../db/entities/condition-report.entity.js';

/** Says where a finding is in words (see shared/calc/plan-location.ts). */
export type LocateFinding = (finding: ConditionFindingEntity) => string | null;

export function presentFinding(finding: ConditionFindingEntity, locate: LocateFinding): Finding {
  return {
    id: finding.id,
    reportId: finding.reportId,
    artifactId: finding.artifactId,
    artifactLabel: finding.artifact ? `${finding.artifact.objectNumber} ${finding.artifact.name}` : null,
    agent: finding.agent,
    damageType: finding.damageType,
    location: finding.location,
    locationText: locate(finding),
    extentPercent: finding.extentPercent,
    severity: finding.severity,
    percentRusted: finding.percentRusted,
    rustDistribution: finding.rustDistribution,
    rustGrade: finding.rustGrade,
    description: finding.description,
    recommendedAction: finding.recommendedAction,
    urgency: finding.urgency,
    position: finding.position,
    version: finding.version,
  };
}

export function presentReportSummary(report: ConditionReportEntity, subjectLabel: string, supersededById: number | null, amendmentId: number | null = supersededById): ConditionReportSummary {
  return {
    id: report.id,
    vesselId: report.vesselId,
    subjectType: report.subjectType,
    subjectId: report.subjectId,
    subjectLabel,
    revision: report.revision,
    supersedesId: report.supersedesId,
    supersededById,
    amendmentId,
    status: report.status,
    inspectedOn: report.inspectedOn,
    surveyor: report.surveyor ? { id: report.surveyor.id, name: report.surveyor.name } : null,
    method: report.method,
    summary: report.summary,
    grade: report.grade,
    findingCount: report.findingCount,
    submittedAt: report.submittedAt?.toISOString() ?? null,
    signedBy: report.signedBy,
    updatedAt: report.updatedAt.toISOString(),
  };
}

export function presentReport(report: ConditionReportEntity, subjectLabel: string, supersededById: number | null, findings: ConditionFindingEntity[], amendmentId: number | null, viewer: Express.User, hazardKinds: readonly HazardKind[] = [], openedByIncidentId: number | null = null, locate: LocateFinding = () => null): ConditionReport {
  const draft = report.status === 'draft';
  const readFindings = can(viewer.role, 'conditionReport', 'readFindings');
  return {
    ...presentReportSummary(report, subjectLabel, supersededById, amendmentId),
    temperatureC: report.temperatureC,
    relativeHumidity: report.relativeHumidity,
    computedGrade: report.computedGrade,
    gradeBecause: readFindings ? gradeFromFindings(findings).because : null,
    gradeOverride: report.gradeOverride,
    overrideReason: readFindings ? report.overrideReason : null,
    findings: readFindings ? findings.map((f) => presentFinding(f, locate)) : null,
    subjectHazards: cautionsFor(hazardKinds),
    openedByIncidentId,
    version: report.version,
    abilities: {
      update: draft && can(viewer.role, 'conditionReport', 'update'),
      submit: draft && can(viewer.role, 'conditionReport', 'submit'),
      amend: !draft && supersededById === null && amendmentId === null && can(viewer.role, 'conditionReport', 'amend'),
      delete: draft && can(viewer.role, 'conditionReport', 'delete'),
      readFindings,
    },
  };
}
