import { describe, expect, it } from 'vitest';
import { num, resultOf } from './helpers';

describe('frozen-orbit', () => {
  it('ERS-1 frozen orbit (e = 0.001165, ω = 90°, a ≈ 7159 km, i = 98.52°; ESA ERS mission description, from memory): J2–J3 gives 0–15 % less', () => {
    const r = resultOf('frozen-orbit', { altitudeKm: 7159 - 6378.137, inclinationDeg: 98.52 });
    const e = num(r.outputs, 'eccentricity');
    expect(num(r.outputs, 'argPerigeeDeg')).toBe(90);
    // higher odd zonals (J5, J7) add about 10 % for sun-synchronous orbits
    expect(e).toBeLessThan(0.001165);
    expect(e).toBeGreaterThan(0.001165 * 0.85);
    expect(r.warnings).toEqual([]);
  });

  it('equals Chobotov 3rd ed. e_f = −J3 R sin i / (2 J2 a) with EGM-96 J2, J3 at 700 km, 98.19°: ≈ 1.043e-3', () => {
    const e = num(resultOf('frozen-orbit', { altitudeKm: 700, inclinationDeg: 98.19 }).outputs, 'eccentricity');
    const hand = (2.53265648533e-6 * 6378.137 * Math.sin((98.19 * Math.PI) / 180)) / (2 * 1.08262668355e-3 * 7078.137);
    expect(e).toBeCloseTo(hand, 9);
    expect(e).toBeCloseTo(1.0433e-3, 6);
  });

  it('warns near the critical inclination: TOPEX/Poseidon at 66.04° is frozen at e ≈ 0.000095 (AVISO/JPL, from memory), far from the J2–J3 value', () => {
    const r = resultOf('frozen-orbit', { altitudeKm: 7714.4 - 6378.137, inclinationDeg: 66.04 });
    expect(r.warnings.join(' ')).toMatch(/critical inclination/);
    expect(num(r.outputs, 'eccentricity')).toBeGreaterThan(5 * 0.000095);
  });

  it('perigee/apogee altitudes bracket the mean altitude by a·e', () => {
    const o = resultOf('frozen-orbit', { altitudeKm: 800, inclinationDeg: 98.6 }).outputs;
    const ae = 7178.137 * num(o, 'eccentricity');
    expect(num(o, 'apogeeAltitudeKm') - num(o, 'perigeeAltitudeKm')).toBeCloseTo(2 * ae, 9);
  });
});
