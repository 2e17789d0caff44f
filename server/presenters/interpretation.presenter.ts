import { can } from '../../shared/permissions.js';
import { stableJson } from '../../shared/richtext/plain-text.js';
import { AUDIENCES, INTERPRETATION_PARTS, type Interpretation, type InterpretationSubject, type InterpretationTargets, type InterpretationTexts } from '../../shared/schemas/interpretation.js';
import type { InterpretationEntity } from '../db/entities/interpretation.entity.js';
import type { UserEntity } from '../db/entities/user.entity.js';

const EMPTY: InterpretationTexts = { general: null, families: null, technical: null };

/** Whether two sets of texts hold the same documents (what was written, not when). */
export function sameTexts(a: InterpretationTexts | null, b: InterpretationTexts | null): boolean {
  const docs = (t: InterpretationTexts | null) => stableJson(AUDIENCES.map((aud) => INTERPRETATION_PARTS.map((p) => t?.[aud]?.[p]?.doc ?? null)));
  return docs(a) === docs(b);
}

const person = (user: UserEntity | null | undefined) => (user ? { id: user.id, name: user.name } : null);
const iso = (date: Date | null | undefined) => (date ? date.toISOString() : null);

export function presentInterpretation(input: {
  subject: { type: InterpretationSubject; id: number; vesselId: number; label: string };
  record: InterpretationEntity | null;
  viewer: Express.User;
  targets: InterpretationTargets;
  revisions: number;
}): Interpretation {
  const { subject, record, viewer } = input;
  const state = record?.state ?? 'draft';
  const mayApprove = can(viewer.role, 'interpretation', 'approve');
  const ownDraft = record?.state === 'draft' && record.lastEditedById === viewer.id;
  return {
    subjectType: subject.type,
    subjectId: subject.id,
    vesselId: subject.vesselId,
    subjectLabel: subject.label,
    state,
    draft: record?.draft ?? EMPTY,
    published: record?.published ?? null,
    differsFromPublished: Boolean(record?.published) && !sameTexts(record!.draft, record!.published),
    publishedAt: iso(record?.publishedAt),
    publishedBy: person(record?.publishedBy),
    submittedAt: iso(record?.submittedAt),
    submittedBy: person(record?.submittedBy),
    lastEditedBy: person(record?.lastEditedBy),
    returnComment: record?.returnComment ?? null,
    returnedBy: person(record?.returnedBy),
    returnedAt: iso(record?.returnedAt),
    revisions: input.revisions,
    targets: input.targets,
    updatedAt: iso(record?.updatedAt),
    version: record?.version ?? 0,
    abilities: {
      update: can(viewer.role, 'interpretation', 'update'),
      submit: can(viewer.role, 'interpretation', 'submit') && state === 'draft' && Boolean(record),
      approve: mayApprove && (state === 'in-review' || ownDraft),
      return: can(viewer.role, 'interpretation', 'return') && state === 'in-review',
    },
  };
}
