import { readFile, unlink } from 'node:fs/promises';
import { setImmediate } from 'node:timers/promises';
import Papa from 'papaparse';
import { ARTIFACT_CSV_COLUMNS, type ImportMode, type ImportResult } from '../../shared/schemas/artifact-import.js';
import type { ArtifactFilters } from '../../shared/schemas/artifacts.js';
import { withoutInvalidCharacters, type TextKind } from '../../shared/schemas/text.js';
import type { Store } from '../db/store.js';
import { NotFoundError, ValidationError } from '../http/errors.js';
import { jobUrl, runJob } from '../jobs/worker-job.js';
import type { ImportJobInput } from './artifact-import.job.js';
import type { Actor } from './audit.service.js';
import type { UploadedFile } from './plan.service.js';

const IMPORT_JOB = jobUrl(import.meta.url, 'artifact-import.job');
const EXPORT_BATCH = 50;

/**
 * CSV import of artifacts in two steps (a preview that writes nothing, then all rows or only the
 * valid ones, in one transaction) and CSV export of a filtered list. The import's parsing,
 * checking and writing run on a worker thread (artifact-import.job.ts) so that the server keeps
 * answering meanwhile; an import holds the write lock, so no other change interleaves with it.
 */
export class ArtifactImportService {
  constructor(private readonly store: Store) {}

  private async readCsv(file: UploadedFile | undefined): Promise<Uint8Array> {
    if (!file) throw new ValidationError({ file: 'Choose a CSV file to import.' });
    try {
      return await readFile(file.path);
    } finally {
      await unlink(file.path).catch(() => undefined);
    }
  }

  async import(vesselId: number, mode: ImportMode, file: UploadedFile | undefined, actor: Actor): Promise<ImportResult> {
    const bytes = await this.readCsv(file);
    const input: ImportJobInput = { databasePath: this.store.databasePath, vesselId, mode, bytes, fileName: file?.originalname ?? 'a CSV file', actor };
    const run = () => runJob<ImportJobInput, ImportResult>(IMPORT_JOB, input);
    return mode === 'preview' ? run() : this.store.exclusive(run);
  }

  /** The filtered list as CSV, written to `write` in batches; columns as ARTIFACT_CSV_COLUMNS. */
  async export(vesselId: number, filters: ArtifactFilters, write: (chunk: string) => void): Promise<void> {
    const vessel = await this.store.repos.vessels.findById(vesselId);
    if (!vessel) throw new NotFoundError('The vessel');
    const columns = ARTIFACT_CSV_COLUMNS.map((c) => c.name);
    // escapeFormulae: a cell starting with = + - @ is prefixed with ' so spreadsheets do not run it.
    write(Papa.unparse([columns], { newline: '\r\n' }) + '\r\n');
    // Short slices: each batch is synchronous SQLite work, so the loop is let go between them.
    for await (const batch of this.store.repos.artifacts.all(vesselId, filters, EXPORT_BATCH)) {
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
      await setImmediate();
    }
  }
}
