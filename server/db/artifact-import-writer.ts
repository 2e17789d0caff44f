import type { Database } from 'better-sqlite3';
import { SEARCH_TABLE, rowIdOf, scopeOf, type SearchDocument } from '../search/search-index.js';
import type { AuditRow } from '../services/audit.service.js';
import type { ArtifactEntity } from './entities/artifact.entity.js';
import type { ArtifactMoveEntity } from './entities/artifact-move.entity.js';
import type { ImportCompartment } from '../services/artifact-import-rows.js';

export type NewArtifact = Omit<ArtifactEntity, 'id' | 'vessel' | 'compartment' | 'createdAt' | 'updatedAt' | 'version'>;
export type NewMove = Omit<ArtifactMoveEntity, 'id' | 'artifactId' | 'artifact' | 'actor' | 'createdAt'>;

/** A Date as TypeORM writes a `datetime` column on SQLite (UTC, milliseconds). */
function datetime(at: Date): string {
  return at.toISOString().replace('T', ' ').slice(0, 23);
}

function json(value: unknown): string | null {
  return value === null || value === undefined ? null : JSON.stringify(value);
}

/**
 * The CSV import's reads and writes on a connection of its own (the import job's worker thread),
 * as prepared statements: the same rows that the repositories write for one artifact (artifacts,
 * artifact_moves, search_documents, audit_events), thousands at a time. SQLite-specific like the
 * search index; tests/api/artifact-import.test.ts compares its rows with a single create's.
 */
export class ArtifactImportWriter {
  private readonly insertArtifact;
  private readonly insertMove;
  private readonly removeDocument;
  private readonly insertDocument;
  private readonly insertAudit;

  constructor(private readonly db: Database) {
    this.insertArtifact = db.prepare(
      `INSERT INTO artifacts (vesselId, objectNumber, objectNumberSort, name, category, description, dateOrPeriod, maker, materials, height, width, depth, dimensionUnit, significance, status, deaccessionReason, compartmentId, point, coverMediaId, version)
       VALUES (@vesselId, @objectNumber, @objectNumberSort, @name, @category, @description, @dateOrPeriod, @maker, @materials, @height, @width, @depth, @dimensionUnit, @significance, @status, @deaccessionReason, @compartmentId, @point, @coverMediaId, 1)`,
    );
    this.insertMove = db.prepare(
      `INSERT INTO artifact_moves (artifactId, kind, movedOn, fromStatus, fromCompartmentId, fromLabel, fromPoint, toStatus, toCompartmentId, toLabel, toPoint, reason, actorId)
       VALUES (@artifactId, @kind, @movedOn, @fromStatus, @fromCompartmentId, @fromLabel, @fromPoint, @toStatus, @toCompartmentId, @toLabel, @toPoint, @reason, @actorId)`,
    );
    this.removeDocument = db.prepare(`DELETE FROM ${SEARCH_TABLE} WHERE rowid = ?`);
    this.insertDocument = db.prepare(`INSERT INTO ${SEARCH_TABLE} (rowid, kind, record_id, vessel_id, scope, number, title, body, extra) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?)`);
    this.insertAudit = db.prepare(
      `INSERT INTO audit_events (at, actorId, action, entityType, entityId, vesselId, summary, changes, ipAddress) VALUES (@at, @actorId, @action, @entityType, @entityId, @vesselId, @summary, @changes, @ipAddress)`,
    );
  }

  vesselExists(vesselId: number): boolean {
    return this.db.prepare('SELECT 1 FROM vessels WHERE id = ?').get(vesselId) !== undefined;
  }

  objectNumberPattern(): string {
    return (this.db.prepare('SELECT objectNumberPattern FROM organisation_settings WHERE id = 1').get() as { objectNumberPattern: string }).objectNumberPattern;
  }

  compartments(vesselId: number): ImportCompartment[] {
    return this.db.prepare('SELECT id, designation, name FROM compartments WHERE vesselId = ?').all(vesselId) as ImportCompartment[];
  }

  /** The vessel's object numbers among the given ones. */
  numbersTaken(vesselId: number, numbers: string[]): Set<string> {
    const taken = new Set<string>();
    const query = this.db.prepare('SELECT objectNumber FROM artifacts WHERE vesselId = ? AND objectNumber IN (SELECT value FROM json_each(?))').pluck();
    for (let i = 0; i < numbers.length; i += 500) for (const n of query.all(vesselId, JSON.stringify(numbers.slice(i, i + 500))) as string[]) taken.add(n);
    return taken;
  }

  /** Writes one artifact and returns its id; the caller adds its move, document and audit row. */
  artifact(fields: NewArtifact): number {
    return Number(this.insertArtifact.run({ ...fields, point: json(fields.point) }).lastInsertRowid);
  }

  move(artifactId: number, fields: NewMove): void {
    this.insertMove.run({ ...fields, artifactId, fromPoint: json(fields.fromPoint), toPoint: json(fields.toPoint) });
  }

  /** As SearchIndex.put. */
  document(doc: SearchDocument): void {
    const rowId = rowIdOf(doc.kind, doc.recordId);
    this.removeDocument.run(rowId);
    this.insertDocument.run(rowId, doc.kind, BigInt(doc.recordId), BigInt(doc.vesselId), scopeOf(doc.kind, doc.vesselId), doc.number, doc.title, doc.body, doc.extra);
  }

  audit(row: AuditRow): void {
    this.insertAudit.run({ ...row, at: datetime(row.at), changes: json(row.changes) });
  }
}
