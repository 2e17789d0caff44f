import type { Interpretation, InterpretationPage, InterpretationRevision, InterpretationsQuery, InterpretationSubject, SaveInterpretationBody } from '@shared/schemas/interpretation';
import { api } from './client';

const base = (type: InterpretationSubject, id: number) => `/${type === 'artifact' ? 'artifacts' : 'compartments'}/${id}/interpretation`;

export const getInterpretation = (type: InterpretationSubject, id: number) => api.get<Interpretation>(base(type, id));
export const saveInterpretation = (type: InterpretationSubject, id: number, body: SaveInterpretationBody) => api.put<Interpretation>(base(type, id), body);
export const submitInterpretation = (type: InterpretationSubject, id: number, version: number) => api.post<Interpretation>(`${base(type, id)}/submit`, { version });
export const approveInterpretation = (type: InterpretationSubject, id: number, version: number) => api.post<Interpretation>(`${base(type, id)}/approve`, { version });
export const returnInterpretation = (type: InterpretationSubject, id: number, version: number, comment: string) =>
  api.post<Interpretation>(`${base(type, id)}/return`, { version, comment });

export const listInterpretations = (vesselId: number, params: Partial<InterpretationsQuery>) => api.get<InterpretationPage>(`/vessels/${vesselId}/interpretations`, params);
export const listInterpretationRevisions = (type: InterpretationSubject, id: number) => api.get<InterpretationRevision[]>(`${base(type, id)}/revisions`);
export const restoreInterpretationRevision = (type: InterpretationSubject, id: number, number: number, version: number) =>
  api.post<Interpretation>(`${base(type, id)}/revisions/${number}/restore`, { version });
