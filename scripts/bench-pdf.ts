/**
 * Benchmark of the memo PDF: a memo of about 20 pages with 30 calc blocks
 * and 8 figures, rendered from its stored inputs exactly as the route does
 * (in the worker pool: evaluateDocument, figures, one layout). Prints the
 * time of a cold render (including the worker's start) and of warm ones and
 * the peak resident memory of the process (worker threads included),
 * sampled every 20 ms. `npm run bench:pdf-load` measures light requests
 * while ten PDFs render.
 *
 *   npm run bench:pdf
 *   npm run bench:pdf -- --out /tmp/bench.pdf   (also writes the PDF, to look at)
 *
 * react-pdf's packages publish ESM-only `import` exports, which CommonJS
 * `require` (tsx's mode for this package) resolves only with the `import`
 * condition, so the script re-runs itself with --conditions=import.
 */
import { spawnSync } from 'node:child_process';
import { writeFileSync } from 'node:fs';

const CHILD = 'NODEWRIGHT_BENCH_PDF_CHILD';

if (!process.env[CHILD]) {
  const run = spawnSync(
    process.execPath,
    [...process.execArgv, '--conditions=import', __filename, ...process.argv.slice(2)],
    { stdio: 'inherit', env: { ...process.env, [CHILD]: '1' } },
  );
  process.exit(run.status ?? 1);
}

async function main(): Promise<void> {
  const [{ renderMemoPdfJob }, { closeHeavyJobPool }, { benchMemoDocument }] = await Promise.all([
    import('../lib/jobs/render-memo-pdf-job'),
    import('../lib/jobs/heavy-job-pool'),
    import('./support/bench-memo'),
  ]);
  const doc = benchMemoDocument();
  const memo = {
    documentNumber: 'BWO-TL1-DM-900',
    title: 'TERNLIGHT-1 benchmark memo',
    version: 3,
    owner: { id: 1, name: 'Ilse Marrow' },
    reviewers: [{ id: 2, name: 'Tobias Quenby' }],
    content: doc,
    updatedAt: new Date().toISOString(),
  };
  let peak = process.memoryUsage().rss;
  const sampler = setInterval(() => (peak = Math.max(peak, process.memoryUsage().rss)), 20);
  const times: number[] = [];
  let bytes: Buffer = Buffer.alloc(0);
  for (let run = 0; run < 3; run++) {
    const t0 = performance.now();
    // user 0 and memo 0: the benchmark memo has no stored images, so nothing is read from a database
    const { pdf } = await renderMemoPdfJob(0, 0, { memo, paper: 'a4', draft: true });
    bytes = pdf ?? Buffer.alloc(0);
    times.push(performance.now() - t0);
  }
  clearInterval(sampler);
  await closeHeavyJobPool();
  const out = process.argv.indexOf('--out');
  if (out !== -1 && process.argv[out + 1]) writeFileSync(process.argv[out + 1], bytes);
  const pages = (bytes.toString('latin1').match(/\/Type \/Page\b/g) ?? []).length;
  const blocks = doc.content.filter((n) => n.type === 'calcBlock').length;
  const figures = doc.content.filter((n) => n.type === 'figure').length;
  const warm = times.slice(1);
  console.log(
    `memo: ${pages} pages, ${blocks} calc blocks, ${figures} figures, ${(bytes.length / 1024).toFixed(0)} KiB`,
  );
  console.log(
    `render in the worker pool: cold ${(times[0] / 1000).toFixed(2)} s (with the worker's start), warm ${warm.map((t) => (t / 1000).toFixed(2)).join(' s, ')} s (target < 3 s)`,
  );
  console.log(`peak rss: ${(peak / 1024 / 1024).toFixed(0)} MiB`);
}

void main().catch((err: unknown) => {
  console.error(err);
  process.exit(1);
});
