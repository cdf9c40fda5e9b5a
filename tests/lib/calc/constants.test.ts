import { describe, expect, it } from 'vitest';
import {
  EARTH_J2,
  EARTH_J3,
  EARTH_ROTATION_RAD_S,
  EARTH_J4,
  EARTH_J5,
  EARTH_J6,
  EARTH_J7,
  EARTH_J8,
  EARTH_J9,
  EARTH_ZONALS,
  EGM96_NORMALISED_ZONALS,
  SUN_MEAN_MOTION_RAD_S,
} from '../../../lib/calc/constants';
import { engineVersion, listConstants } from '../../../lib/calc/index';
import { gmstRad } from '../../../lib/calc/topics/time';

describe('constants', () => {
  it('lists WGS-84 radius and GM exactly (NIMA TR8350.2 Table 3.1)', () => {
    const rows = listConstants();
    expect(rows.find((r) => r.symbol === 'R⊕')?.value).toBe(6378.137);
    expect(rows.find((r) => r.symbol === 'μ')?.value).toBe(398600.4418);
    for (const r of rows) {
      expect(r.source.length).toBeGreaterThan(10);
      expect(Number.isFinite(r.value)).toBe(true);
    }
  });

  it('J2…J9 follow from the EGM-96 normalised C̄n0 (Lemoine et al. 1998): J_n = −√(2n+1)·C̄n0, rounded to 12 digits', () => {
    // Reference: EGM-96 coefficient file (NGA egm-96spherical / ICGEM EGM96.gfc), degree n order 0, typed here
    // independently of EGM96_NORMALISED_ZONALS so a transcription slip in either fails. Tolerance 1 part in 1e11.
    const fileCn0: Record<number, number> = {
      2: -0.484165371736e-3,
      3: 0.957254173792e-6,
      4: 0.539873863789e-6,
      5: 0.68532347563e-7,
      6: -0.149957994714e-6,
      7: 0.90978937145e-7,
      8: 0.496711667324e-7,
      9: 0.276714300853e-7,
    };
    const listed = [EARTH_J2, EARTH_J3, EARTH_J4, EARTH_J5, EARTH_J6, EARTH_J7, EARTH_J8, EARTH_J9];
    for (let n = 2; n <= 9; n++) {
      const expected = -Math.sqrt(2 * n + 1) * fileCn0[n];
      expect(EGM96_NORMALISED_ZONALS[n as 2]).toBe(fileCn0[n]);
      expect(Math.abs(listed[n - 2] / expected - 1)).toBeLessThan(1e-11);
      expect(EARTH_ZONALS[n]).toBe(listed[n - 2]);
      // listed without floating-point noise: 12 significant digits at most
      expect(String(listed[n - 2]).replace(/^-?0?\.?0*|e.*$|\./g, '').length).toBeLessThanOrEqual(12);
    }
    // J2 of EGM-96 is also printed as 1.08262668355e-3 in NIMA TR8350.2 3rd ed. Table 3.3 (from memory)
    expect(EARTH_J2).toBe(1.08262668355e-3);
  });

  it('the constants table lists every zonal harmonic J2…J9 with its EGM-96 source', () => {
    const rows = listConstants();
    for (let n = 2; n <= 9; n++) {
      const row = rows.find((r) => r.symbol === `J${n}`);
      expect(row?.value).toBe(EARTH_ZONALS[n]);
      expect(row?.source).toMatch(/EGM-96.*NASA\/TP-1998-206861/);
    }
  });

  it('sun-synchronous node rate is 0.9856 deg/day (360° per tropical year; SMAD 3rd ed. ch. 6 quotes 0.9856°/day)', () => {
    expect((SUN_MEAN_MOTION_RAD_S * 86400 * 180) / Math.PI).toBeCloseTo(0.98565, 5);
  });

  it('the one Earth rotation rate is the rate of the IAU 1982 GMST (Vallado 4th ed. eq. 3-47) over a day, to 5e-15 rad/s (the 11 digits of the constant and double rounding of the GMST polynomial)', () => {
    const jd = 2461000.5;
    const advance = ((gmstRad(jd + 1) - gmstRad(jd) + 2 * Math.PI) % (2 * Math.PI)) + 2 * Math.PI; // one turn + the daily excess
    expect(Math.abs(advance / 86400 - EARTH_ROTATION_RAD_S)).toBeLessThan(5e-15);
    expect(listConstants().filter((r) => r.symbol === 'ω⊕')).toHaveLength(1);
  });

  it('engineVersion names the engine and a semantic version', () => {
    expect(engineVersion).toMatch(/^nodewright-calc \d+\.\d+\.\d+$/);
  });
});
