import { describe, expect, it } from 'vitest';
import { parseInputText } from '@/lib/documents/parse-input-text';
import type { CalcInputField } from '@/lib/calc';

const km: CalcInputField = { name: 'altitudeKm', label: 'Altitude', unit: 'km', type: 'number' };
const deg: CalcInputField = { name: 'inclinationDeg', label: 'Inclination', unit: 'deg', type: 'number' };
const days: CalcInputField = { name: 'days', label: 'Repeat cycle', unit: 'd', type: 'integer' };
const area: CalcInputField = { name: 'areaM2', label: 'Area', unit: 'm^2', type: 'number' };
const activity: CalcInputField = {
  name: 'solarActivity',
  label: 'Solar activity',
  unit: null,
  type: 'enum',
  options: ['low', 'moderate', 'high'],
};

describe('parseInputText (unit-aware entry through mathjs units)', () => {
  it('takes a bare number in the field unit and converts other units of the same dimension', () => {
    expect(parseInputText(km, '705')).toEqual({ ok: true, value: 705, normalised: '705 km' });
    expect(parseInputText(km, '705 km')).toMatchObject({ value: 705 });
    expect(parseInputText(km, '0.705 Mm')).toMatchObject({ ok: true, value: 705, normalised: '705 km' });
    expect(parseInputText(km, '705000 m')).toMatchObject({ value: 705 });
    // 1 rad = 180/π deg (definition of the radian).
    const r = parseInputText(deg, '1.7 rad');
    expect(r.ok && typeof r.value === 'number' ? r.value : NaN).toBeCloseTo((1.7 * 180) / Math.PI, 9);
    expect(parseInputText(days, '2 weeks')).toMatchObject({ ok: true, value: 14 });
    expect(parseInputText(area, '16000 cm^2')).toMatchObject({ ok: true, value: 1.6 });
    // The engine's year fields (unit 'yr') take the unit they show; 18 months = 1.5 Julian years.
    const years: CalcInputField = { name: 'years', label: 'Mission length', unit: 'yr', type: 'number' };
    expect(parseInputText(years, '5 yr')).toEqual({ ok: true, value: 5, normalised: '5 yr' });
    expect(parseInputText(years, '18 months')).toMatchObject({ ok: true, value: 1.5 });
  });

  it('refuses text of the wrong dimension, non-numbers and non-integers, naming the problem', () => {
    expect(parseInputText(km, '98 deg')).toEqual({
      ok: false,
      message: '“98 deg” is not a length; the field is in km',
    });
    expect(parseInputText(km, 'high')).toMatchObject({
      ok: false,
      message: expect.stringMatching(/not a number with a unit/),
    });
    expect(parseInputText(days, '2.5')).toEqual({ ok: false, message: 'Repeat cycle must be a whole number' });
    expect(parseInputText(activity, 'extreme')).toEqual({ ok: false, message: 'choose one of low, moderate, high' });
    expect(parseInputText({ name: 'epoch', label: 'Epoch', unit: null, type: 'epoch' }, 'yesterday')).toMatchObject({
      ok: false,
    });
  });

  it('empty text means "not given"', () => {
    expect(parseInputText(km, '  ')).toEqual({ ok: true, value: undefined, normalised: null });
  });
});
