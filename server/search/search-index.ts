import type { EntityManager } from 'typeorm';
import { HIGHLIGHT_END, HIGHLIGHT_START } from '../../shared/schemas/artifacts.js';

/**
 * The one full-text index (SQLite FTS5, table `search_documents`). Each kind of record puts a
 * document in it when it is written, inside the same transaction; a list then joins the table by
 * `kind` and `record_id`. Later kinds (condition reports, tour stops) add themselves to SEARCH_KINDS.
 * A document's kind and vessel are also one indexed token (`scope`), so that narrowing a search to
 * them is a lookup in the index rather than a read of every matching row. Its tokenizer is porter
 * over unicode61 without diacritics (migration SearchStemming): "lamp" finds "lamps", "muller" finds
 * "Müller". A query's words are stemmed the same way, a typed prefix too, so a prefix longer than the
 * stem of the word it begins ("conditio" of "condition", stored as "condit") finds nothing until it
 * is completed.
 */
export const SEARCH_KINDS = ['artifact', 'condition-report', 'interpretation', 'tour', 'tour-stop'] as const;
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

/** Column weights for bm25(), in the table's column order: kind, record_id, vessel_id, scope, number, title, body, extra. */
export const RANK_EXPRESSION = `bm25(${SEARCH_TABLE}, 0, 0, 0, 0, 10.0, 5.0, 1.0, 2.0)`;
const COLUMN_INDEX = { title: 5, body: 6, extra: 7 } as const;

function highlightExpression(column: 'title'): string {
  return `highlight(${SEARCH_TABLE}, ${COLUMN_INDEX[column]}, '${HIGHLIGHT_START}', '${HIGHLIGHT_END}')`;
}

function snippetExpression(column: 'body'): string {
  return `snippet(${SEARCH_TABLE}, ${COLUMN_INDEX[column]}, '${HIGHLIGHT_START}', '${HIGHLIGHT_END}', '…', 16)`;
}

/** The marked title and snippet of a match, as two columns `hl_title` and `hl_snippet`. */
export const HIGHLIGHT_COLUMNS = `${highlightExpression('title')} AS hl_title, ${snippetExpression('body')} AS hl_snippet`;

export interface SearchHit {
  id: number;
  title: string;
  snippet: string;
}

export interface RawHit {
  id: number;
  hl_title: string;
  hl_snippet: string;
}

export function hitOf(row: RawHit): SearchHit {
  return { id: Number(row.id), title: mergeHighlights(row.hl_title), snippet: mergeHighlights(row.hl_snippet) };
}

export function scopeOf(kind: SearchKind, vesselId: number): string {
  return `${kind}${vesselId}`;
}

export type SearchColumn = 'number' | 'title' | 'body' | 'extra';

/** What a person typed (see matchExpression), limited to one kind of record on one vessel, and to some columns. */
export function scopedMatch(kind: SearchKind, vesselId: number, words: string, columns: readonly SearchColumn[] = ['number', 'title', 'body', 'extra']): string {
  return `scope : "${scopeOf(kind, vesselId)}" AND {${columns.join(' ')}} : (${words})`;
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
export function rowIdOf(kind: SearchKind, recordId: number): bigint {
  return BigInt(recordId) * 16n + BigInt(SEARCH_KINDS.indexOf(kind));
}

export class SearchIndex {
  constructor(private readonly manager: EntityManager) {}

  async put(doc: SearchDocument): Promise<void> {
    await this.remove(doc.kind, doc.recordId);
    // BigInt binds as INTEGER, so record_id compares with the records' integer keys.
    await this.manager.query(`INSERT INTO ${SEARCH_TABLE} (rowid, kind, record_id, vessel_id, scope, number, title, body, extra) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?)`, [
      rowIdOf(doc.kind, doc.recordId),
      doc.kind,
      BigInt(doc.recordId),
      BigInt(doc.vesselId),
      scopeOf(doc.kind, doc.vesselId),
      doc.number,
      doc.title,
      doc.body,
      doc.extra,
    ]);
  }

  /** How many documents match a scoped expression. */
  async count(scoped: string): Promise<number> {
    const [row] = (await this.manager.query(`SELECT COUNT(*) AS n FROM ${SEARCH_TABLE} WHERE ${SEARCH_TABLE} MATCH ?`, [scoped])) as { n: number }[];
    return Number(row?.n ?? 0);
  }

  /**
   * One page of matches of a scoped expression, best first (bm25), with `leading` (an exact
   * identifier match) before all others, each with its marked title and body snippet. Used when
   * nothing but the text narrows a list. (SQLite marks only the rows of the page here; asking for
   * marks of given rowids afterwards would run the whole match again.)
   */
  async ranked(kind: SearchKind, scoped: string, leading: number | null, offset: number, limit: number): Promise<SearchHit[]> {
    const rows = (await this.manager.query(
      `SELECT record_id AS id, ${HIGHLIGHT_COLUMNS} FROM ${SEARCH_TABLE} WHERE ${SEARCH_TABLE} MATCH ? ORDER BY rowid = ? DESC, ${RANK_EXPRESSION}, rowid LIMIT ? OFFSET ?`,
      [scoped, leading === null ? -1n : rowIdOf(kind, leading), limit, offset],
    )) as RawHit[];
    return rows.map(hitOf);
  }

  async remove(kind: SearchKind, recordId: number): Promise<void> {
    await this.manager.query(`DELETE FROM ${SEARCH_TABLE} WHERE rowid = ?`, [rowIdOf(kind, recordId)]);
  }
}
