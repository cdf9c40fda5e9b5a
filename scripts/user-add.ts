/**
 * Adds a user from the command line, for bootstrapping:
 *   npm run -s user:add -- --email E --name N --role R --password P
 */
import { parseArgs } from 'node:util';
import { closeDatabase } from '../lib/db/connection';
import { migrateUp } from '../lib/db/migrate';
import { createUser } from '../lib/users/create-user';
import { ApiError, fieldsFromZod } from '../lib/api/errors';
import { ZodError } from 'zod';

async function main(): Promise<number> {
  const { values } = parseArgs({
    options: {
      email: { type: 'string' },
      name: { type: 'string' },
      role: { type: 'string' },
      password: { type: 'string' },
    },
    strict: true,
  });
  await migrateUp();
  try {
    const user = await createUser({
      email: values.email ?? '',
      name: values.name ?? '',
      role: values.role as never,
      password: values.password ?? '',
    });
    console.log(JSON.stringify(user));
    return 0;
  } catch (err) {
    if (err instanceof ZodError) console.error(JSON.stringify({ error: 'invalid user', fields: fieldsFromZod(err) }));
    else if (err instanceof ApiError) console.error(JSON.stringify({ error: err.message, fields: err.fields }));
    else throw err;
    return 2;
  } finally {
    await closeDatabase();
  }
}

main().then(
  (code) => process.exit(code),
  (err) => {
    console.error(err instanceof Error ? err.message : err);
    process.exit(1);
  },
);
