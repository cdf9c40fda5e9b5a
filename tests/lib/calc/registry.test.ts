import { describe, expect, it } from 'vitest';
import { engineVersion, getCalcKind, listCalcKinds, runCalc } from '../../../lib/calc/index';

describe('registry and runCalc', () => {
  it('lists JSON-serialisable descriptors with metadata for every input', () => {
    const kinds = listCalcKinds();
    expect(kinds.length).toBeGreaterThanOrEqual(5);
    expect(JSON.parse(JSON.stringify(kinds))).toEqual(kinds);
    for (const k of kinds) {
      expect(k.model.references.length).toBeGreaterThan(0);
      expect(k.model.assumptions.join(' ')).toMatch(/verify final values with high-fidelity tools/);
      for (const f of k.inputs) expect(f.label.length).toBeGreaterThan(0);
      expect(getCalcKind(k.kind)?.kind).toBe(k.kind);
    }
  });

  it('returns copies: mutating a descriptor does not change the registry', () => {
    const k = getCalcKind('sso-inclination');
    if (!k) throw new Error('missing kind');
    k.inputs[0].label = 'changed';
    expect(getCalcKind('sso-inclination')?.inputs[0].label).not.toBe('changed');
  });

  it('names the kind field for an unknown kind', () => {
    const r = runCalc('warp-drive', {});
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.fields.kind).toMatch(/unknown calc kind/);
  });

  it('names an unknown input field', () => {
    const r = runCalc('sso-inclination', { altitudeKm: 700, altitude: 700 });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(Object.keys(r.fields)).toEqual(['altitude']);
  });

  it('names out-of-range fields with the unit', () => {
    const r = runCalc('node-rate', { altitudeKm: 50, inclinationDeg: 181, eccentricity: 1 });
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.fields.altitudeKm).toMatch(/at least 100 km/);
      expect(r.fields.inclinationDeg).toMatch(/at most 180 deg/);
      expect(r.fields.eccentricity).toMatch(/at most/);
    }
  });

  it('fills defaults and stamps the engine version', () => {
    const r = runCalc('sso-inclination', {});
    expect(r.ok).toBe(true);
    if (r.ok) {
      expect(r.result.inputs).toEqual({ altitudeKm: 700, eccentricity: 0, theory: 'zonal' });
      expect(r.result.engineVersion).toBe(engineVersion);
    }
  });

  it('rejects non-object inputs', () => {
    for (const raw of [null, 3, 'x', [1]]) {
      const r = runCalc('sso-inclination', raw);
      expect(r.ok).toBe(false);
      if (!r.ok) expect(r.fields.inputs).toBeDefined();
    }
  });
});

describe('defineKind guards', () => {
  it('turns a non-finite output into an error naming the output, and a thrown error into a failure', async () => {
    const { defineKind } = await import('../../../lib/calc/registry');
    const { numberField } = await import('../../../lib/calc/fields');
    const model = { method: 'test', assumptions: [], references: ['none'] };
    const nan = defineKind({
      kind: 't-nan',
      title: 't',
      summary: 't',
      inputs: { x: numberField('x', null, { min: 0, max: 1, default: 0 }) },
      outputs: [],
      model,
      compute: (v) => ({ outputs: { y: 1 / v.x, rows: [{ z: 1 }] }, warnings: [] }),
    });
    const r = nan.run({});
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.fields.calculation).toMatch(/outputs\.y is not a finite number/);
    expect(nan.run({ x: 0.5 }).ok).toBe(true);
    const boom = defineKind({
      kind: 't-throw',
      title: 't',
      summary: 't',
      inputs: {},
      outputs: [],
      model,
      compute: () => {
        throw new Error('boom');
      },
    });
    const b = boom.run({});
    expect(b.ok).toBe(false);
    if (!b.ok) expect(b.fields.calculation).toBe('boom');
  });
});

describe('input messages: each kind of bad input gets its own message naming the field and its unit', () => {
  // Checked against the field metadata each kind publishes (listCalcKinds): name, unit and range.
  const wrongTypes: [unknown, RegExp][] = [
    ['abc', /\(got text "abc"\)/],
    [true, /\(got boolean true\)/],
    [null, /\(got null\)/],
    [[700], /\(got a list\)/],
  ];

  it.each([
    ['sso-inclination', 'altitudeKm', /^altitudeKm: must be a number in km from 100 to 6000 /],
    ['node-rate', 'inclinationDeg', /^inclinationDeg: must be a number in deg from 0 to 180 /],
    ['repeat-orbit', 'days', /^days: must be an integer in d from 1 to 100 /],
  ])('%s: a wrong-type %s is reported as a wrong type, not as missing', (kind, field, expected) => {
    for (const [value, got] of wrongTypes) {
      const r = runCalc(kind, { [field]: value });
      expect(r.ok).toBe(false);
      if (r.ok) continue;
      expect(r.fields[field]).toMatch(expected);
      expect(r.fields[field]).toMatch(got);
      expect(r.fields[field]).not.toMatch(/required/);
    }
  });

  it.each([
    ['sso-inclination', 'altitudeKm', 'km'],
    ['node-rate', 'inclinationDeg', 'deg'],
  ])('%s: a non-finite %s is reported as not finite, with the unit', (kind, field, unit) => {
    for (const value of [Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY]) {
      const r = runCalc(kind, { [field]: value });
      expect(r.ok).toBe(false);
      if (!r.ok) expect(r.fields[field]).toBe(`${field}: must be a finite number in ${unit} (got ${String(value)})`);
    }
  });

  it('reports a fractional value for an integer field as not an integer, with the unit', () => {
    const r = runCalc('repeat-orbit', { revolutions: 14, days: 2.5 });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.fields.days).toBe('days: must be an integer in d from 1 to 100 (got 2.5)');
  });

  it.each([
    ['sso-inclination', { altitudeKm: 50 }, 'altitudeKm', 'altitudeKm: must be at least 100 km (got 50)'],
    ['node-rate', { inclinationDeg: 181 }, 'inclinationDeg', 'inclinationDeg: must be at most 180 deg (got 181)'],
    ['repeat-orbit', { revolutions: 14, days: 101 }, 'days', 'days: must be at most 100 d (got 101)'],
  ])('%s: an out-of-range value names the bound, the unit and the value sent', (kind, inputs, field, message) => {
    const r = runCalc(kind, inputs);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.fields[field]).toBe(message);
  });

  it('reports a missing required field as required, with what it accepts and its unit', async () => {
    const { defineKind } = await import('../../../lib/calc/registry');
    const { numberField } = await import('../../../lib/calc/fields');
    const model = { method: 'test', assumptions: [], references: ['none'] };
    const k = defineKind({
      kind: 't-required',
      title: 't',
      summary: 't',
      inputs: { massKg: numberField('Mass', 'kg', { min: 0.1, max: 1000 }) },
      outputs: [],
      model,
      compute: (v) => ({ outputs: { m: v.massKg }, warnings: [] }),
    });
    const missing = k.run({});
    expect(missing.ok).toBe(false);
    if (!missing.ok) expect(missing.fields.massKg).toBe('massKg: is required: a number in kg from 0.1 to 1000');
    const wrong = k.run({ massKg: '5' });
    expect(wrong.ok).toBe(false);
    if (!wrong.ok) expect(wrong.fields.massKg).toBe('massKg: must be a number in kg from 0.1 to 1000 (got text "5")');
    const missingText = runCalc('expression', {});
    expect(missingText.ok).toBe(false);
    if (!missingText.ok) expect(missingText.fields.expression).toBe('expression: is required: a text string');
  });
});
