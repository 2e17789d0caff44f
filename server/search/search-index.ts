import type { EntityManager } from 'typeorm';
import { HIGHLIGHT_END, HIGHLIGHT_START } from '../../shared/schemas/artifacts.js';

/**
 * The one full-text index (SQLite FTS5, table `search_documents`). Each kind of record puts a
 * document in it when it is written, inside the same transaction; a list then joins the table by
 * `kind` and `record_id`. Later kinds (condition reports, tour stops) add themselves to SEARCH_KINDS.
 */
export const SEARCH_KINDS = ['artifact'] as const;
export type SearchKind = (typeof SEARCH_KINDS)[number];

export const SEARCH_TABLE = 'search_documents';

export interface SearchDocument {
  kind: SearchKind;
  recordId: number;
  vesselId: number;
  /** Identifiers (object numbers); weighted most. */
  number: string;
  title: string;
  body: string;
  extra: string;
}

/** Column weights for bm25(), in the table's column order (the three unindexed columns first). */
export const RANK_EXPRESSION = `bm25(${SEARCH_TABLE}, 0, 0, 0, 10.0, 5.0, 1.0, 2.0)`;

export function highlightExpression(column: 'title' | 'body' | 'extra'): string {
  const index = { title: 4, body: 5, extra: 6 }[column];
  return `highlight(${SEARCH_TABLE}, ${index}, '${HIGHLIGHT_START}', '${HIGHLIGHT_END}')`;
}

export function snippetExpression(): string {
  // -1: the column with the best match among all; 16 tokens around it.
  return `snippet(${SEARCH_TABLE}, -1, '${HIGHLIGHT_START}', '${HIGHLIGHT_END}', '…', 16)`;
}

/**
 * An FTS5 query for what a person typed: each word becomes a quoted phrase (so no operator or
 * column filter can be injected), all must match, and the last word matches as a prefix.
 * Null when nothing searchable is left.
 */
export function matchExpression(input: string): string | null {
  const words = input
    .split(/\s+/)
    .map((word) => word.trim())
    .filter((word) => /[\p{L}\p{N}]/u.test(word));
  if (words.length === 0) return null;
  return words.map((word, i) => `"${word.replace(/"/g, '""')}"${i === words.length - 1 ? ' *' : ''}`).join(' ');
}

/** Joins the highlight of one number split by the tokenizer (2019.4.12) into one marked run. */
export function mergeHighlights(text: string): string {
  return text.replace(new RegExp(`${HIGHLIGHT_END}([.\\-/])${HIGHLIGHT_START}`, 'g'), '$1');
}

/** Each document's rowid is derived from its kind and record, so replacing one is a lookup, not a scan. */
function rowIdOf(kind: SearchKind, recordId: number): bigint {
  return BigInt(recordId) * 16n + BigInt(SEARCH_KINDS.indexOf(kind));
}

export class SearchIndex {
  constructor(private readonly manager: EntityManager) {}

  async put(doc: SearchDocument): Promise<void> {
    await this.remove(doc.kind, doc.recordId);
    // BigInt binds as INTEGER, so record_id compares with the records' integer keys.
    await this.manager.query(`INSERT INTO ${SEARCH_TABLE} (rowid, kind, record_id, vessel_id, number, title, body, extra) VALUES (?, ?, ?, ?, ?, ?, ?, ?)`, [
      rowIdOf(doc.kind, doc.recordId),
      doc.kind,
      BigInt(doc.recordId),
      BigInt(doc.vesselId),
      doc.number,
      doc.title,
      doc.body,
      doc.extra,
    ]);
  }

  async remove(kind: SearchKind, recordId: number): Promise<void> {
    await this.manager.query(`DELETE FROM ${SEARCH_TABLE} WHERE rowid = ?`, [rowIdOf(kind, recordId)]);
  }
}
