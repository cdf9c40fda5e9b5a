import { describe, expect, it } from 'vitest';
import { bruteForceShadow } from '../support/shadow';
import { expectFieldError, num, outputsOf } from './helpers';

const R = 6378.137;
const MU = 398600.4418;
const DEG = Math.PI / 180;

describe('eclipse-duration', () => {
  it.each([
    [700, 0],
    [700, 30],
    [700, 60],
    [700, 64],
    [400, 45],
    [1400, -20],
    [5000, 10],
  ])(
    'umbra, umbra + penumbra and cylinder match a brute-force apparent-disc test over one orbit (200 000 points, ±0.003 min): %d km, β = %d°',
    (altitudeKm, betaDeg) => {
      const o = outputsOf('eclipse-duration', { altitudeKm, betaDeg });
      const ref = bruteForceShadow(altitudeKm, betaDeg);
      expect(Math.abs(num(o, 'umbraMin') - ref.umbra)).toBeLessThan(0.003);
      expect(Math.abs(num(o, 'penumbraMin') - ref.penumbra)).toBeLessThan(0.003);
      expect(Math.abs(num(o, 'cylindricalMin') - ref.cylinder)).toBeLessThan(0.003);
    },
  );

  it('β = 60° at 700 km: umbra and umbra + penumbra differ from the cylinder by about 0.5 min (issue figure), and umbra < cylinder < umbra + penumbra', () => {
    const o = outputsOf('eclipse-duration', { altitudeKm: 700, betaDeg: 60 });
    const [u, p, c] = [num(o, 'umbraMin'), num(o, 'penumbraMin'), num(o, 'cylindricalMin')];
    expect(u).toBeLessThan(c);
    expect(c).toBeLessThan(p);
    expect(c - u).toBeGreaterThan(0.4);
    expect(p - c).toBeGreaterThan(0.4);
    expect(num(o, 'eclipseMin')).toBe(u);
    expect(
      num(outputsOf('eclipse-duration', { altitudeKm: 700, betaDeg: 60, shadowModel: 'cylindrical' }), 'eclipseMin'),
    ).toBe(c);
  });

  it('cylindrical case equals the closed form T/π · acos(√(h² + 2Rh)/(a cos β)) (Rickman, NASA TFAWS 2014, from memory; ±1e-9 min) and vanishes above β* = asin(R/a)', () => {
    for (const [h, beta] of [
      [700, 0],
      [700, 50],
      [300, 70],
      [2000, 5],
    ]) {
      const a = R + h;
      const T = (2 * Math.PI * Math.sqrt(a ** 3 / MU)) / 60;
      const closed = (T / Math.PI) * Math.acos(Math.sqrt(h * h + 2 * R * h) / (a * Math.cos(beta * DEG)));
      expect(
        Math.abs(num(outputsOf('eclipse-duration', { altitudeKm: h, betaDeg: beta }), 'cylindricalMin') - closed),
      ).toBeLessThan(1e-9);
    }
    const o = outputsOf('eclipse-duration', { altitudeKm: 700, betaDeg: 65 });
    expect(num(o, 'criticalBetaDeg')).toBeCloseTo(Math.asin(R / (R + 700)) / DEG, 9);
    expect(num(o, 'cylindricalMin')).toBe(0);
    expect(num(o, 'umbraMin')).toBe(0);
  });

  it('refuses out-of-range inputs with a message naming the field', () => {
    expectFieldError('eclipse-duration', { betaDeg: 91 }, 'betaDeg');
    expectFieldError('eclipse-duration', { shadowModel: 'spherical' }, 'shadowModel');
    expectFieldError('eclipse-duration', { altitudeKm: 50 }, 'altitudeKm');
  });
});
