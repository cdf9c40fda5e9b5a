import { describe, expect, it } from 'vitest';
import { getCalcKind, runCalc } from '@/lib/calc';
import { phraseInputProblem, phraseInputProblems } from '@/lib/documents/phrase-input-problem';
import { resolveBlockInputs } from '@/lib/documents/resolve-block-inputs';

const sso = getCalcKind('sso-inclination')!;

/** Checked against the engine's own refusals: what a person reads names fields by label, never by id. */
describe('phraseInputProblem', () => {
  it('turns the engine refusal "altitudeKm: must be at most …" into a sentence led by the field label', () => {
    const out = runCalc('sso-inclination', { altitudeKm: 50000, eccentricity: 0.001 });
    expect(out.ok).toBe(false);
    if (out.ok) return;
    expect(out.fields.altitudeKm).toMatch(/^altitudeKm: /);
    const phrased = phraseInputProblem(sso, 'altitudeKm', out.fields.altitudeKm);
    expect(phrased.label).toBe(sso.inputs.find((f) => f.name === 'altitudeKm')!.label);
    expect(phrased.sentence).toBe(`${phrased.label} must be at most 6000 km (got 50000).`);
    expect(phrased.sentence).not.toContain('altitudeKm');
  });

  it('keeps a message that is already a sentence, and capitalises and ends it', () => {
    expect(phraseInputProblem(sso, 'altitudeKm', '“abc” is not a number').sentence).toBe('“abc” is not a number.');
    expect(phraseInputProblem(sso, 'eccentricity', 'Eccentricity is required').sentence).toBe(
      'Eccentricity is required.',
    );
    expect(phraseInputProblem(sso, '_', 'blocks a and b feed each other').label).toBe('Inputs');
  });

  it('lists every problem in the kind’s field order, with no field id left', () => {
    const out = runCalc('sso-inclination', { eccentricity: 'x', altitudeKm: 50000 });
    if (out.ok) throw new Error('expected a refusal');
    const lines = phraseInputProblems(sso, {
      eccentricity: out.fields.eccentricity,
      altitudeKm: out.fields.altitudeKm,
    });
    expect(lines).toHaveLength(2);
    expect(lines[0]).toMatch(/^Mean altitude/);
    expect(lines[1]).toMatch(/^Eccentricity must be a number from 0 to 0.5/);
    expect(lines.join(' ')).not.toMatch(/altitudeKm|eccentricity:/);
  });

  it('resolveBlockInputs reports unreadable text by label', () => {
    const resolved = resolveBlockInputs(
      { blockId: 'b', kind: 'sso-inclination', label: '', inputs: { altitudeKm: { text: '700 kg' } } } as never,
      sso,
      new Map(),
      new Map(),
    );
    expect(resolved.ok).toBe(false);
    if (resolved.ok) return;
    expect(resolved.error).toMatch(/^Check the inputs\. Mean altitude/);
    expect(resolved.error).not.toContain('altitudeKm');
  });
});
