import Papa from 'papaparse';
import { checkObjectNumber } from '../../shared/calc/object-number.js';
import { ARTIFACT_CSV_COLUMNS, IMPORT_MAX_ROWS, type ImportRow } from '../../shared/schemas/artifact-import.js';
import { ARTIFACT_CATEGORIES, ARTIFACT_STATUSES, CATEGORY_LABELS, createArtifactBody, STATUS_LABELS } from '../../shared/schemas/artifacts.js';
import { characterProblem, withoutInvalidCharacters, type TextKind } from '../../shared/schemas/text.js';
import { ApiError, UnprocessableError } from '../http/errors.js';
import { checkUnplaced } from './artifact-place.js';
import type { CreateArtifactInput } from './artifact.service.js';
import { designationKey } from './compartment.service.js';

/**
 * The CSV import's reading and checking of rows, with no database access: the job
 * (artifact-import.job.ts) gives it the vessel's compartments and the numbers already taken.
 */

type CsvRecord = Record<string, string>;

const FIELD_COLUMNS: Record<string, string> = {
  objectNumber: 'object_number',
  name: 'name',
  category: 'category',
  description: 'description',
  dateOrPeriod: 'date_or_period',
  maker: 'maker',
  materials: 'materials',
  height: 'height',
  width: 'width',
  depth: 'depth',
  dimensionUnit: 'dimension_unit',
  significance: 'significance',
  status: 'status',
  compartmentId: 'compartment',
  point: 'compartment',
};

const KNOWN = new Set<string>(ARTIFACT_CSV_COLUMNS.map((c) => c.name));
/** Columns read on import, with the kind of text each holds (the deck column is ignored). */
const READ_COLUMNS = ARTIFACT_CSV_COLUMNS.map((c) => c.name).filter((c) => c !== 'deck');
const FREE_COLUMNS = new Set<string>(['description', 'significance']);
const kindOf = (column: string): TextKind => (FREE_COLUMNS.has(column) ? 'free' : 'line');
const REQUIRED = ARTIFACT_CSV_COLUMNS.filter((c) => c.required).map((c) => c.name);

function categoryOf(value: string): string {
  const v = value.trim().toLowerCase();
  const byLabel = ARTIFACT_CATEGORIES.find((c) => CATEGORY_LABELS[c].toLowerCase() === v);
  return byLabel ?? v;
}

/** A status as written in a sheet: its code or its label ("In situ", "on display"). */
function statusOf(value: string): string | undefined {
  const v = value.trim().toLowerCase();
  if (!v) return undefined;
  const byLabel = ARTIFACT_STATUSES.find((s) => STATUS_LABELS[s].toLowerCase() === v);
  return byLabel ?? v.replace(/\s+/g, '-');
}

function numberOf(value: string | undefined): number | null | string {
  const v = (value ?? '').trim();
  if (!v) return null;
  const n = Number(v);
  return Number.isFinite(n) ? n : v;
}

/** A compartment as the import needs it: to find it by designation and to label the first move. */
export interface ImportCompartment {
  id: number;
  designation: string;
  name: string;
}

export interface CheckedRow {
  row: ImportRow;
  input: CreateArtifactInput | null;
  objectNumber: string;
  compartment: ImportCompartment | null;
}

export interface ParsedFile {
  records: CsvRecord[];
  fileErrors: string[];
  /** Problems with the file as a whole that stop any import (its rows are not checked). */
  blocking: boolean;
}

/** The file's bytes as text; 415 when they are not UTF-8. */
export function decodeCsv(bytes: Uint8Array): string {
  try {
    return new TextDecoder('utf-8', { fatal: true }).decode(bytes).replace(/^\uFEFF/, '');
  } catch {
    throw new ApiError(415, 'unsupported_media_type', 'The file is not UTF-8 text. Save it as “CSV UTF-8” and try again.', { file: 'Not UTF-8 text.' });
  }
}

export function parseCsv(text: string): ParsedFile {
  const parsed = Papa.parse<CsvRecord>(text, { header: true, skipEmptyLines: 'greedy', transformHeader: (h) => h.trim().toLowerCase() });
  const headers = parsed.meta.fields ?? [];
  const fileErrors: string[] = [];
  const missing = REQUIRED.filter((c) => !headers.includes(c));
  if (missing.length) fileErrors.push(`Missing column${missing.length > 1 ? 's' : ''}: ${missing.join(', ')}.`);
  const unknown = headers.filter((h) => h && !KNOWN.has(h));
  if (unknown.length) fileErrors.push(`Unknown column${unknown.length > 1 ? 's' : ''} (left out): ${unknown.join(', ')}.`);
  for (const error of parsed.errors.slice(0, 5)) fileErrors.push(`Line ${(error.row ?? 0) + 2}: ${error.message}.`);
  if (parsed.data.length > IMPORT_MAX_ROWS) throw new UnprocessableError(`The file has ${parsed.data.length} rows; at most ${IMPORT_MAX_ROWS} are imported at once. Split it into smaller files.`, { file: 'Too many rows.' });
  if (parsed.data.length === 0) fileErrors.push('The file has no rows below its header.');
  return { records: parsed.data, fileErrors, blocking: missing.length > 0 || parsed.errors.length > 0 || parsed.data.length === 0 };
}

/** The object numbers of the rows that follow the pattern, as they would be stored. */
export function numbersOf(records: CsvRecord[], pattern: string): string[] {
  return [...new Set(records.map((r) => checkObjectNumber(r.object_number ?? '', pattern)).flatMap((c) => (c.ok ? [c.value] : [])))];
}

export function checkRows(records: CsvRecord[], pattern: string, compartments: ImportCompartment[], taken: Set<string>): CheckedRow[] {
  const byKey = new Map(compartments.map((c) => [designationKey(c.designation), c]));
  const seen = new Map<string, number>();
  const checked: CheckedRow[] = [];
  for (const [i, record] of records.entries()) {
    const line = i + 2;
    const errors: ImportRow['errors'] = [];
    // A cell with a control or text-direction character is refused with that reason alone.
    const refused = new Set<string>();
    for (const column of READ_COLUMNS) {
      const problem = characterProblem(record[column] ?? '', kindOf(column), 'This cell');
      if (problem) {
        refused.add(column);
        errors.push({ column, message: problem });
      }
    }
    const number = checkObjectNumber(record.object_number ?? '', pattern);
    const numberOk = number.ok && !refused.has('object_number');
    if (!refused.has('object_number')) {
      if (!number.ok) errors.push({ column: 'object_number', message: number.message });
      else if (taken.has(number.value)) errors.push({ column: 'object_number', message: `${number.value} is already in the collection.` });
      else if (seen.has(number.value)) errors.push({ column: 'object_number', message: `${number.value} is also on line ${seen.get(number.value)}.` });
    }
    if (number.ok && numberOk && !seen.has(number.value)) seen.set(number.value, line);
    const designation = (record.compartment ?? '').trim();
    const compartment = designation ? (byKey.get(designationKey(designation)) ?? null) : null;
    if (designation && !compartment && !refused.has('compartment')) errors.push({ column: 'compartment', message: `No compartment ${designation} on this vessel.` });
    const parsed = createArtifactBody.safeParse({
      objectNumber: record.object_number ?? '',
      name: record.name ?? '',
      category: categoryOf(record.category ?? ''),
      description: record.description ?? '',
      dateOrPeriod: record.date_or_period ?? '',
      maker: record.maker ?? '',
      materials: record.materials ?? '',
      height: numberOf(record.height),
      width: numberOf(record.width),
      depth: numberOf(record.depth),
      dimensionUnit: (record.dimension_unit ?? '').trim().toLowerCase() || undefined,
      significance: record.significance ?? '',
      status: statusOf(record.status ?? ''),
      compartmentId: compartment?.id ?? null,
      point: null,
    });
    if (!parsed.success) {
      for (const issue of parsed.error.issues) {
        const column = FIELD_COLUMNS[String(issue.path[0])] ?? String(issue.path[0]);
        if (refused.has(column) || (column === 'object_number' && errors.some((e) => e.column === column))) continue;
        errors.push({ column, message: issue.message });
      }
    } else if (!designation) {
      // A row naming a compartment of this vessel is placed; one naming none must not be in place.
      try {
        checkUnplaced(parsed.data.point, parsed.data.status);
      } catch (err) {
        errors.push({ column: 'compartment', message: (err as Error).message });
      }
    }
    checked.push({
      row: { line, objectNumber: withoutInvalidCharacters(record.object_number ?? '').trim(), name: withoutInvalidCharacters(record.name ?? '').trim(), errors },
      input: parsed.success && errors.length === 0 ? parsed.data : null,
      objectNumber: number.ok && numberOk ? number.value : '',
      compartment,
    });
  }
  return checked;
}
