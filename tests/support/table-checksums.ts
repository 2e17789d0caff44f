import { createHash } from 'node:crypto';
import Database from 'better-sqlite3';

export interface TableSum {
  count: number;
  sha256: string;
}

type Row = Record<string, unknown>;

function orderOf(db: Database.Database, table: string): string {
  const columns = db.prepare(`PRAGMA table_info("${table}")`).all() as { name: string; pk: number }[];
  const pk = columns.filter((c) => c.pk > 0).sort((a, b) => a.pk - b.pk).map((c) => `"${c.name}"`);
  return pk.length ? pk.join(', ') : 'rowid';
}

function keyOf(db: Database.Database, table: string, row: Row): string {
  const order = orderOf(db, table);
  return order === 'rowid' ? String(row.rowid) : JSON.stringify(order.split(', ').map((c) => row[c.slice(1, -1)]));
}

const serialise = (row: Row) => JSON.stringify(row, (_k, v: unknown) => (Buffer.isBuffer(v) ? v.toString('hex') : typeof v === 'bigint' ? String(v) : v));

/** The real tables of a database (virtual tables are read through their shadow tables). */
function tables(db: Database.Database): string[] {
  const rows = db.prepare("SELECT name, sql FROM sqlite_master WHERE type = 'table' AND name NOT LIKE 'sqlite_stat%'").all() as { name: string; sql: string }[];
  return rows.filter((r) => !/^CREATE VIRTUAL/i.test(r.sql)).map((r) => r.name).sort();
}

function rowsOf(db: Database.Database, table: string): Row[] {
  const order = orderOf(db, table);
  const select = order === 'rowid' ? `SELECT rowid AS rowid, * FROM "${table}"` : `SELECT * FROM "${table}"`;
  return db.prepare(`${select} ORDER BY ${order}`).all() as Row[];
}

/** Every row of every table, keyed by primary key, read in one transaction (a consistent view). */
export function readTables(file: string): Map<string, Map<string, string>> {
  const db = new Database(file, { readonly: true, fileMustExist: true });
  try {
    return db.transaction(() => {
      const all = new Map<string, Map<string, string>>();
      for (const table of tables(db)) all.set(table, new Map(rowsOf(db, table).map((row) => [keyOf(db, table, row), serialise(row)])));
      return all;
    })();
  } finally {
    db.close();
  }
}

/** Row count and a SHA-256 over all rows ordered by primary key, per table. */
export function tableChecksums(file: string): Record<string, TableSum> {
  const sums: Record<string, TableSum> = {};
  for (const [table, rows] of readTables(file)) {
    const hash = createHash('sha256');
    for (const [key, row] of rows) hash.update(`${key}\t${row}\n`);
    sums[table] = { count: rows.size, sha256: hash.digest('hex') };
  }
  return sums;
}
