import { estimateTotals } from '../../shared/calc/estimate.js';
import { repairWorkCautions } from '../../shared/hazard-cautions.js';
import { can } from '../../shared/permissions.js';
import type { HazardCautions } from '../../shared/schemas/hazard-cautions.js';
import { REPAIR_PROJECT_STATUS_LABELS, statusesAfter, type FindingOutcome, type RepairProject, type RepairProjectStatus, type RepairProjectSummary } from '../../shared/schemas/repair-projects.js';
import type { RepairProjectEstimateLineEntity } from '../db/entities/repair-project-estimate-line.entity.js';
import type { RepairProjectStatusChangeEntity } from '../db/entities/repair-project-status-change.entity.js';
import type { RepairProjectEntity } from '../db/entities/repair-project.entity.js';

type Linked = { id: number; label: string };

export interface RepairProjectDetails {
  lines: RepairProjectEstimateLineEntity[];
  changes: RepairProjectStatusChangeEntity[];
  findings: (Linked & { reportId: number })[];
  findingCount: number;
  findingsVisible: boolean;
  findingOutcomes: FindingOutcome[];
  risks: Linked[];
  artifacts: Linked[];
  compartments: (Linked & { deckId: number })[];
  spaceCautions: HazardCautions;
}

/** Approving is the curator's: a conservator takes every other step. */
export function mayMoveTo(role: Express.User['role'], to: RepairProjectStatus): boolean {
  if (!can(role, 'repairProject', 'changeStatus')) return false;
  return to !== 'approved' || role === 'curator';
}

export function presentRepairProjectSummary(project: RepairProjectEntity): RepairProjectSummary {
  return {
    id: project.id,
    vesselId: project.vesselId,
    title: project.title,
    slug: project.slug,
    status: project.status,
    statusLabel: REPAIR_PROJECT_STATUS_LABELS[project.status],
    estimateCents: project.estimateCents,
    contingencyBasisPoints: project.contingencyBasisPoints,
    updatedAt: project.updatedAt.toISOString(),
    version: project.version,
  };
}

export function presentRepairProject(project: RepairProjectEntity, details: RepairProjectDetails, viewer: Express.User): RepairProject {
  const totals = estimateTotals(details.lines, project.contingencyBasisPoints);
  const open = project.status !== 'complete' && project.status !== 'cancelled';
  return {
    ...presentRepairProjectSummary(project),
    scope: project.scope,
    scopeHtml: project.scopeHtml,
    scopeText: project.scopeText,
    lines: details.lines.map((line, i) => ({
      id: line.id,
      position: line.position,
      description: line.description,
      quantityMilli: line.quantityMilli,
      unit: line.unit,
      unitCostCents: line.unitCostCents,
      totalCents: totals.lineTotalsCents[i]!,
    })),
    subtotalCents: totals.subtotalCents,
    contingencyCents: totals.contingencyCents,
    contractorNotes: project.contractorNotes,
    permitNotes: project.permitNotes,
    hotWork: project.hotWork,
    asbestos: project.asbestos,
    leadPaint: project.leadPaint,
    workCautions: repairWorkCautions(project),
    spaceCautions: details.spaceCautions,
    findingsVisible: details.findingsVisible,
    findingCount: details.findingCount,
    findings: details.findings,
    findingOutcomes: details.findingOutcomes,
    risks: details.risks,
    artifacts: details.artifacts,
    compartments: details.compartments,
    statusChanges: details.changes.map((c) => ({
      id: c.id,
      fromStatus: c.fromStatus,
      toStatus: c.toStatus,
      at: c.at.toISOString(),
      by: c.byUser ? { id: c.byUser.id, name: c.byUser.name } : null,
      note: c.note,
    })),
    nextStatuses: statusesAfter(project.status).filter((to) => mayMoveTo(viewer.role, to)),
    createdAt: project.createdAt.toISOString(),
    abilities: {
      update: open && can(viewer.role, 'repairProject', 'update'),
      changeStatus: can(viewer.role, 'repairProject', 'changeStatus'),
      addTreatment: project.status !== 'cancelled' && can(viewer.role, 'treatment', 'create'),
    },
  };
}
