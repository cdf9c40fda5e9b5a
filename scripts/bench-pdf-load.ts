/**
 * `npm run bench:pdf-load`: latency of light requests while ten PDFs render.
 * Starts the app as `npm start` does (its own database; ten heavy jobs per
 * person allowed, so one analyst can ask for all ten), then measures, one
 * request at a time, a customer's GET /api/portal, the customer's portal
 * page and an analyst's GET /api/memos/:id: first with the server idle, then
 * while ten GET /api/memos/:id/pdf of the demo memo are in progress.
 * Prints median, 95th percentile and maximum of each, and when the PDFs
 * finished. Loopback only, bounded: 10 PDFs, sampling stops when they are done.
 */
import { startAppServer } from './support/start-app-server';
import { HttpSession } from './support/http-session';
import { DEMO_PASSWORD, DEMO_USERS } from '../lib/demo/demo-organisation';

const PDFS = 10;
const IDLE_SAMPLES = 20;

function percentile(values: number[], q: number): number {
  const s = [...values].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.floor(q * s.length))];
}
const ms = (v: number) => `${v.toFixed(0)} ms`;
const summary = (values: number[]) =>
  `p50 ${ms(percentile(values, 0.5))}, p95 ${ms(percentile(values, 0.95))}, max ${ms(Math.max(...values))} (${values.length} requests)`;

async function timed(session: HttpSession, path: string): Promise<number> {
  const t0 = performance.now();
  const res = await session.request(path);
  await res.arrayBuffer();
  if (res.status !== 200) throw new Error(`${path}: ${res.status}`);
  return performance.now() - t0;
}

async function main() {
  console.log('starting the app (builds if stale)…');
  const server = await startAppServer({ NODEWRIGHT_HEAVY_JOBS_PER_USER: String(PDFS) });
  try {
    const sign = async (role: string) => {
      const user = DEMO_USERS.find((u) => u.role === role)!;
      const s = new HttpSession(server.baseUrl);
      if (!(await s.signIn(user.email, DEMO_PASSWORD))) throw new Error(`could not sign in as ${role}`);
      return s;
    };
    const [analyst, customer] = await Promise.all([sign('analyst'), sign('customer')]);
    const memos = await analyst.json<{ memos: { id: number; documentNumber: string }[] }>('/api/memos');
    const memoId = memos.body.memos.find((m) => m.documentNumber === 'BWO-TL1-DM-001')!.id;
    const light: [string, HttpSession, string][] = [
      ['GET /api/portal (customer)', customer, '/api/portal'],
      ['GET /portal page (customer)', customer, '/portal'],
      ['GET /api/memos/:id (analyst)', analyst, `/api/memos/${memoId}`],
    ];
    // warm-up: every route once, and one PDF so the worker is up
    for (const [, s, path] of light) await timed(s, path);
    const first = await timed(analyst, `/api/memos/${memoId}/pdf`);
    console.log(`first PDF of the demo memo (starts the worker): ${ms(first)}`);

    const idle = new Map<string, number[]>(light.map(([name]) => [name, []]));
    for (let i = 0; i < IDLE_SAMPLES; i++)
      for (const [name, s, path] of light) idle.get(name)!.push(await timed(s, path));

    const loaded = new Map<string, number[]>(light.map(([name]) => [name, []]));
    const t0 = performance.now();
    const finished: number[] = [];
    let pending = PDFS;
    const pdfs = Array.from({ length: PDFS }, () =>
      timed(analyst, `/api/memos/${memoId}/pdf`).then(() => {
        finished.push(performance.now() - t0);
        pending--;
      }),
    );
    while (pending > 0)
      for (const [name, s, path] of light) if (pending > 0) loaded.get(name)!.push(await timed(s, path));
    await Promise.all(pdfs);

    console.log(`${PDFS} PDFs at once: first done after ${ms(finished[0])}, all after ${ms(finished.at(-1)!)}`);
    for (const [name] of light) {
      console.log(`${name}: idle ${summary(idle.get(name)!)}`);
      console.log(`${' '.repeat(name.length)}  during the ${PDFS} PDFs ${summary(loaded.get(name)!)}`);
    }
  } finally {
    server.stop();
  }
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
