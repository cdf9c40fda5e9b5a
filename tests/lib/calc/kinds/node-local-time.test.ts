import * as Astronomy from 'astronomy-engine';
import { describe, expect, it } from 'vitest';
import { expectFieldError, num, outputsOf } from './helpers';

const observer = new Astronomy.Observer(0, 0, 0);

function wrap180(x: number): number {
  return ((((x + 180) % 360) + 360) % 360) - 180;
}

describe('node-local-time', () => {
  it('Meeus, Astronomical Algorithms 2nd ed., Example 25.a: Sun on 1992 Oct 13.0 at α = 198.38083°, δ = −7.78507° (±0.01°)', () => {
    const out = outputsOf('node-local-time', { epoch: '1992-10-13T00:00:00Z', ltanHours: 10.5 });
    expect(Math.abs(num(out, 'sunRightAscensionDeg') - 198.38083)).toBeLessThan(0.01);
    expect(Math.abs(num(out, 'sunDeclinationDeg') - -7.78507)).toBeLessThan(0.01);
  });

  it('Meeus 2nd ed., Example 28.a: equation of time on 1992 Oct 13.0 = 13m 42.6s (±0.05 min)', () => {
    const out = outputsOf('node-local-time', { epoch: '1992-10-13T00:00:00Z', raanDeg: 0 });
    expect(Math.abs(num(out, 'equationOfTimeMin') - (13 + 42.6 / 60))).toBeLessThan(0.05);
  });

  it('Vallado 4th ed., Example 3-5: GMST on 1992 Aug 20 12:14 UT1 = 152.578787810°', () => {
    const out = outputsOf('node-local-time', { epoch: '1992-08-20T12:14:00Z', raanDeg: 0 });
    expect(Math.abs(num(out, 'gmstDeg') - 152.57878781)).toBeLessThan(1e-6);
  });

  it('matches astronomy-engine 2.1.19 over 2025 (Sun α, δ within 0.01°; equation of time within 0.05 min)', () => {
    for (let day = 0; day < 365; day += 5) {
      const date = new Date(Date.UTC(2025, 0, 1, 6) + day * 86400000);
      const out = outputsOf('node-local-time', { epoch: date.toISOString(), raanDeg: 0 });
      const eq = Astronomy.Equator(Astronomy.Body.Sun, date, observer, true, true);
      expect(Math.abs(wrap180(num(out, 'sunRightAscensionDeg') - eq.ra * 15))).toBeLessThan(0.01);
      expect(Math.abs(num(out, 'sunDeclinationDeg') - eq.dec)).toBeLessThan(0.01);
      // apparent solar time at Greenwich = GAST − α☉ + 12 h; mean solar time = UT
      const ut = date.getUTCHours() + date.getUTCMinutes() / 60;
      const eotRef = wrap180((Astronomy.SiderealTime(date) - eq.ra + 12 - ut) * 15) * 4;
      expect(Math.abs(num(out, 'equationOfTimeMin') - eotRef)).toBeLessThan(0.05);
    }
  });

  it('LTAN → RAAN → LTAN round trip, LTDN = LTAN + 12 h, true-Sun LTAN = mean LTAN + equation of time', () => {
    const a = outputsOf('node-local-time', { epoch: '2025-06-21T10:00:00Z', ltanHours: 22.5 });
    const b = outputsOf('node-local-time', { epoch: '2025-06-21T10:00:00Z', raanDeg: num(a, 'raanDeg') });
    expect(num(b, 'ltanHours')).toBeCloseTo(22.5, 9);
    expect(num(a, 'ltdnHours')).toBeCloseTo(10.5, 9);
    expect(num(a, 'ltanTrueSunHours')).toBeCloseTo(22.5 + num(a, 'equationOfTimeMin') / 60, 6);
  });

  it('mean-Sun local time of the node equals UT + (Ω − GMST)/15 with GMST from satellite.js-independent Vallado eq. 3-47', () => {
    // At 1992 Aug 20 12:14 UT the node at RA = GMST is under Greenwich: mean solar time = UT = 12.2333 h
    const out = outputsOf('node-local-time', { epoch: '1992-08-20T12:14:00Z', raanDeg: 152.57878781 });
    expect(num(out, 'ltanHours')).toBeCloseTo(12 + 14 / 60, 6);
  });

  it('needs exactly one of ltanHours and raanDeg, and a parseable epoch', () => {
    expectFieldError('node-local-time', { epoch: '2025-01-01' }, 'ltanHours');
    expectFieldError('node-local-time', { epoch: '2025-01-01', ltanHours: 10, raanDeg: 5 }, 'raanDeg');
    expectFieldError('node-local-time', { epoch: '2025-02-30', ltanHours: 10 }, 'epoch');
    expectFieldError('node-local-time', { epoch: 'yesterday', ltanHours: 10 }, 'epoch');
    expectFieldError('node-local-time', { epoch: '2025-01-01', ltanHours: 24 }, 'ltanHours');
  });
});
