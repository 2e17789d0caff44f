// The CSV import's heavy part, on a worker thread (see server/jobs/worker-job.ts): decoding,
// parsing, checking every row, and writing the valid ones in one transaction on a connection of
// its own. The server holds the app's write lock meanwhile, so no other change interleaves.
import Database from 'better-sqlite3';
import { objectNumberSortKey } from '../../shared/calc/object-number.js';
import type { ImportMode, ImportResult } from '../../shared/schemas/artifact-import.js';
import { ArtifactImportWriter } from '../db/artifact-import-writer.js';
import { NotFoundError, UnprocessableError } from '../http/errors.js';
import { serveJob } from '../jobs/worker-job.js';
import { compartmentLabel } from '../presenters/artifact.presenter.js';
import { checkRows, decodeCsv, numbersOf, parseCsv, type CheckedRow } from './artifact-import-rows.js';
import { recordedAudit, recordedMove, searchDocumentOf } from './artifact-record.js';
import { auditRowOf, type Actor } from './audit.service.js';

export interface ImportJobInput {
  databasePath: string;
  vesselId: number;
  mode: ImportMode;
  bytes: Uint8Array;
  fileName: string;
  actor: Actor;
}

function write(writer: ArtifactImportWriter, vesselId: number, checked: CheckedRow, fileName: string, actor: Actor) {
  const input = checked.input!;
  const fields = { ...input, vesselId, objectNumber: checked.objectNumber, objectNumberSort: objectNumberSortKey(checked.objectNumber), deaccessionReason: null, coverMediaId: null };
  const id = writer.artifact(fields);
  writer.move(
    id,
    recordedMove(
      { toStatus: fields.status, toCompartmentId: fields.compartmentId, toLabel: compartmentLabel(checked.compartment), toPoint: fields.point },
      `Imported from ${fileName} (line ${checked.row.line})`,
      actor.id,
    ),
  );
  writer.document(searchDocumentOf({ ...fields, id }));
  writer.audit(auditRowOf(actor, { action: 'create', entityType: 'artifact', entityId: id, vesselId, ...recordedAudit(fields) }));
}

serveJob<ImportJobInput, ImportResult>(({ databasePath, vesselId, mode, bytes, fileName, actor }) => {
  const file = parseCsv(decodeCsv(bytes));
  const db = new Database(databasePath, { timeout: 5000 });
  try {
    db.pragma('foreign_keys = ON');
    const writer = new ArtifactImportWriter(db);
    const run = db.transaction((): ImportResult => {
      if (!writer.vesselExists(vesselId)) throw new NotFoundError('The vessel');
      const { records, fileErrors, blocking } = file;
      let checked: CheckedRow[] = [];
      if (!blocking) {
        const pattern = writer.objectNumberPattern();
        checked = checkRows(records, pattern, writer.compartments(vesselId), writer.numbersTaken(vesselId, numbersOf(records, pattern)));
      }
      const valid = checked.filter((c) => c.input);
      const result: ImportResult = { mode, rows: checked.map((c) => c.row), total: records.length, valid: valid.length, invalid: checked.length - valid.length, imported: 0, fileErrors };
      if (mode === 'preview') return result;
      if (blocking) throw new UnprocessableError(`The file cannot be imported: ${fileErrors.join(' ')}`, { file: fileErrors.join(' ') });
      if (mode === 'all' && result.invalid > 0) {
        throw new UnprocessableError(`${result.invalid} of ${result.total} rows have errors, so nothing was imported. Correct them, or import only the valid rows.`, { file: 'Rows with errors.' });
      }
      for (const row of valid) write(writer, vesselId, row, fileName, actor);
      writer.audit(
        auditRowOf(actor, {
          action: 'import',
          entityType: 'artifact',
          entityId: null,
          vesselId,
          summary: `${valid.length} artifacts imported from ${fileName}${result.invalid ? ` (${result.invalid} rows with errors left out)` : ''}`,
        }),
      );
      return { ...result, imported: valid.length };
    });
    // A preview only reads (one snapshot); an import takes the write lock of the file at once.
    return mode === 'preview' ? run.deferred() : run.immediate();
  } finally {
    db.close();
  }
});
