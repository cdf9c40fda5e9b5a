import { describe, expect, it } from 'vitest';
import { expectFieldError, num, outputsOf, resultOf } from './helpers';

describe('coverage', () => {
  it('Landsat 8 WRS-2 (USGS Landsat 8 Data Users Handbook): 233 paths ≈ 172 km apart, 185 km swath → ≈ 7 % sidelap at the equator', () => {
    const out = outputsOf('coverage', { altitudeKm: 699.6, swathKm: 185, revolutions: 233, days: 16 });
    expect(num(out, 'equatorSpacingKm')).toBeCloseTo(40075.017 / 233, 2);
    expect(Math.abs(num(out, 'sidelapPercent') - 7)).toBeLessThan(0.5);
    expect(out.gapless).toBe(true);
    // perpendicular to the track the spacing is smaller (track crosses the equator at ≈ 102°), so sidelap is larger
    expect(num(out, 'crossTrackSpacingKm')).toBeLessThan(num(out, 'equatorSpacingKm'));
    expect(num(out, 'groundTrackAngleDeg')).toBeGreaterThan(98.19);
  });

  it('Sentinel-2 (ESA Sentinel-2 User Handbook): 143 orbits / 10 days with a 290 km swath covers the equator without gaps', () => {
    const out = outputsOf('coverage', { altitudeKm: 786, swathKm: 290, revolutions: 143, days: 10 });
    expect(num(out, 'equatorSpacingKm')).toBeCloseTo(280.24, 1);
    expect(out.gapless).toBe(true);
  });

  it('a swath narrower than the spacing leaves gaps, negative sidelap, and names the gapless width', () => {
    const out = outputsOf('coverage', { altitudeKm: 699.6, swathKm: 150, revolutions: 233, days: 16 });
    expect(out.gapless).toBe(false);
    expect(num(out, 'sidelapPercent')).toBeLessThan(0);
    expect(num(out, 'swathForGaplessKm')).toBeCloseTo(171.996, 2);
  });

  it('warns when altitude and repeat cycle do not belong together; rejects non-coprime cycles', () => {
    expect(
      resultOf('coverage', { altitudeKm: 500, swathKm: 185, revolutions: 233, days: 16 }).warnings.join(' '),
    ).toMatch(/corresponds to about 700 km/);
    expectFieldError('coverage', { altitudeKm: 700, swathKm: 185, revolutions: 232, days: 16 }, 'revolutions');
    expectFieldError('coverage', { altitudeKm: 700, swathKm: 0, revolutions: 233, days: 16 }, 'swathKm');
  });
});
