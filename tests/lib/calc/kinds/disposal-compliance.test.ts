import { describe, expect, it } from 'vitest';
import { expectFieldError, num, outputsOf, resultOf } from './helpers';

const sat = { massKg: 310, areaM2: 1.6, dragCoefficient: 2.2 };
const MU = 398600.4418;
const RE = 6378.137;

describe('disposal-compliance', () => {
  it('with atmosphere = exponential the lifetime equals drag-decay’s (Vallado Table 8-4 path) at the same inputs, to 1e-12', () => {
    for (const altitudeKm of [450, 600, 700]) {
      const d = outputsOf('disposal-compliance', { ...sat, altitudeKm, atmosphere: 'exponential' });
      const drag = outputsOf('drag-decay', { ...sat, altitudeKm, atmosphere: 'exponential' });
      expect(num(d, 'lifetimeYears')).toBeCloseTo(num(drag, 'lifetimeYears'), 12);
      expect(d.compliant).toBe(num(drag, 'lifetimeYears') <= 25);
    }
  });

  it('the highest compliant altitude brackets the rule: drag-decay lifetime ≤ 25 yr 1 km below it and ≥ 25 yr 1 km above (exponential path)', () => {
    const d = outputsOf('disposal-compliance', { ...sat, altitudeKm: 700, atmosphere: 'exponential' });
    const h = num(d, 'maxCompliantAltitudeKm');
    const life = (altitudeKm: number) =>
      num(outputsOf('drag-decay', { ...sat, altitudeKm, atmosphere: 'exponential' }), 'lifetimeYears');
    expect(life(h - 1)).toBeLessThanOrEqual(25);
    expect(life(h + 1)).toBeGreaterThanOrEqual(25);
  });

  it('the deorbit burn: small-burn limit of vis-viva Δv ≈ v (r − r_p)/(4 r) (Hohmann transfer, Vallado 4th ed. §6.3 from memory, linearised) within 2 %, and 0 when compliant', () => {
    const d = outputsOf('disposal-compliance', { ...sat, altitudeKm: 700, atmosphere: 'exponential' });
    expect(d.compliant).toBe(false);
    const r = RE + 700;
    const rp = RE + num(d, 'disposalPerigeeAltitudeKm');
    const linear = Math.sqrt(MU / r) * ((r - rp) / (4 * r)) * 1000;
    expect(Math.abs(num(d, 'deorbitDeltaVMps') / linear - 1)).toBeLessThan(0.02);
    const low = outputsOf('disposal-compliance', { ...sat, altitudeKm: 450, atmosphere: 'exponential' });
    expect(low.compliant).toBe(true);
    expect(num(low, 'deorbitDeltaVMps')).toBe(0);
  });

  it('NRLMSISE-00 path: the lifetime from end of life equals drag-decay’s at the same date and source; a 5-year rule lowers the compliant altitude', () => {
    const common = { ...sat, solarFlux: 'constant', f107: 150 };
    const d = resultOf('disposal-compliance', {
      ...common,
      altitudeKm: 450,
      endOfLifeEpoch: '2030-01-01T00:00:00Z',
      ruleYears: 5,
    });
    const drag = outputsOf('drag-decay', { ...common, altitudeKm: 450, startEpoch: '2030-01-01T00:00:00Z' });
    expect(num(d.outputs, 'lifetimeYears')).toBeCloseTo(num(drag, 'lifetimeYears'), 9);
    expect(num(d.outputs, 'maxCompliantAltitudeKm')).toBeGreaterThan(400);
    expect(num(d.outputs, 'maxCompliantAltitudeKm')).toBeLessThan(600);
    const life = (altitudeKm: number) =>
      num(outputsOf('drag-decay', { ...common, altitudeKm, startEpoch: '2030-01-01T00:00:00Z' }), 'lifetimeYears');
    const h = num(d.outputs, 'maxCompliantAltitudeKm');
    expect(life(h - 2)).toBeLessThanOrEqual(5);
    expect(life(h + 2)).toBeGreaterThanOrEqual(5);
  }, 60_000);

  it('names the IADC guidelines and ISO 24113 in its model note and refuses a bad end-of-life date', () => {
    const r = resultOf('disposal-compliance', { ...sat, altitudeKm: 500, atmosphere: 'exponential' });
    expect(r.model.references.join(' ')).toMatch(/IADC Space Debris Mitigation Guidelines/);
    expect(r.model.references.join(' ')).toMatch(/ISO 24113/);
    expectFieldError('disposal-compliance', { ...sat, endOfLifeEpoch: '2001-01-01T00:00:00Z' }, 'endOfLifeEpoch');
    expectFieldError('disposal-compliance', { ...sat, ruleYears: 0 }, 'ruleYears');
  });
});
