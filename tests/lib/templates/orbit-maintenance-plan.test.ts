/**
 * A memo created from the orbit-maintenance-plan template, as the analyst's "New memo" does, computes every block,
 * every live value and every figure, and its ΔV budget carries exactly the numbers of the blocks that feed it.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { createMemo } from '@/lib/memos/create-memo';
import { getMemo } from '@/lib/memos/get-memo';
import { evaluateDocument, type BlockEvaluation } from '@/lib/documents/evaluate-document';
import { documentIndex } from '@/lib/documents/model/document-index';
import { buildFigureSpec } from '@/lib/figures/build-figure-spec';
import type { TiptapDoc } from '@/lib/memos/memo-schema';
import type { Actor } from '@/lib/auth/permissions';
import { freshDatabase, makeUser } from '../../support/factories';

let content: TiptapDoc;
let ev: Map<string, BlockEvaluation>;

const out = (blockId: string, name: string): number => {
  const e = ev.get(blockId);
  if (e?.status !== 'ok') throw new Error(`${blockId} has no result`);
  return e.result.outputs[name] as number;
};

beforeAll(async () => {
  await freshDatabase();
  const analyst: Actor = await makeUser('analyst', 'Ilse');
  const created = await createMemo(analyst, {
    title: 'TERNLIGHT-1 orbit maintenance plan',
    templateId: 'orbit-maintenance-plan',
  });
  content = (await getMemo(analyst, created.id)).content as TiptapDoc;
  ev = new Map(evaluateDocument(content));
}, 60_000);

describe('memo from the orbit-maintenance-plan template', () => {
  it('computes every block without error, every live value resolves, every figure builds', () => {
    const failed = [...ev.values()]
      .filter((e) => e.status !== 'ok')
      .map((e) => `${e.blockId}: ${e.status === 'error' ? e.error : e.status}`);
    expect(failed).toEqual([]);
    expect([...ev.keys()]).toEqual(
      expect.arrayContaining(['orbit', 'inject', 'solar', 'decay', 'maint', 'frozen', 'disposal', 'budget']),
    );
    for (const v of documentIndex(content).liveValues) {
      const e = ev.get(v.blockId);
      expect(e?.status === 'ok' && v.output in e.result.outputs, `${v.blockId}.${v.output}`).toBe(true);
    }
    const figures = documentIndex(content).figures;
    expect(figures.map((f) => f.figureKind)).toEqual([
      'node-local-time-mission',
      'decay-solar-flux',
      'dispersion-histogram',
    ]);
    for (const f of figures) {
      const outcome = buildFigureSpec(f.figureKind, ev.get(f.blockId));
      expect(outcome.ok ? 'ok' : outcome.error, f.figureId).toBe('ok');
    }
  }, 60_000);

  it('the ΔV budget lines are the outputs of the blocks that feed them (exactly), and the total is their sum plus 10 %', () => {
    expect(out('budget', 'injectionCorrectionMps')).toBe(out('inject', 'planeChangeDeltaVMps'));
    expect(out('budget', 'inclinationMps')).toBeCloseTo(out('solar', 'inclinationHoldDeltaVMpsPerYear') * 5, 12);
    expect(out('budget', 'altitudeMaintenanceMps')).toBeCloseTo(out('maint', 'deltaVPerYearMps') * 5, 12);
    expect(out('budget', 'disposalMps')).toBe(out('disposal', 'deorbitDeltaVMps'));
    const sum =
      out('inject', 'planeChangeDeltaVMps') +
      5 * out('solar', 'inclinationHoldDeltaVMpsPerYear') +
      5 * out('maint', 'deltaVPerYearMps') +
      out('disposal', 'deorbitDeltaVMps');
    expect(out('budget', 'totalDeltaVMps')).toBeCloseTo(sum * 1.1, 9);
  });

  it("the demo satellite's mission-life picture is in the range of the engine issue's 700 km / 22:30 figures (−71 min after 5 years, ≈ 4.3 m/s/yr; ±10 %)", () => {
    expect(Math.abs(out('solar', 'ltanDeviationEndMin') / -71 - 1)).toBeLessThan(0.1);
    expect(Math.abs(out('solar', 'inclinationHoldDeltaVMpsPerYear') / 4.3 - 1)).toBeLessThan(0.1);
    // ±15 min tolerance: the optimal bias covers the five-year mission, so the template's sentence holds
    expect(out('solar', 'yearsWithinTolerance')).toBeGreaterThan(5);
  });
});
