import { AGENT_LABELS, DAMAGE_TYPES } from '../../shared/schemas/condition.js';
import type { ConditionFindingEntity } from '../db/entities/condition-finding.entity.js';
import type { ConditionReportEntity } from '../db/entities/condition-report.entity.js';
import type { Repositories } from '../db/store.js';
import type { SearchDocument } from './search-index.js';

/** A condition report as the search sees it: its subject's label in the title, its findings in the body. */
export function conditionReportDocument(report: ConditionReportEntity, subjectLabel: string, findings: ConditionFindingEntity[]): SearchDocument {
  return {
    kind: 'condition-report',
    recordId: report.id,
    vesselId: report.vesselId,
    number: `CR-${report.id}`,
    title: `${subjectLabel}, ${report.inspectedOn}`,
    body: [report.summary, ...findings.flatMap((f) => [DAMAGE_TYPES[f.damageType].label, f.description, f.recommendedAction])].filter(Boolean).join('\n'),
    extra: [...new Set(findings.map((f) => AGENT_LABELS[f.agent]))].join(' · '),
  };
}

/** Rewrites the search documents of a subject's reports after the subject's label changed (same transaction). */
export async function reindexReportsOf(repos: Repositories, subjectType: 'artifact' | 'compartment', subjectId: number, subjectLabel: string) {
  for (const report of await repos.conditionReports.forSubject(subjectType, subjectId)) {
    await repos.search.put(conditionReportDocument(report, subjectLabel, await repos.conditionReports.findings(report.id)));
  }
}
