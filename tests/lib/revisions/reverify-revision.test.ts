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
    content: [{ type: 'calcBlock', attrs: { blockId: 'sso', kind: 'sso-inclination', label: 'SSO', inputs: { altitudeKm: { text: '700' } } } }],
  };
  await Memo.update({ content: content as never, status: 'frozen' }, { where: { id: memoId } });
  const frozenOutputs = { inclinationDeg: 98.18796588352930, semiMajorAxisKm: 7078.137, nodalPeriodMin: 98.78, revsPerDay: 14.577, nodeRateDegPerDay: 0.9856473 };
  await Revision.create({
    memoId, letter: 'A', memoVersion: 1, documentNumber: memo.documentNumber, title: memo.title, content: content as never,
    blocks: [{ blockId: 'sso', kind: 'sso-inclination', label: 'SSO', storedInputs: { altitudeKm: { text: '700' } }, inputs: { altitudeKm: 700, eccentricity: 0 }, outputs: frozenOutputs, warnings: [], engineVersion: 'nodewright-calc 1.1.0' }],
    engineVersion: 'nodewright-calc 1.1.0', constants: [], figures: [],
    approval: { author: { id: analyst.id, name: 'Author', submittedAt: null }, reviewers: [], configurationManager: { id: cm.id, name: cm.name, frozenAt: new Date().toISOString() } },
    changeSummary: 'Frozen with engine 1.1.0.', pdfData: Buffer.from('%PDF-1.7\n%%EOF\n'), pdfSha256: '0'.repeat(64), frozenBy: cm.id, frozenAt: new Date(),
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
});
