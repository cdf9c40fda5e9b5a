/**
 * The printed form of a checked requirement (value, condition, margin,
 * source) against the server's evaluation of a small memo, and the ids a
 * new or pasted requirement gets.
 */
import { describe, expect, it } from 'vitest';
import { evaluateDocument } from '@/lib/documents/evaluate-document';
import { checkRequirementWith, conditionText } from '@/lib/requirements/check-requirements';
import { lookupInEvaluations } from '@/lib/requirements/lookup-outputs';
import { nextRequirementId, requirementAttrsSchema } from '@/lib/requirements/requirement-attrs';
import { calc, doc, typed } from '@/lib/templates/build-doc';

const req = (attrs: Record<string, string>) => requirementAttrsSchema.parse({ requirementId: 'REQ-ORB-001', ...attrs });

describe('checkRequirementWith over server evaluations', () => {
  // A 175-revolution, 12-day repeat orbit: mean altitude 692.837 km (engine output at 3 decimals, as the template shows it).
  const evaluations = evaluateDocument(
    doc(calc('repeat', 'repeat-orbit', 'Selected repeat orbit', { revolutions: typed('175'), days: typed('12') })),
  );
  const lookup = lookupInEvaluations(evaluations);

  it('prints the value, the condition with the threshold as typed, a signed margin and the source', () => {
    const c = checkRequirementWith(
      req({
        blockId: 'repeat',
        output: 'altitudeKm',
        comparison: 'le',
        threshold: '700 km',
        text: 'Mean altitude at most 700 km',
      }),
      lookup,
    );
    expect(c.verdict.status).toBe('pass');
    expect(c.valueText).toBe('692.837 km');
    expect(c.conditionText).toBe('≤ 700 km');
    expect(c.marginText).toBe('+7.163 km');
    expect(c.source).toBe('Selected repeat orbit · Mean altitude (a − equatorial radius)');
    const short = checkRequirementWith(
      req({ blockId: 'repeat', output: 'altitudeKm', comparison: 'ge', threshold: '0.7 Mm' }),
      lookup,
    );
    expect(short.marginText).toBe('−7.163 km');
  });

  it('says why when the block or output is missing or none is chosen', () => {
    expect(checkRequirementWith(req({ blockId: 'gone', output: 'altitudeKm', threshold: '1' }), lookup).source).toBe(
      'block gone is not in the memo',
    );
    expect(
      checkRequirementWith(req({ blockId: 'repeat', output: 'nope', threshold: '1' }), lookup).verdict,
    ).toMatchObject({ status: 'undecided', reason: 'Selected repeat orbit has no output nope' });
    expect(checkRequirementWith(req({ threshold: '1' }), lookup).verdict).toMatchObject({
      status: 'undecided',
      reason: 'no calc output chosen',
    });
  });

  it('writes a bare threshold with the output unit, and within as target ± tolerance', () => {
    expect(conditionText({ comparison: 'ge', threshold: '98.2', tolerance: '' }, 'deg')).toBe('≥ 98.2°');
    expect(conditionText({ comparison: 'within', threshold: '10.5', tolerance: '15 min' }, 'h')).toBe(
      '10.5 h ± 15 min',
    );
  });
});

describe('nextRequirementId', () => {
  it('continues the numbering of the prefix used, skipping ids taken', () => {
    expect(nextRequirementId([])).toBe('REQ-ORB-001');
    expect(nextRequirementId(['REQ-ORB-001', 'REQ-ORB-007'], 'REQ-ORB-007')).toBe('REQ-ORB-008');
    expect(nextRequirementId(['SYS-12', 'SYS-13'], 'SYS-12')).toBe('SYS-14');
  });
});
