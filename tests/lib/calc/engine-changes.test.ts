import { describe, expect, it } from 'vitest';
import { engineVersion } from '../../../lib/calc/constants';
import { ENGINE_CHANGES, explainMovedOutput, parseEngineVersion } from '../../../lib/calc/engine-changes';
import { listCalcKinds } from '../../../lib/calc/index';

describe('engine change log', () => {
  it('has an entry for the current engine version and names only kinds that exist', () => {
    const current = parseEngineVersion(engineVersion)!.join('.');
    expect(ENGINE_CHANGES.some((c) => c.version === current)).toBe(true);
    const kinds = new Set(listCalcKinds().map((k) => k.kind));
    for (const c of ENGINE_CHANGES) if (c.kinds !== '*') for (const k of c.kinds) expect(kinds.has(k)).toBe(true);
  });

  it('explains a moved SSO inclination of a 1.1.0 revision by the zonal-theory change, and nothing for an unchanged version span', () => {
    const reasons = explainMovedOutput(
      'sso-inclination',
      'inclinationDeg',
      'nodewright-calc 1.1.0',
      'nodewright-calc 2.0.0',
    );
    expect(reasons).toHaveLength(1);
    expect(reasons[0]).toMatch(/^2\.0\.0: .*zonal theory/);
    expect(
      explainMovedOutput('sso-inclination', 'inclinationDeg', 'nodewright-calc 2.0.0', 'nodewright-calc 2.0.0'),
    ).toEqual([]);
    // drag-decay moved only by its change of default atmosphere
    expect(
      explainMovedOutput('drag-decay', 'lifetimeDays', 'nodewright-calc 1.0.0', 'nodewright-calc 2.0.0').map((r) =>
        r.slice(0, 5),
      ),
    ).toEqual(['2.0.0']);
    expect(
      explainMovedOutput('drag-decay', 'lifetimeDays', 'nodewright-calc 1.0.0', 'nodewright-calc 2.0.0')[0],
    ).toMatch(/NRLMSISE-00/);
    expect(
      explainMovedOutput('node-local-time', 'ltanHours', 'nodewright-calc 1.0.0', 'nodewright-calc 2.0.0'),
    ).toEqual([]);
    // a repeat orbit moved by both 2.0.0 changes
    expect(explainMovedOutput('repeat-orbit', 'semiMajorAxisKm', 'nodewright-calc 1.1.0', engineVersion)).toHaveLength(
      2,
    );
    // 1.0.0 → 2.0.0 includes the 1.1.0 history change for the propagation check
    expect(
      explainMovedOutput('propagation-check', 'history', 'nodewright-calc 1.0.0', engineVersion).map((r) =>
        r.slice(0, 5),
      ),
    ).toEqual(['1.1.0', '2.0.0', '2.0.0']);
  });
});
