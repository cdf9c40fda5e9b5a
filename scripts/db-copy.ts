/**
 * `npm run db:copy -- --from sqlite:data/nodewright.sqlite --to postgres://user@host/nodewright [--replace-target]`:
 * copies a whole installation to another database (lib/db/copy-database.ts),
 * then prints what it verified. Stop the app first: the source is read as
 * it is at that moment.
 */
import { copyDatabase, CopyRefused, CopyVerificationFailed } from '../lib/db/copy-database';

function option(name: string): string | undefined {
  const i = process.argv.indexOf(name);
  return i >= 0 ? process.argv[i + 1] : undefined;
}

/** The URL with any password replaced, for printing. */
const shown = (url: string) => url.replace(/\/\/([^:/@]+):[^@]*@/, '//$1:***@');

async function main(): Promise<number> {
  const from = option('--from');
  const to = option('--to');
  if (!from || !to) {
    console.error('usage: npm run db:copy -- --from <DATABASE_URL> --to <DATABASE_URL> [--replace-target]');
    return 2;
  }
  console.log(`copying ${shown(from)} → ${shown(to)}`);
  try {
    const report = await copyDatabase({
      from,
      to,
      replaceTarget: process.argv.includes('--replace-target'),
      log: (line) => console.log(`  ${line}`),
    });
    const rows = report.tables.reduce((sum, t) => sum + t.rows, 0);
    const files = report.filesChecked.reduce((sum, t) => sum + t.files, 0);
    console.log(
      `done: ${report.tables.length} tables, ${rows} rows, the same counts in both; ${files} stored files with matching SHA-256.`,
    );
    return 0;
  } catch (err) {
    if (err instanceof CopyRefused) console.error(`refused: ${err.message}`);
    else if (err instanceof CopyVerificationFailed) console.error(`the copy does not match the source: ${err.message}`);
    else console.error(err instanceof Error ? err.message : err);
    return 1;
  }
}

main().then((code) => process.exit(code));
