import { describe, expect, it } from 'vitest';
import {
  integrateAdaptive,
  integrateRk4,
  type Derivative,
} from '../../../../../lib/calc/topics/propagation/integrators';
import { computeKeplerDerivative, createZonalForceModel } from '../../../../../lib/calc/topics/propagation/zonal-force';
import { EARTH_J2, EARTH_MU_KM3_S2, EARTH_RADIUS_KM } from '../../../../../lib/calc/constants';

const { derivative: computeJ2Derivative, energy: computeJ2Energy } = createZonalForceModel(2);

const oscillator: Derivative = (_t, y, dy) => {
  dy[0] = y[1];
  dy[1] = -y[0];
};

describe('integrators on problems with closed-form solutions', () => {
  it.each(['dopri5', 'dop853'] as const)(
    '%s: harmonic oscillator y = cos t after t = 20 (error < 1e-9 at rtol 1e-12)',
    (m) => {
      const r = integrateAdaptive(m, oscillator, 0, Float64Array.from([1, 0]), 20, {
        relTol: 1e-12,
        absTol: 1e-12,
        maxSteps: 1e6,
      });
      expect(r.t).toBe(20);
      expect(Math.abs(r.y[0] - Math.cos(20))).toBeLessThan(1e-9);
      expect(Math.abs(r.y[1] + Math.sin(20))).toBeLessThan(1e-9);
    },
  );

  it('RK4 is 4th order: halving the step divides the oscillator error by ≈ 16', () => {
    const err = (n: number) =>
      Math.abs(integrateRk4(oscillator, 0, Float64Array.from([1, 0]), 10, n).y[0] - Math.cos(10));
    const ratio = err(200) / err(400);
    expect(ratio).toBeGreaterThan(14);
    expect(ratio).toBeLessThan(18);
  });

  it.each(['dopri5', 'dop853'] as const)(
    '%s: an elliptic Kepler orbit returns to its start after one period 2π√(a³/μ) (±1e-5 km)',
    (m) => {
      const rp = 7000;
      const e = 0.1;
      const a = rp / (1 - e);
      const vp = Math.sqrt((EARTH_MU_KM3_S2 * (1 + e)) / rp);
      const y0 = Float64Array.from([rp, 0, 0, 0, vp * 0.6, vp * 0.8]);
      const period = 2 * Math.PI * Math.sqrt(a ** 3 / EARTH_MU_KM3_S2);
      const r = integrateAdaptive(m, computeKeplerDerivative, 0, y0, period, {
        relTol: 1e-13,
        absTol: 1e-13,
        maxSteps: 1e6,
      });
      for (let d = 0; d < 3; d++) expect(Math.abs(r.y[d] - y0[d])).toBeLessThan(1e-5);
    },
  );

  it('DOP853 needs far fewer evaluations than DOPRI5 at tight tolerance on a day of J2 motion', () => {
    const y0 = Float64Array.from([7078.137, 0, 0, 0, 1.07, 7.43]);
    const o = { relTol: 1e-11, absTol: 1e-11, maxSteps: 1e6 };
    const a = integrateAdaptive('dopri5', computeJ2Derivative, 0, y0, 86400, o);
    const b = integrateAdaptive('dop853', computeJ2Derivative, 0, y0, 86400, o);
    expect(b.evaluations).toBeLessThan(a.evaluations / 2);
    expect(Math.abs(computeJ2Energy(b.y) / computeJ2Energy(y0) - 1)).toBeLessThan(1e-10);
  });

  it('J2…J6 accelerations equal the numerical gradient of their potential (central differences, 1e-7 relative)', () => {
    const y = Float64Array.from([4000, -3000, 5000, 0, 0, 0]);
    for (const degree of [2, 4, 6]) {
      const model = createZonalForceModel(degree);
      const dy = new Float64Array(6);
      model.derivative(0, y, dy);
      const h = 1e-3;
      for (let d = 0; d < 3; d++) {
        const plus = Float64Array.from(y);
        const minus = Float64Array.from(y);
        plus[d] += h;
        minus[d] -= h;
        const grad = (model.energy(plus) - model.energy(minus)) / (2 * h);
        expect(Math.abs(dy[3 + d] + grad) / Math.abs(dy[3 + d])).toBeLessThan(1e-7);
      }
    }
  });

  it('degree 2 equals the closed-form J2 acceleration of Montenbruck & Gill §3.2 (1e-14 relative)', () => {
    const y = Float64Array.from([4000, -3000, 5000, 0, 0, 0]);
    const dy = new Float64Array(6);
    computeJ2Derivative(0, y, dy);
    const [x, yy, z] = [y[0], y[1], y[2]];
    const r = Math.hypot(x, yy, z);
    const k = (-1.5 * EARTH_J2 * EARTH_MU_KM3_S2 * EARTH_RADIUS_KM ** 2) / r ** 5;
    const zz = (5 * z * z) / (r * r);
    const expected = [x * (1 - zz), yy * (1 - zz), z * (3 - zz)].map(
      (c, d) => (-EARTH_MU_KM3_S2 * y[d]) / r ** 3 + k * c,
    );
    for (let d = 0; d < 3; d++) expect(Math.abs(dy[3 + d] / expected[d] - 1)).toBeLessThan(1e-14);
  });

  it('J3…J6 move the acceleration at 700 km by about J_n/J2 × (R/r)^(n−2) of the J2 part (order of magnitude, Montenbruck & Gill §3.2)', () => {
    const y = Float64Array.from([4000, -3000, 5000, 0, 0, 0]);
    const a2 = new Float64Array(6);
    const a6 = new Float64Array(6);
    createZonalForceModel(2).derivative(0, y, a2);
    createZonalForceModel(6).derivative(0, y, a6);
    const dz = Math.abs(a6[5] - a2[5]);
    // J2 part ≈ 1.5 J2 μ R²/r⁴ ≈ 1e-5 km/s²; J3…J6 add ~1e-3 of it
    expect(dz).toBeGreaterThan(1e-10);
    expect(dz).toBeLessThan(1e-7);
  });
});
