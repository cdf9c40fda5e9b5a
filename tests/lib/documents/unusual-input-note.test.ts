import { describe, expect, it } from 'vitest';
import { getCalcKind } from '@/lib/calc';
import { unusualInputNote } from '@/lib/documents/unusual-input-note';

const field = (name: string) => getCalcKind('sso-inclination')!.inputs.find((f) => f.name === name)!;

/** Issue 12: a valid but unusual input (5000 km altitude) gets a note; usual and refused values get none. */
describe('unusualInputNote', () => {
  it('notes a 5000 km altitude, which the engine accepts', () => {
    expect(field('altitudeKm').max).toBeGreaterThanOrEqual(5000);
    expect(unusualInputNote(field('altitudeKm'), 5000)).toBe(
      '5000 km is unusual for an Earth-observation orbit (usually 200–1500 km); accepted, but check it.',
    );
  });
  it('says nothing about a usual altitude, nor about one the engine refuses', () => {
    expect(unusualInputNote(field('altitudeKm'), 705)).toBeNull();
    expect(unusualInputNote(field('altitudeKm'), 50000)).toBeNull();
  });
  it('notes an eccentricity far from circular', () => {
    expect(unusualInputNote(field('eccentricity'), 0.3)).toMatch(/^An eccentricity of 0.3 is unusual/);
    expect(unusualInputNote(field('eccentricity'), 0.0011)).toBeNull();
  });
});
