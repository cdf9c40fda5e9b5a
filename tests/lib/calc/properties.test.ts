/**
 * Property checks with fast-check 4.10.2: for every kind, junk input (NaN, ±Infinity, huge numbers,
 * strings, null, nested objects, missing and extra fields) never throws and never yields a non-finite
 * output; runCalc returns ok:true with finite outputs or ok:false with a non-empty fields map.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { listCalcKinds, runCalc, type CalcInputField } from '../../../lib/calc/index';

function allNumbersFinite(v: unknown): boolean {
  if (typeof v === 'number') return Number.isFinite(v);
  if (Array.isArray(v)) return v.every(allNumbersFinite);
  if (v !== null && typeof v === 'object') return Object.values(v).every(allNumbersFinite);
  return true;
}

const junk = fc.oneof(
  fc.double(),
  fc.constantFrom(Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY, -0, 1e308, -1e308, 5e-324),
  fc.integer(),
  fc.string({ maxLength: 12 }),
  fc.constantFrom(null, true, '2025-01-01T00:00:00Z', '1e3', 'km', ''),
  fc.array(fc.double(), { maxLength: 3 }),
  fc.dictionary(fc.string({ maxLength: 4 }), fc.string({ maxLength: 6 }), { maxKeys: 3 }),
);

/** Satellite 00005 of Vallado et al. 2006 (AIAA 2006-6753): a TLE tle-check must read. */
const TLE_00005 =
  '1 00005U 58002B   00179.78495062  .00000023  00000-0  28098-4 0  4753\n2 00005  34.2682 348.7242 1859667 331.7664  19.3264 10.82419157413667';

/** A plausible value for a field (in range) — mixed with junk so that some runs reach compute(). */
function plausible(f: CalcInputField, kind: string): fc.Arbitrary<unknown> {
  const lo = f.min ?? -1e6;
  // keep the slow kind's span and tolerance small so a property run stays quick
  const hiRaw = f.max ?? 1e6;
  const hi =
    kind === 'propagation-check' && (f.name === 'days' || f.name === 'altitudeKm') ? lo + (hiRaw - lo) * 0.005 : hiRaw;
  if (f.type === 'number') return fc.double({ min: lo, max: hi, noNaN: true });
  if (f.type === 'integer') return fc.integer({ min: Math.ceil(lo), max: Math.floor(Math.min(hi, lo + 500)) });
  if (f.type === 'enum') return fc.constantFrom(...(f.options ?? ['x']));
  if (f.type === 'epoch')
    return fc
      .date({ min: new Date('1899-06-01T00:00:00Z'), max: new Date('2101-06-01T00:00:00Z'), noInvalidDate: true })
      .map((d) => d.toISOString());
  if (kind === 'tle-check' && f.name === 'tle')
    return fc.constantFrom(
      TLE_00005,
      TLE_00005.replace('4753', '4754'),
      TLE_00005.slice(0, 100),
      `X\n${TLE_00005}`,
      TLE_00005.replace('34.2682', '34,2682'),
    );
  if (f.type === 'record')
    return fc.dictionary(fc.constantFrom('a', 'b', 'mu'), fc.constantFrom('1 km', '3', '2 s', 'x', '1/0'), {
      maxKeys: 3,
    });
  return fc.constantFrom('1 + 2', '3 km to m', 'a + b', '2 pi sqrt(a^3 / mu)', 'a/0', 'b to km', 'import(1)');
}

/** Inputs that must succeed for each kind (defaults plus the required fields without one). */
const VALID_EXTRAS: Record<string, Record<string, unknown>> = {
  'node-local-time': { ltanHours: 10 },
  expression: { expression: '1 + 2' },
  'orbit-trade': { candidateAltitudesKm: '600, 700' },
  'tle-check': { tle: TLE_00005 },
  'station-contacts': {
    sites: 'name,latitude,longitude,altitude,minimum elevation\nNorthmere Basin,52.1,-3.2,120,5\n',
    days: 0.5,
    stepSec: 60,
  },
  'site-revisit': {
    sites: 'name,latitude,longitude,altitude,minimum elevation\nNorthmere Basin,52.1,-3.2,120,5\n',
    days: 0.5,
    stepSec: 60,
  },
  'orbit-message': {
    message:
      'CCSDS_OPM_VERS = 2.0\nCREATION_DATE = 2026-12-02T00:00:00\nORIGINATOR = TEST\nOBJECT_NAME = T\nOBJECT_ID = 2026-001A\nCENTER_NAME = EARTH\nREF_FRAME = EME2000\nTIME_SYSTEM = UTC\nEPOCH = 2027-01-01T00:00:00\nX = 7078.137\nY = 0\nZ = 0\nX_DOT = 0\nY_DOT = -1.0\nZ_DOT = 7.437\n',
  },
};

describe('every kind survives junk input', () => {
  for (const k of listCalcKinds()) {
    const fields = Object.fromEntries(
      k.inputs.map((f) => [
        f.name,
        fc.option(fc.oneof(plausible(f, k.kind), plausible(f, k.kind), junk), { nil: undefined }),
      ]),
    );
    const record = fc.record(fields, { requiredKeys: [] });
    const extra = fc.option(fc.dictionary(fc.string({ minLength: 1, maxLength: 8 }), junk, { maxKeys: 2 }), {
      nil: undefined,
    });
    it(`${k.kind}: never throws, never returns NaN/Infinity, always names a field on failure`, () => {
      const seen = { ok: 0, failed: 0 };
      fc.assert(
        fc.property(record, extra, (inputs, more) => {
          const raw: Record<string, unknown> = { ...inputs, ...(more ?? {}) };
          for (const key of Object.keys(raw)) if (raw[key] === undefined) delete raw[key];
          const r = runCalc(k.kind, raw);
          seen[r.ok ? 'ok' : 'failed']++;
          if (r.ok) {
            expect(allNumbersFinite(r.result.outputs)).toBe(true);
            expect(r.result.warnings.every((w) => typeof w === 'string')).toBe(true);
          } else {
            expect(Object.keys(r.fields).length).toBeGreaterThan(0);
            expect(r.error.length).toBeGreaterThan(0);
          }
        }),
        {
          numRuns: k.kind === 'propagation-check' ? 25 : 150,
          // always include one valid and one refused input, so both paths are exercised on every run
          examples: [
            [VALID_EXTRAS[k.kind] ?? {}, undefined],
            [{ [k.inputs[0].name]: Number.NaN }, undefined],
          ],
        },
      );
      // both paths must be exercised: some runs reach compute(), some are refused
      expect(seen.ok).toBeGreaterThan(0);
      expect(seen.failed).toBeGreaterThan(0);
    });
  }

  it('unknown kinds and non-object inputs are refused, not thrown', () => {
    fc.assert(
      fc.property(fc.string(), junk, (kind, inputs) => {
        const r = runCalc(kind, inputs);
        if (!r.ok) expect(Object.keys(r.fields).length).toBeGreaterThan(0);
        else expect(allNumbersFinite(r.result.outputs)).toBe(true);
      }),
      { numRuns: 200 },
    );
  });
});
