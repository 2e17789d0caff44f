import { readFile, unlink } from 'node:fs/promises';
import Papa from 'papaparse';
import { checkObjectNumber } from '../../shared/calc/object-number.js';
import { ARTIFACT_CSV_COLUMNS, IMPORT_MAX_ROWS, type ImportMode, type ImportResult, type ImportRow } from '../../shared/schemas/artifact-import.js';
import { ARTIFACT_CATEGORIES, CATEGORY_LABELS, type ArtifactFilters, createArtifactBody } from '../../shared/schemas/artifacts.js';
import { characterProblem, withoutInvalidCharacters, type TextKind } from '../../shared/schemas/text.js';
import type { CompartmentEntity } from '../db/entities/compartment.entity.js';
import type { Repositories, Store } from '../db/store.js';
import { ApiError, NotFoundError, UnprocessableError, ValidationError } from '../http/errors.js';
import { checkPlace } from './artifact-place.js';
import { insertArtifact, type CreateArtifactInput } from './artifact.service.js';
import { recordAudit, type Actor } from './audit.service.js';
import { designationKey } from './compartment.service.js';
import type { UploadedFile } from './plan.service.js';

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

function numberOf(value: string | undefined): number | null | string {
  const v = (value ?? '').trim();
  if (!v) return null;
  const n = Number(v);
  return Number.isFinite(n) ? n : v;
}

interface CheckedRow {
  row: ImportRow;
  input: CreateArtifactInput | null;
  objectNumber: string;
  compartment: CompartmentEntity | null;
}

/**
 * CSV import of artifacts in two steps (a preview that writes nothing, then all rows or only the
 * valid ones, in one transaction) and CSV export of a filtered list.
 */
export class ArtifactImportService {
  constructor(private readonly store: Store) {}

  private async readCsv(file: UploadedFile | undefined): Promise<string> {
    if (!file) throw new ValidationError({ file: 'Choose a CSV file to import.' });
    try {
      const bytes = await readFile(file.path);
      try {
        return new TextDecoder('utf-8', { fatal: true }).decode(bytes).replace(/^\uFEFF/, '');
      } catch {
        throw new ApiError(415, 'unsupported_media_type', 'The file is not UTF-8 text. Save it as “CSV UTF-8” and try again.', { file: 'Not UTF-8 text.' });
      }
    } finally {
      await unlink(file.path).catch(() => undefined);
    }
  }

  private async checkRows(repos: Repositories, vesselId: number, records: CsvRecord[]): Promise<CheckedRow[]> {
    const settings = await repos.settings.get();
    const compartments = new Map((await repos.compartments.page(vesselId, { page: 1, pageSize: 100_000, sort: 'designation' })).items.map((c) => [designationKey(c.designation), c]));
    const numbers = records.map((r) => checkObjectNumber(r.object_number ?? '', settings.objectNumberPattern)).map((c) => (c.ok ? c.value : ''));
    const taken = await repos.artifacts.numbersTaken(vesselId, [...new Set(numbers.filter(Boolean))]);
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
      const number = checkObjectNumber(record.object_number ?? '', settings.objectNumberPattern);
      const numberOk = number.ok && !refused.has('object_number');
      if (!refused.has('object_number')) {
        if (!number.ok) errors.push({ column: 'object_number', message: number.message });
        else if (taken.has(number.value)) errors.push({ column: 'object_number', message: `${number.value} is already in the collection.` });
        else if (seen.has(number.value)) errors.push({ column: 'object_number', message: `${number.value} is also on line ${seen.get(number.value)}.` });
      }
      if (number.ok && numberOk && !seen.has(number.value)) seen.set(number.value, line);
      const designation = (record.compartment ?? '').trim();
      const compartment = designation ? compartments.get(designationKey(designation)) ?? null : null;
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
        status: (record.status ?? '').trim().toLowerCase().replace(/\s+/g, '-') || undefined,
        compartmentId: compartment?.id ?? null,
        point: null,
      });
      if (!parsed.success) {
        for (const issue of parsed.error.issues) {
          const column = FIELD_COLUMNS[String(issue.path[0])] ?? String(issue.path[0]);
          if (refused.has(column) || (column === 'object_number' && errors.some((e) => e.column === column))) continue;
          errors.push({ column, message: issue.message });
        }
      } else if (!designation || compartment) {
        await checkPlace(repos, vesselId, parsed.data.compartmentId, null, parsed.data.status).catch((err: Error) => errors.push({ column: 'compartment', message: err.message }));
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

  async import(vesselId: number, mode: ImportMode, file: UploadedFile | undefined, actor: Actor): Promise<ImportResult> {
    const text = await this.readCsv(file);
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
    const blocking = missing.length > 0 || parsed.errors.length > 0 || parsed.data.length === 0;

    return this.store.transaction(async (repos) => {
      const vessel = await repos.vessels.findById(vesselId);
      if (!vessel) throw new NotFoundError('The vessel');
      const checked = blocking ? [] : await this.checkRows(repos, vesselId, parsed.data);
      const valid = checked.filter((c) => c.input);
      const result: ImportResult = { mode, rows: checked.map((c) => c.row), total: parsed.data.length, valid: valid.length, invalid: checked.length - valid.length, imported: 0, fileErrors };
      if (mode === 'preview') return result;
      if (blocking) throw new UnprocessableError(`The file cannot be imported: ${fileErrors.join(' ')}`, { file: fileErrors.join(' ') });
      if (mode === 'all' && result.invalid > 0) {
        throw new UnprocessableError(`${result.invalid} of ${result.total} rows have errors, so nothing was imported. Correct them, or import only the valid rows.`, { file: 'Rows with errors.' });
      }
      for (const row of valid) await insertArtifact(repos, vesselId, row.input!, row.objectNumber, row.compartment, actor, `Imported from ${file?.originalname ?? 'a CSV file'} (line ${row.row.line})`);
      await recordAudit(repos, actor, {
        action: 'import',
        entityType: 'artifact',
        entityId: null,
        vesselId,
        summary: `${valid.length} artifacts imported from ${file?.originalname ?? 'a CSV file'}${result.invalid ? ` (${result.invalid} rows with errors left out)` : ''}`,
      });
      return { ...result, imported: valid.length };
    });
  }

  /** The filtered list as CSV, written to `write` in batches; columns as ARTIFACT_CSV_COLUMNS. */
  async export(vesselId: number, filters: ArtifactFilters, write: (chunk: string) => void): Promise<void> {
    const vessel = await this.store.repos.vessels.findById(vesselId);
    if (!vessel) throw new NotFoundError('The vessel');
    const columns = ARTIFACT_CSV_COLUMNS.map((c) => c.name);
    // escapeFormulae: a cell starting with = + - @ is prefixed with ' so spreadsheets do not run it.
    write(Papa.unparse([columns], { newline: '\r\n' }) + '\r\n');
    for await (const batch of this.store.repos.artifacts.all(vesselId, filters)) {
      // Text stored before the character rule may still hold what the rule refuses: never written out.
      const clean = (value: string, kind: TextKind = 'line') => withoutInvalidCharacters(value, kind);
      const rows = batch.map((a) => [
        clean(a.objectNumber),
        clean(a.name),
        a.category,
        clean(a.description, 'free'),
        clean(a.dateOrPeriod),
        clean(a.maker),
        clean(a.materials),
        a.height ?? '',
        a.width ?? '',
        a.depth ?? '',
        a.dimensionUnit,
        clean(a.significance, 'free'),
        a.status,
        clean(a.compartment?.designation ?? ''),
        clean(a.compartment?.deck?.name ?? ''),
      ]);
      write(Papa.unparse(rows, { escapeFormulae: true, newline: '\r\n' }) + '\r\n');
    }
  }
}
