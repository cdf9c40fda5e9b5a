import { describe, expect, it } from 'vitest';
import { EARTH_J2, EARTH_J3, SUN_MEAN_MOTION_RAD_S } from '../../../lib/calc/constants';
import { engineVersion, listConstants } from '../../../lib/calc/index';

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

  it('J2 and J3 follow from the EGM-96 normalised C20, C30 (Lemoine et al. 1998): J_n = −√(2n+1)·C̄n0', () => {
    // C̄20 = −4.84165371736e-4, C̄30 = 9.57254173792e-7 (EGM-96 coefficient file, from memory)
    expect(EARTH_J2).toBeCloseTo(Math.sqrt(5) * 4.84165371736e-4, 12);
    expect(EARTH_J3).toBeCloseTo(-Math.sqrt(7) * 9.57254173792e-7, 14);
  });

  it('sun-synchronous node rate is 0.9856 deg/day (360° per tropical year; SMAD 3rd ed. ch. 6 quotes 0.9856°/day)', () => {
    expect((SUN_MEAN_MOTION_RAD_S * 86400 * 180) / Math.PI).toBeCloseTo(0.98565, 5);
  });

  it('engineVersion names the engine and a semantic version', () => {
    expect(engineVersion).toMatch(/^nodewright-calc \d+\.\d+\.\d+$/);
  });
});
