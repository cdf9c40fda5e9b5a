/** Applies pending migrations: `npm run db:migrate` (or `-- --down` to undo the last one). */
import { connectDatabase, closeDatabase } from '../lib/db/connection';
import { createMigrator } from '../lib/db/migrate';

async function main() {
  const sequelize = await connectDatabase();
  const migrator = createMigrator(sequelize);
  if (process.argv.includes('--down')) {
    const undone = await migrator.down();
    console.log(undone.length ? `undone: ${undone.map((m) => m.name).join(', ')}` : 'nothing to undo');
  } else {
    const applied = await migrator.up();
    console.log(applied.length ? `applied: ${applied.map((m) => m.name).join(', ')}` : 'database is up to date');
  }
  await closeDatabase();
}

main().catch((err) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
