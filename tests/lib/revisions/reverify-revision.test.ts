import { beforeAll, describe, expect, it } from 'vitest';
import { Memo, Revision } from '@/models';
import { engineVersion } from '@/lib/calc';
import { reverifyRevision } from '@/lib/revisions/reverify-revision';
import { freshDatabase, makeMemo, makeUser } from '../../support/factories';
import type { Actor } from '@/lib/auth/permissions';

/**
 * A revision frozen with engine 1.1.0 (first-order J2): its sun-synchronous inclination at 700 km was
 * 98.18797° (Kozai 1959 closed form, as the 1.1.0 engine printed it). Re-verified with engine 2.0.0 the
 * number moves to the zonal theory's 98.20592°, and the report says which engine change moved it.
 * A requirement frozen with it, inclination at most 98.195° (98.188° shown: met by 0.007°), is not met
 * any more on the recomputed 98.206° (0.011° over); one on the semi-major axis (7078.137 km ≥ 7000 km)
 * keeps its verdict.
 */
let cm: Actor;
let memoId: number;

beforeAll(async () => {
  await freshDatabase();
  const analyst = await makeUser('analyst');
  cm = await makeUser('config-manager');
  const memo = await makeMemo(analyst);
  memoId = memo.id;
  const content = {
    type: 'doc',
    content: [
      {
        type: 'calcBlock',
        attrs: { blockId: 'sso', kind: 'sso-inclination', label: 'SSO', inputs: { altitudeKm: { text: '700' } } },
      },
      {
        type: 'requirement',
        attrs: {
          requirementId: 'REQ-ORB-001',
          text: 'Inclination at most 98.195°.',
          blockId: 'sso',
          output: 'inclinationDeg',
          comparison: 'le',
          threshold: '98.195 deg',
          tolerance: '',
        },
      },
      {
        type: 'requirement',
        attrs: {
          requirementId: 'REQ-ORB-002',
          text: 'Semi-major axis at least 7000 km.',
          blockId: 'sso',
          output: 'semiMajorAxisKm',
          comparison: 'ge',
          threshold: '7000 km',
          tolerance: '',
        },
      },
    ],
  };
  await Memo.update({ content: content as never, status: 'frozen' }, { where: { id: memoId } });
  const frozenOutputs = {
    inclinationDeg: 98.1879658835293,
    semiMajorAxisKm: 7078.137,
    nodalPeriodMin: 98.78,
    revsPerDay: 14.577,
    nodeRateDegPerDay: 0.9856473,
  };
  await Revision.create({
    memoId,
    letter: 'A',
    memoVersion: 1,
    documentNumber: memo.documentNumber,
    title: memo.title,
    content: content as never,
    blocks: [
      {
        blockId: 'sso',
        kind: 'sso-inclination',
        label: 'SSO',
        storedInputs: { altitudeKm: { text: '700' } },
        inputs: { altitudeKm: 700, eccentricity: 0 },
        outputs: frozenOutputs,
        warnings: [],
        engineVersion: 'nodewright-calc 1.1.0',
      },
    ],
    engineVersion: 'nodewright-calc 1.1.0',
    constants: [],
    figures: [],
    approval: {
      author: { id: analyst.id, name: 'Author', submittedAt: null },
      reviewers: [],
      configurationManager: { id: cm.id, name: cm.name, frozenAt: new Date().toISOString() },
    },
    changeSummary: 'Frozen with engine 1.1.0.',
    pdfData: Buffer.from('%PDF-1.7\n%%EOF\n'),
    pdfSha256: '0'.repeat(64),
    frozenBy: cm.id,
    frozenAt: new Date(),
  });
});

describe('re-verifying a revision frozen with an older engine', () => {
  it('lists the moved inclination with the 2.0.0 zonal-theory change as its reason', async () => {
    const report = await reverifyRevision(cm, memoId, 'A');
    expect(report.frozenEngineVersion).toBe('nodewright-calc 1.1.0');
    expect(report.currentEngineVersion).toBe(engineVersion);
    const inc = report.differences.find((d) => d.output === 'inclinationDeg');
    expect(inc).toBeDefined();
    expect(inc!.frozen).toBeCloseTo(98.188, 3);
    expect(inc!.now as number).toBeCloseTo(98.206, 3);
    expect(inc!.reasons.join(' ')).toMatch(/2\.0\.0: Secular rates now default to the zonal theory/);
    // the semi-major axis did not move (it is the input altitude + R⊕)
    expect(report.differences.find((d) => d.output === 'semiMajorAxisKm')).toBeUndefined();
    for (const d of report.differences) expect(d.reasons.length).toBeGreaterThan(0);
  });

  it('reports the requirement whose verdict changed, with both values and margins; the other keeps its verdict', async () => {
    const report = await reverifyRevision(cm, memoId, 'A');
    expect(report.requirements.map((r) => [r.requirementId, r.frozen.status, r.now.status])).toEqual([
      ['REQ-ORB-001', 'pass', 'fail'],
      ['REQ-ORB-002', 'pass', 'pass'],
    ]);
    expect(report.changedVerdicts).toEqual([
      {
        requirementId: 'REQ-ORB-001',
        text: 'Inclination at most 98.195°.',
        condition: '≤ 98.195 deg',
        frozen: { status: 'pass', value: '98.188°', margin: '+0.007°' },
        now: { status: 'fail', value: '98.206°', margin: '−0.011°' },
      },
    ]);
  });
});
