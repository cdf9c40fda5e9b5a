import { describe, expect, it } from 'vitest';
import { num, outputsOf } from './helpers';

const MU = 398600.4418;
const RE = 6378.137;
const J2 = 1.08262668355e-3;
const W_EARTH = 7.292115e-5;

describe('altitude-maintenance', () => {
  const inputs = {
    altitudeKm: 700,
    massKg: 310,
    areaM2: 1.6,
    dragCoefficient: 2.2,
    deadbandKm: 1,
    atmosphere: 'exponential',
  };

  it('drift gain K against the closed form from Keplerian period and J2 node rate: K = R⊕[(ω⊕ − Ω̇)·3/(2a) + (7/2)Ω̇/a] (Kozai 1959 rates, differentiated by hand) within 0.5 %', () => {
    const out = outputsOf('altitude-maintenance', inputs);
    const a = RE + 700;
    const n = Math.sqrt(MU / a ** 3);
    const cosI = -((2 * Math.PI) / (365.24219 * 86400)) / (1.5 * n * J2 * (RE / a) ** 2); // sun-synchronous
    const nodeRate = -1.5 * n * J2 * (RE / a) ** 2 * cosI;
    const k = RE * ((W_EARTH - nodeRate) * (3 / (2 * a)) + (3.5 * nodeRate) / a);
    expect(Math.abs(num(out, 'groundTrackDriftKmPerDayPerKm') / (k * 86400) - 1)).toBeLessThan(0.005);
  });

  it('the parabola, simulated step by step in the test from dx/dt = K Δa and the decay rate, sweeps exactly ±dead band and returns after the interval (1 %)', () => {
    const out = outputsOf('altitude-maintenance', inputs);
    const k = num(out, 'groundTrackDriftKmPerDayPerKm'); // km/d per km
    const decayKmPerDay = num(out, 'decayMPerDay') / 1000;
    let offset = num(out, 'deltaSemiMajorAxisM') / 2000; // after the raise: a − a_ref = +Δa/2
    let x = -1;
    let t = 0;
    let xMax = x;
    const dt = 1e-3;
    while (offset > -num(out, 'deltaSemiMajorAxisM') / 2000) {
      x += k * offset * dt;
      offset -= decayKmPerDay * dt;
      t += dt;
      xMax = Math.max(xMax, x);
    }
    expect(xMax).toBeCloseTo(1, 2);
    expect(x).toBeCloseTo(-1, 2);
    expect(t / num(out, 'manoeuvreIntervalDays')).toBeCloseTo(1, 2);
  });

  it('ΔV per manoeuvre is the small Hohmann raise n·Δa/2 (vis-viva, Vallado 4th ed. §6.3 from memory) and the yearly total equals the drag make-up ½ρv²B × 1 yr of drag-decay (exponential, constant density) within 1e-6', () => {
    const out = outputsOf('altitude-maintenance', inputs);
    const a = RE + 700;
    const n = Math.sqrt(MU / a ** 3);
    expect(num(out, 'deltaVPerManoeuvreMps')).toBeCloseTo((n * num(out, 'deltaSemiMajorAxisM')) / 2, 9);
    const drag = outputsOf('drag-decay', {
      altitudeKm: 700,
      massKg: 310,
      areaM2: 1.6,
      dragCoefficient: 2.2,
      atmosphere: 'exponential',
    });
    // drag-decay's make-up ΔV uses the tropical year; the maintenance year is 365.25 d
    expect(
      num(out, 'deltaVPerYearMps') / (num(drag, 'maintenanceDeltaVMpsPerYear') * (365.25 / 365.24219)),
    ).toBeCloseTo(1, 6);
  });

  it('NRLMSISE-00 path: higher solar activity shortens the interval', () => {
    const at = (solarActivity: string) =>
      num(
        outputsOf('altitude-maintenance', {
          ...inputs,
          atmosphere: 'nrlmsise-00',
          solarActivity,
          startEpoch: '2026-01-01T00:00:00Z',
        }),
        'manoeuvreIntervalDays',
      );
    expect(at('high')).toBeLessThan(at('moderate'));
    expect(at('moderate')).toBeLessThan(at('low'));
  });
});
