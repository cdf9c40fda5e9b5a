/** Seeds the demo organisation if the database has no users: `npm run db:seed`. */
import { closeDatabase } from '../lib/db/connection';
import { migrateUp } from '../lib/db/migrate';
import { seedDemo } from '../lib/demo/seed-demo';

async function main() {
  await migrateUp();
  const { seeded } = await seedDemo();
  console.log(seeded ? 'demo organisation seeded' : 'database already has users; nothing seeded');
  await closeDatabase();
}

main().catch((err) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
