/**
 * Nodewright calc CLI.
 *   npm run -s calc -- <kind> '<json inputs>'   one calculation, pretty JSON on stdout, exit 2 on error
 *   npm run -s calc -- --batch                  JSON lines {kind, inputs} on stdin, one JSON result per line
 *   npm run -s calc -- --list                   the kinds with their inputs and outputs
 */
import { createInterface } from 'node:readline';
import { listCalcKinds, runCalc, type CalcOutcome } from '../lib/calc/index';

type Printable = Record<string, unknown>;

function toPrintable(outcome: CalcOutcome): Printable {
  return outcome.ok ? { ...outcome.result } : { error: outcome.error, fields: outcome.fields };
}

function parseJson(text: string, what: string): { ok: true; value: unknown } | { ok: false; error: Printable } {
  try {
    return { ok: true, value: JSON.parse(text) };
  } catch (err) {
    const detail = err instanceof Error ? err.message : String(err);
    return {
      ok: false,
      error: { error: `${what} is not valid JSON: ${detail}`, fields: { [what]: `not valid JSON: ${detail}` } },
    };
  }
}

function runLine(line: string): Printable {
  const parsed = parseJson(line, 'line');
  if (!parsed.ok) return parsed.error;
  const v = parsed.value;
  if (v === null || typeof v !== 'object' || Array.isArray(v)) {
    return {
      error: 'each line must be a JSON object {kind, inputs}',
      fields: { line: 'must be a JSON object {kind, inputs}' },
    };
  }
  const rec = v as Record<string, unknown>;
  if (typeof rec.kind !== 'string') return { error: 'kind is missing', fields: { kind: 'kind must be a string' } };
  return toPrintable(runCalc(rec.kind, rec.inputs ?? {}));
}

async function runBatch(): Promise<number> {
  const rl = createInterface({ input: process.stdin, crlfDelay: Infinity });
  for await (const line of rl) {
    if (line.trim() === '') continue;
    process.stdout.write(`${JSON.stringify(runLine(line))}\n`);
  }
  return 0;
}

function printList(): number {
  const kinds = listCalcKinds().map((k) => ({
    kind: k.kind,
    title: k.title,
    inputs: k.inputs.map(
      (f) =>
        `${f.name}${f.unit ? ` [${f.unit}]` : ''}${f.default !== undefined ? ` = ${JSON.stringify(f.default)}` : ''}${f.optional ? ' (optional)' : ''}`,
    ),
    outputs: k.outputs.map((f) => `${f.name}${f.unit ? ` [${f.unit}]` : ''}`),
  }));
  process.stdout.write(`${JSON.stringify(kinds, null, 2)}\n`);
  return 0;
}

const USAGE = "usage: npm run -s calc -- <kind> '<json inputs>' | --batch | --list";

async function main(argv: string[]): Promise<number> {
  if (argv[0] === '--list') return printList();
  if (argv[0] === '--batch') return runBatch();
  if (argv.length < 1 || argv[0].startsWith('-')) {
    process.stdout.write(`${JSON.stringify({ error: USAGE, fields: { kind: 'missing calc kind' } })}\n`);
    return 2;
  }
  const parsed = argv.length > 1 ? parseJson(argv[1], 'inputs') : { ok: true as const, value: {} };
  if (!parsed.ok) {
    process.stdout.write(`${JSON.stringify(parsed.error, null, 2)}\n`);
    return 2;
  }
  const outcome = runCalc(argv[0], parsed.value);
  process.stdout.write(`${JSON.stringify(toPrintable(outcome), null, 2)}\n`);
  return outcome.ok ? 0 : 2;
}

main(process.argv.slice(2)).then(
  (code) => {
    process.exitCode = code;
  },
  (err: unknown) => {
    process.stdout.write(
      `${JSON.stringify({ error: `calc CLI failed: ${err instanceof Error ? err.message : String(err)}`, fields: { cli: 'internal error' } })}\n`,
    );
    process.exitCode = 2;
  },
);
