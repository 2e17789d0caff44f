import { GRADE_LABELS, SEVERITY_LABELS } from '../../shared/calc/condition-grade.js';
import { AGENT_LABELS, DAMAGE_TYPES } from '../../shared/schemas/condition.js';
import type { FindingOutcome } from '../../shared/schemas/repair-projects.js';
import type { ConditionFindingEntity } from '../db/entities/condition-finding.entity.js';
import type { ConditionReportEntity } from '../db/entities/condition-report.entity.js';
import type { ProjectLinks } from '../db/repositories/repair-project.repository.js';
import type { Repositories } from '../db/store.js';
import { UnprocessableError } from '../http/errors.js';

type FindingWithReport = ConditionFindingEntity & { report: ConditionReportEntity };

/** Each linked record must exist on the project's vessel; a finding must be of a submitted report. 422 naming the first that is not. */
export async function checkLinks(repos: Repositories, vesselId: number, links: Partial<ProjectLinks>): Promise<void> {
  for (const id of new Set(links.compartmentIds ?? [])) {
    const c = await repos.compartments.findById(id);
    if (!c || c.vesselId !== vesselId) throw new UnprocessableError(`Compartment ${id} is not on this vessel.`, { compartmentIds: `Not a compartment of this vessel: ${id}.` });
  }
  for (const id of new Set(links.artifactIds ?? [])) {
    const a = await repos.artifacts.findById(id);
    if (!a || a.vesselId !== vesselId) throw new UnprocessableError(`Artifact ${id} is not in the collection of this vessel.`, { artifactIds: `Not an artifact of this vessel: ${id}.` });
  }
  for (const id of new Set(links.riskIds ?? [])) {
    const r = await repos.risks.findById(id);
    if (!r || r.vesselId !== vesselId) throw new UnprocessableError(`Risk ${id} is not in the register of this vessel.`, { riskIds: `Not a risk of this vessel: ${id}.` });
  }
  await checkFindings(repos, vesselId, links.findingIds ?? [], 'findingIds');
}

export async function checkFindings(repos: Repositories, vesselId: number, findingIds: number[], field: string): Promise<void> {
  const found = new Map((await repos.treatments.findingsWithReports(findingIds)).map((f) => [f.id, f]));
  for (const id of new Set(findingIds)) {
    const f = found.get(id);
    if (!f || f.report.vesselId !== vesselId) throw new UnprocessableError(`Finding ${id} is not a finding of this vessel.`, { [field]: `Not a finding of this vessel: ${id}.` });
    if (f.report.status !== 'submitted') throw new UnprocessableError(`Finding ${id} is in a draft report; link findings of submitted reports.`, { [field]: `Finding ${id} is not submitted yet.` });
  }
}

/** "Corrosion — General corrosion", the words of a finding in lists. */
export function findingWords(f: Pick<ConditionFindingEntity, 'agent' | 'damageType'>): string {
  return `${DAMAGE_TYPES[f.damageType].label} (${AGENT_LABELS[f.agent].toLowerCase()})`;
}

/** Labels of findings with the subject of their report: "Section loss (water), 5-120-1-E Steering gear room, 2026-09-14". */
export async function findingLabels(repos: Repositories, findings: FindingWithReport[]): Promise<Map<number, { label: string; subjectLabel: string }>> {
  const compartments = await repos.compartments.labels(findings.filter((f) => f.report.subjectType === 'compartment').map((f) => f.report.subjectId));
  const artifacts = await repos.artifacts.labels([...findings.filter((f) => f.report.subjectType === 'artifact').map((f) => f.report.subjectId)]);
  const out = new Map<number, { label: string; subjectLabel: string }>();
  for (const f of findings) {
    const subjectLabel = f.report.subjectType === 'compartment' ? (compartments.get(f.report.subjectId)?.label ?? `Compartment ${f.report.subjectId}`) : (artifacts.get(f.report.subjectId) ?? `Artifact ${f.report.subjectId}`);
    out.set(f.id, { label: `${findingWords(f)}, ${subjectLabel}, ${f.report.inspectedOn}`, subjectLabel });
  }
  return out;
}

/**
 * Per finding: as reported, the last treatment's date, and the next submitted survey of the same
 * subject after the treatment (or after the finding's own survey when untreated), with the findings
 * of the same agent and damage on the same object that it recorded. The finding itself never changes.
 */
export async function findingOutcomes(repos: Repositories, findingIds: number[], treatedOn: Map<number, string>): Promise<FindingOutcome[]> {
  const findings = (await repos.treatments.findingsWithReports(findingIds)) as FindingWithReport[];
  const labels = await findingLabels(repos, findings);
  const order = new Map(findingIds.map((id, i) => [id, i]));
  findings.sort((a, b) => order.get(a.id)! - order.get(b.id)!);
  const out: FindingOutcome[] = [];
  for (const f of findings) {
    const treated = treatedOn.get(f.id) ?? null;
    const after = treated && treated > f.report.inspectedOn ? treated : f.report.inspectedOn;
    const next = await repos.treatments.nextSubmittedReport(f.report.subjectType, f.report.subjectId, after, [f.reportId]);
    const again = next ? (await repos.treatments.findingsOfReport(next.id)).filter((n) => n.agent === f.agent && n.damageType === f.damageType && n.artifactId === f.artifactId) : [];
    out.push({
      finding: {
        id: f.id,
        reportId: f.reportId,
        inspectedOn: f.report.inspectedOn,
        subjectLabel: labels.get(f.id)!.subjectLabel,
        artifactLabel: f.artifact ? `${f.artifact.objectNumber} ${f.artifact.name}` : null,
        agentLabel: AGENT_LABELS[f.agent],
        damageLabel: DAMAGE_TYPES[f.damageType].label,
        severity: f.severity,
        severityLabel: SEVERITY_LABELS[f.severity],
        description: f.description,
        recommendedAction: f.recommendedAction,
      },
      treatedOn: treated,
      next: next
        ? {
            reportId: next.id,
            inspectedOn: next.inspectedOn,
            grade: next.grade,
            gradeLabel: GRADE_LABELS[next.grade],
            summary: next.summary,
            findings: again.map((n) => ({ id: n.id, severityLabel: SEVERITY_LABELS[n.severity], description: n.description })),
          }
        : null,
    });
  }
  return out;
}
