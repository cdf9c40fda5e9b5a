import crypto from 'node:crypto';
import { QueryTypes, type Sequelize } from 'sequelize';
import { getOrThrow } from '../collections/get-or-throw';
import { openOtherDatabase } from './connection';
import { createMigrator } from './migrate';

const MIGRATIONS_TABLE = 'schema_migrations';

/** Stored files whose SHA-256 is kept beside their bytes: checked after the copy against both. */
const STORED_FILES: { table: string; bytes: string; sha256: string }[] = [
  { table: 'revisions', bytes: 'pdf_data', sha256: 'pdf_sha256' },
  { table: 'attachments', bytes: 'data', sha256: 'sha256' },
  { table: 'outbox_attachments', bytes: 'content', sha256: 'sha256' },
];

/** The copy cannot start; nothing was written to the target. */
export class CopyRefused extends Error {}
/** The copy ran but the target does not hold what the source holds. */
export class CopyVerificationFailed extends Error {}

export interface CopyReport {
  /** Tables in the order copied, with the rows each holds in source and target. */
  tables: { table: string; rows: number }[];
  /** Stored files checked: SHA-256 of the target's bytes = the stored SHA-256 = SHA-256 of the source's bytes. */
  filesChecked: { table: string; files: number }[];
  /** The target held rows and was emptied first (every migration undone, then applied again). */
  replacedTarget: boolean;
}

export interface CopyOptions {
  from: string;
  to: string;
  /** Empty a target that holds rows (drop its tables by undoing every migration) instead of refusing. */
  replaceTarget?: boolean;
  log?: (line: string) => void;
}

/**
 * Copies a whole installation from one database to another (SQLite or
 * PostgreSQL, either way): the schema by running this code's migrations on
 * the target, then every table in foreign-key order, each in one target
 * transaction, rows in primary-key order (so a reply follows the comment it
 * answers), values converted by the target column's type (SQLite keeps
 * booleans as 0/1, dates and JSON as text). Serial ids keep their values and
 * PostgreSQL's sequences are moved past them.
 *
 * The baseline triggers stay in force: they refuse changing and deleting
 * rows, never inserting new ones, so nothing has to be switched off.
 * Afterwards every table's row count is compared, and for every stored file
 * (revision PDFs, attachments, outbox attachments) the SHA-256 of the
 * target's bytes against the SHA-256 stored beside them and that of the
 * source's bytes. The source is only read; run it with the app stopped.
 */
export async function copyDatabase(opts: CopyOptions): Promise<CopyReport> {
  const log = opts.log ?? (() => undefined);
  if (opts.from === opts.to) throw new CopyRefused('--from and --to name the same database.');
  const source = await openOtherDatabase(opts.from);
  const target = await openOtherDatabase(opts.to);
  try {
    const replacedTarget = await prepareTarget(source, target, opts.replaceTarget ?? false, log);
    const tables = await copyOrder(target);
    const report: CopyReport = { tables: [], filesChecked: [], replacedTarget };
    for (const table of tables) {
      const rows = await copyTable(source, target, table);
      log(`copied ${table}: ${rows} rows`);
    }
    for (const table of tables) {
      const [inSource, inTarget] = await Promise.all([countRows(source, table), countRows(target, table)]);
      if (inSource !== inTarget)
        throw new CopyVerificationFailed(`${table}: ${inSource} rows in the source, ${inTarget} in the target.`);
      report.tables.push({ table, rows: inTarget });
    }
    for (const file of STORED_FILES.filter((f) => tables.includes(f.table))) {
      const files = await verifyStoredFiles(source, target, file);
      report.filesChecked.push({ table: file.table, files });
      log(`verified ${files} stored files in ${file.table} (SHA-256)`);
    }
    return report;
  } finally {
    await Promise.all([source.close(), target.close()]);
  }
}

async function tableNames(db: Sequelize): Promise<string[]> {
  const names = (await db.getQueryInterface().showAllTables()) as unknown[];
  return names.map((n) => (typeof n === 'string' ? n : (n as { tableName: string }).tableName)).sort();
}

async function countRows(db: Sequelize, table: string): Promise<number> {
  const [row] = await db.query<{ n: number | string }>(`SELECT COUNT(*) AS n FROM ${quote(db, table)}`, {
    type: QueryTypes.SELECT,
  });
  return Number(row.n);
}

const quote = (db: Sequelize, name: string) => db.getQueryInterface().quoteIdentifier(name);

/** Checks the source is a fully migrated installation and brings the target to the same schema, empty. */
async function prepareTarget(
  source: Sequelize,
  target: Sequelize,
  replaceTarget: boolean,
  log: (line: string) => void,
): Promise<boolean> {
  if (!(await tableNames(source)).includes(MIGRATIONS_TABLE))
    throw new CopyRefused('The source holds no Nodewright installation (no schema_migrations table).');
  const sourceMigrator = createMigrator(source);
  const [applied, pending] = await Promise.all([sourceMigrator.executed(), sourceMigrator.pending()]);
  if (pending.length > 0)
    throw new CopyRefused(
      `The source is ${pending.length} migration(s) behind this version (first: ${pending[0].name}); run \`npm run db:migrate\` against it first.`,
    );

  const holding: string[] = [];
  for (const table of await tableNames(target)) {
    if (table === MIGRATIONS_TABLE) continue;
    const n = await countRows(target, table);
    if (n > 0) holding.push(`${table} (${n})`);
  }
  const targetMigrator = createMigrator(target);
  let replaced = false;
  if (holding.length > 0) {
    if (!replaceTarget)
      throw new CopyRefused(
        `The target is not empty: ${holding.join(', ')}. Copy into an empty database, or pass --replace-target to drop what it holds first.`,
      );
    log(`the target holds rows (${holding.join(', ')}): undoing every migration there, which drops its tables`);
    await targetMigrator.down({ to: 0 });
    replaced = true;
  }
  const now = await targetMigrator.up();
  if (now.length > 0) log(`migrated the target: ${now.length} migration(s)`);
  const targetApplied = (await targetMigrator.executed()).map((m) => m.name);
  const sourceApplied = applied.map((m) => m.name);
  if (sourceApplied.join() !== targetApplied.join()) {
    throw new CopyRefused(
      `The source and target schemas differ (source: ${sourceApplied.length} migrations, target: ${targetApplied.length}); is the source from a newer version?`,
    );
  }
  const [sourceTables, targetTables] = [(await tableNames(source)).join(), (await tableNames(target)).join()];
  if (sourceTables !== targetTables)
    throw new CopyRefused(`The source's tables (${sourceTables}) are not this version's (${targetTables}).`);
  return replaced;
}

/** Every table but the migrations' own, each after the tables its foreign keys point to. */
async function copyOrder(db: Sequelize): Promise<string[]> {
  const qi = db.getQueryInterface();
  const tables = (await tableNames(db)).filter((t) => t !== MIGRATIONS_TABLE);
  const needs = new Map<string, Set<string>>();
  for (const table of tables) {
    const refs = (await qi.getForeignKeyReferencesForTable(table)) as { referencedTableName?: string }[];
    needs.set(
      table,
      new Set(
        refs.map((r) => r.referencedTableName).filter((t): t is string => !!t && t !== table && tables.includes(t)),
      ),
    );
  }
  const ordered: string[] = [];
  while (ordered.length < tables.length) {
    const ready = tables.filter(
      (t) =>
        !ordered.includes(t) &&
        [...getOrThrow(needs, t, 'foreign-key references of table')].every((n) => ordered.includes(n)),
    );
    if (ready.length === 0)
      throw new CopyRefused(
        `Foreign keys form a cycle among: ${tables.filter((t) => !ordered.includes(t)).join(', ')}.`,
      );
    ordered.push(...ready);
  }
  return ordered;
}

type ColumnType = { type: string; primaryKey?: boolean };

/** A source value as the target column wants it. */
function convert(value: unknown, column: ColumnType): unknown {
  if (value === null || value === undefined) return null;
  const type = column.type.toUpperCase();
  if (type.startsWith('BOOLEAN') || type === 'TINYINT(1)')
    return typeof value === 'string' ? value === 'true' || value === '1' : Boolean(Number(value));
  if (type.includes('TIMESTAMP') || type.startsWith('DATETIME') || type === 'DATE')
    return value instanceof Date ? value : new Date(String(value));
  if (type.startsWith('JSON')) return typeof value === 'string' ? value : JSON.stringify(value);
  return value;
}

async function copyTable(source: Sequelize, target: Sequelize, table: string): Promise<number> {
  const columns = (await target.getQueryInterface().describeTable(table)) as Record<string, ColumnType>;
  const keys = Object.keys(columns).filter((c) => columns[c].primaryKey);
  const order = (keys.length > 0 ? keys : Object.keys(columns)).map((c) => quote(source, c)).join(', ');
  const holdsFiles = Object.values(columns).some((c) => /BLOB|BYTEA/i.test(c.type));
  const batch = holdsFiles ? 20 : 500;
  return target.transaction(async (transaction) => {
    let copied = 0;
    for (;;) {
      const rows = await source.query<Record<string, unknown>>(
        `SELECT * FROM ${quote(source, table)} ORDER BY ${order} LIMIT ${batch} OFFSET ${copied}`,
        { type: QueryTypes.SELECT },
      );
      if (rows.length === 0) break;
      const converted = rows.map((row) =>
        Object.fromEntries(Object.keys(columns).map((c) => [c, convert(row[c], columns[c])])),
      );
      await target.getQueryInterface().bulkInsert(table, converted, { transaction });
      copied += rows.length;
    }
    if (target.getDialect() === 'postgres' && columns.id?.primaryKey && /INT/i.test(columns.id.type)) {
      // Serial ids were copied as they were: the next id the target hands out must come after them.
      await target.query(
        `SELECT setval(pg_get_serial_sequence('${table}', 'id'), COALESCE(MAX(id), 0) + 1, false) FROM ${quote(target, table)}`,
        { transaction },
      );
    }
    return copied;
  });
}

async function verifyStoredFiles(
  source: Sequelize,
  target: Sequelize,
  file: { table: string; bytes: string; sha256: string },
): Promise<number> {
  const read = (db: Sequelize, offset: number) =>
    db.query<{ id: number; bytes: Buffer | null; stored: string }>(
      `SELECT id, ${quote(db, file.bytes)} AS bytes, ${quote(db, file.sha256)} AS stored FROM ${quote(db, file.table)} ORDER BY id LIMIT 20 OFFSET ${offset}`,
      { type: QueryTypes.SELECT },
    );
  const sha = (bytes: Buffer | null) =>
    crypto
      .createHash('sha256')
      .update(bytes ?? Buffer.alloc(0))
      .digest('hex');
  let checked = 0;
  for (;;) {
    const [fromSource, fromTarget] = await Promise.all([read(source, checked), read(target, checked)]);
    if (fromTarget.length === 0 && fromSource.length === 0) return checked;
    for (let i = 0; i < Math.max(fromSource.length, fromTarget.length); i++) {
      const s = fromSource[i];
      const t = fromTarget[i];
      if (!s || !t || s.id !== t.id)
        throw new CopyVerificationFailed(`${file.table}: the rows differ near id ${s?.id ?? t?.id}.`);
      const [sourceSha, targetSha] = [sha(s.bytes), sha(t.bytes)];
      if (targetSha !== t.stored || targetSha !== sourceSha) {
        throw new CopyVerificationFailed(
          `${file.table} ${t.id}: SHA-256 of the copied bytes ${targetSha}, stored ${t.stored}, of the source's bytes ${sourceSha}.`,
        );
      }
    }
    checked += fromTarget.length;
  }
}
