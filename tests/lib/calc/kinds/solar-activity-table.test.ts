/**
 * The analyst's solar-activity table as the solar source of solar-activity, drag-decay, disposal-compliance and
 * altitude-maintenance: refusals name the field, the line and the reason; dates outside the table are refused or, on
 * request, taken from the cycle model with a warning; a constant table gives the constant-flux numbers.
 */
import { describe, expect, it } from 'vitest';
import { expectFieldError, num, outputsOf, resultOf, rows } from './helpers';

/** Monthly rows from `fromYear` to `toYear` (January 1st) with the values of `at(monthIndex)`. */
function table(fromYear: number, toYear: number, at: (k: number) => [number, number, number]): string {
  const lines = ['# programme forecast (invented), monthly', 'date,f107,f107Average,ap'];
  for (let k = 0, y = fromYear, m = 0; y < toYear || (y === toYear && m === 0); k++) {
    const [f, fa, ap] = at(k);
    lines.push(`${y}-${String(m + 1).padStart(2, '0')}-01,${f},${fa},${ap}`);
    m++;
    if (m === 12) {
      m = 0;
      y++;
    }
  }
  return lines.join('\n');
}

const CONSTANT = table(2026, 2080, () => [150, 150, 12]);
const DRAG = { altitudeKm: 450, massKg: 100, areaM2: 1, dragCoefficient: 2.2, startEpoch: '2026-03-01T00:00:00Z' };

describe('a constant table equals the constant-flux source', () => {
  /**
   * Independent path: the constant source hands NRLMSISE-00 the same F10.7, F10.7 mean and Ap at every date without
   * a table; the table path parses the CSV and interpolates between rows. Equal weather ⇒ equal lifetimes (1e-12).
   */
  it('drag-decay: same lifetime, decay rate and density as solarFlux constant with F10.7 150, Ap 12', () => {
    const byTable = outputsOf('drag-decay', { ...DRAG, solarFlux: 'table', solarActivityTableCsv: CONSTANT });
    const byConstant = outputsOf('drag-decay', { ...DRAG, solarFlux: 'constant', f107: 150, apMean: 12 });
    for (const name of ['lifetimeDays', 'decayKmPerDay', 'densityKgM3', 'maintenanceDeltaVMpsPerYear']) {
      expect(Math.abs(num(byTable, name) / num(byConstant, name) - 1), name).toBeLessThan(1e-12);
    }
    expect(rows(byTable, 'series').every((r) => r.f107Average === 150)).toBe(true);
  });

  it('altitude-maintenance and disposal-compliance: same numbers as the constant source', () => {
    const m = { altitudeKm: 520, massKg: 300, areaM2: 2, dragCoefficient: 2.2, startEpoch: '2027-01-01T00:00:00Z' };
    const mt = outputsOf('altitude-maintenance', { ...m, solarFlux: 'table', solarActivityTableCsv: CONSTANT });
    const mc = outputsOf('altitude-maintenance', { ...m, solarFlux: 'constant', f107: 150, apMean: 12 });
    expect(Math.abs(num(mt, 'deltaVPerYearMps') / num(mc, 'deltaVPerYearMps') - 1)).toBeLessThan(1e-12);
    const d = { altitudeKm: 480, massKg: 100, areaM2: 1, endOfLifeEpoch: '2030-01-01T00:00:00Z', ruleYears: 5 };
    const dt = outputsOf('disposal-compliance', { ...d, solarFlux: 'table', solarActivityTableCsv: CONSTANT });
    const dc = outputsOf('disposal-compliance', { ...d, solarFlux: 'constant', f107: 150, apMean: 12 });
    expect(Math.abs(num(dt, 'lifetimeYears') / num(dc, 'lifetimeYears') - 1)).toBeLessThan(1e-12);
    expect(num(dt, 'maxCompliantAltitudeKm')).toBe(num(dc, 'maxCompliantAltitudeKm'));
  });
});

describe('a table that varies', () => {
  it('solar-activity reads the table at its date, linear in time between rows (hand-computed midpoint)', () => {
    // 2027-01-01 → 120/118/10, 2027-02-01 → 130/121/14; 2027-01-16T12:00Z is exactly halfway (15.5 of 31 days)
    const csv = 'date,f107,f107Average,ap\n2027-01-01,120,118,10\n2027-02-01,130,121,14\n2027-03-01,140,124,8';
    const r = resultOf('solar-activity', {
      epoch: '2027-01-16T12:00:00Z',
      years: 0.1,
      solarFlux: 'table',
      solarActivityTableCsv: csv,
    });
    expect(num(r.outputs, 'f107')).toBeCloseTo(125, 12);
    expect(num(r.outputs, 'f107Average')).toBeCloseTo(119.5, 12);
    expect(num(r.outputs, 'ap')).toBeCloseTo(12, 12);
    expect(r.outputs.sunspotNumber).toBeUndefined();
    expect(r.warnings.join(' ')).toMatch(/sunspot number is not given/);
    expect(rows(r.outputs, 'series').map((s) => s.f107Average)).toEqual([119.5, 121]);
  });

  it('a higher flux in the table shortens the lifetime against the constant table', () => {
    const high = table(2026, 2080, () => [220, 220, 12]);
    const lHigh = num(
      outputsOf('drag-decay', { ...DRAG, solarFlux: 'table', solarActivityTableCsv: high }),
      'lifetimeDays',
    );
    const lConst = num(
      outputsOf('drag-decay', { ...DRAG, solarFlux: 'table', solarActivityTableCsv: CONSTANT }),
      'lifetimeDays',
    );
    expect(lHigh).toBeLessThan(0.8 * lConst);
  });
});

describe('refusals and warnings', () => {
  it('a malformed table is refused naming the field, the line and the reason', () => {
    const bad = 'date,f107,f107Average,ap\n2027-01-01,120,118,10\n2027-02-01,abc,121,14';
    for (const kind of ['drag-decay', 'altitude-maintenance', 'disposal-compliance']) {
      expect(expectFieldError(kind, { solarFlux: 'table', solarActivityTableCsv: bad }, 'solarActivityTableCsv')).toBe(
        'solarActivityTableCsv: line 3: f107 "abc" is not a number',
      );
    }
    expect(
      expectFieldError('solar-activity', { solarFlux: 'table', solarActivityTableCsv: bad }, 'solarActivityTableCsv'),
    ).toMatch(/line 3/);
    expect(expectFieldError('drag-decay', { solarFlux: 'table' }, 'solarActivityTableCsv')).toMatch(
      /no table is given/,
    );
  });

  it('refuses a table longer than 100 000 characters', () => {
    expect(
      expectFieldError(
        'drag-decay',
        { solarFlux: 'table', solarActivityTableCsv: `${CONSTANT}\n${'#'.repeat(100_000)}` },
        'solarActivityTableCsv',
      ),
    ).toMatch(/at most 100000 characters/);
  });

  it('refuses a start outside the table and a decay that runs past its end, saying which dates', () => {
    const short = table(2026, 2028, () => [150, 150, 12]);
    expect(
      expectFieldError(
        'drag-decay',
        { ...DRAG, startEpoch: '2025-06-01T00:00:00Z', solarFlux: 'table', solarActivityTableCsv: short },
        'startEpoch',
      ),
    ).toMatch(/outside the solar-activity table \(2026-01-01 to 2028-01-01\)/);
    expect(
      expectFieldError(
        'disposal-compliance',
        { endOfLifeEpoch: '2030-01-01T00:00:00Z', solarFlux: 'table', solarActivityTableCsv: short },
        'endOfLifeEpoch',
      ),
    ).toMatch(/outside the solar-activity table/);
    const past = expectFieldError(
      'drag-decay',
      { ...DRAG, altitudeKm: 600, solarFlux: 'table', solarActivityTableCsv: short },
      'solarActivityTableCsv',
    );
    expect(past).toMatch(/covers 2026-01-01 to 2028-01-01, but the calculation needs 2028-/);
  });

  it('on request, continues with the cycle model outside the table and says from when', () => {
    const short = table(2026, 2028, () => [150, 150, 12]);
    const r = resultOf('drag-decay', {
      ...DRAG,
      altitudeKm: 600,
      solarFlux: 'table',
      solarActivityTableCsv: short,
      beyondTable: 'cycle',
    });
    expect(r.warnings.join(' ')).toMatch(
      /From 2028-01-\d\d to \d{4}-\d\d-\d\d, outside the solar-activity table \(2026-01-01 to 2028-01-01\), F10.7 and Ap come from the solar-cycle model/,
    );
    const inside = resultOf('drag-decay', {
      ...DRAG,
      altitudeKm: 300,
      solarFlux: 'table',
      solarActivityTableCsv: short,
      beyondTable: 'cycle',
    });
    expect(inside.warnings.join(' ')).not.toMatch(/outside the solar-activity table/);
  });

  it('warns when a table is pasted but another source is chosen', () => {
    expect(
      resultOf('drag-decay', { ...DRAG, solarFlux: 'constant', solarActivityTableCsv: CONSTANT }).warnings.join(' '),
    ).toMatch(/pasted but not used/);
    expect(
      resultOf('drag-decay', { ...DRAG, atmosphere: 'exponential', solarActivityTableCsv: CONSTANT }).warnings.join(
        ' ',
      ),
    ).toMatch(/exponential atmosphere has no dates/);
  });
});
