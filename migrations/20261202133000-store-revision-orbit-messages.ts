import type { Migration } from '../lib/db/migrate';

/**
 * A frozen revision carries the CCSDS orbit data messages of its design orbit
 * beside its PDF: an OPM (the design state) and an OEM (its numerical check over
 * one day), each as the KVN text delivered and its SHA-256, like the PDF bytes.
 * Columns of `revisions`, so the triggers of 20261201232000 and 20261202101000
 * (UPDATE, DELETE and every form of REPLACE refused) guard them with the rest of
 * the row: once frozen, a message cannot be rewritten. Null for revisions frozen
 * before this migration, or whose memo has no design orbit.
 * ADD and DROP COLUMN in place (SQLite ≥ 3.35): no table rebuild, so the rows and
 * triggers stay as they are.
 */
const COLUMNS = ['opm_kvn TEXT', 'opm_sha256 VARCHAR(64)', 'oem_kvn TEXT', 'oem_sha256 VARCHAR(64)'];

export const up: Migration = async ({ context: { sequelize } }) => {
  for (const column of COLUMNS) await sequelize.query(`ALTER TABLE revisions ADD COLUMN ${column}`);
};

export const down: Migration = async ({ context: { sequelize } }) => {
  for (const column of [...COLUMNS].reverse())
    await sequelize.query(`ALTER TABLE revisions DROP COLUMN ${column.split(' ')[0]}`);
};
