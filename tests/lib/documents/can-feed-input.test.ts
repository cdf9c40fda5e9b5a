import { describe, expect, it } from 'vitest';
import { getCalcKind } from '@/lib/calc';
import { canFeedInput, quantityMeaningOf } from '@/lib/documents/can-feed-input';

const input = (kind: string, name: string) => getCalcKind(kind)!.inputs.find((f) => f.name === name)!;
const output = (kind: string, name: string) => getCalcKind(kind)!.outputs.find((o) => o.name === name)!;

/** Issue 12: feeds are offered by physical quantity and meaning, not unit alone (checked on the registry's own fields). */
describe('canFeedInput', () => {
  const altitude = input('sso-inclination', 'altitudeKm');
  it('offers the repeat orbit’s altitude for an altitude, not its semi-major axis or track spacing (all three in km)', () => {
    expect(canFeedInput(altitude, output('repeat-orbit', 'altitudeKm'))).toBe(true);
    expect(canFeedInput(altitude, output('repeat-orbit', 'semiMajorAxisKm'))).toBe(false);
    expect(canFeedInput(altitude, output('repeat-orbit', 'equatorSpacingKm'))).toBe(false);
  });

  it('does not offer a change of a quantity for the quantity, nor another unit', () => {
    expect(quantityMeaningOf('inclinationDifferenceDeg')).toBe('change of inclination');
    expect(
      canFeedInput(
        { name: 'inclinationDeg', unit: 'deg' },
        { name: 'inclinationDifferenceDeg', unit: 'deg', type: 'number' },
      ),
    ).toBe(false);
    expect(
      canFeedInput({ name: 'inclinationDeg', unit: 'deg' }, { name: 'inclinationDeg', unit: 'deg', type: 'number' }),
    ).toBe(true);
    expect(canFeedInput({ name: 'altitudeKm', unit: 'km' }, { name: 'altitudeM', unit: 'm', type: 'number' })).toBe(
      false,
    );
  });

  it('keeps offering every output in the unit when the input’s name says nothing known', () => {
    expect(quantityMeaningOf('days')).toBeUndefined();
    expect(canFeedInput({ name: 'days', unit: 'd' }, { name: 'lifetimeDays', unit: 'd', type: 'number' })).toBe(true);
  });
});
