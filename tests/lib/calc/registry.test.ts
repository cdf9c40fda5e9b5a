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
    const nan = defineKind({ kind: 't-nan', title: 't', summary: 't', inputs: { x: numberField('x', null, { min: 0, max: 1, default: 0 }) }, outputs: [], model, compute: (v) => ({ outputs: { y: 1 / v.x, rows: [{ z: 1 }] }, warnings: [] }) });
    const r = nan.run({});
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.fields.calculation).toMatch(/outputs\.y is not a finite number/);
    expect(nan.run({ x: 0.5 }).ok).toBe(true);
    const boom = defineKind({ kind: 't-throw', title: 't', summary: 't', inputs: {}, outputs: [], model, compute: () => { throw new Error('boom'); } });
    const b = boom.run({});
    expect(b.ok).toBe(false);
    if (!b.ok) expect(b.fields.calculation).toBe('boom');
  });
});
