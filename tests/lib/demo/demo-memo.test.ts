import { describe, expect, it } from 'vitest';
import { demoMemoContent } from '@/lib/demo/demo-memo';
import { evaluateDocument } from '@/lib/documents/evaluate-document';
import { validateMemoContent } from '@/lib/documents/validate-memo-content';
import { buildFigureSpec } from '@/lib/figures/build-figure-spec';

describe('the demo memo with its as-flown section', () => {
  it("passes the save check, computes every block, and its as-flown block compares the invented TLEs with the memo's own design blocks", () => {
    const content = demoMemoContent();
    expect(validateMemoContent(content, { attachmentUrls: new Set(), linkTargets: 'allow-list' }).ok).toBe(true);
    const ev = evaluateDocument(content);
    const failed = [...ev.values()].filter((e) => e.status !== 'ok').map((e) => e.blockId);
    expect(failed).toEqual([]);
    const flown = ev.get('flown');
    const repeat = ev.get('repeat');
    if (flown?.status !== 'ok' || repeat?.status !== 'ok') throw new Error('blocks missing');
    // fed from the repeat-orbit block: the design altitude is the memo's own
    expect(flown.result.inputs.designAltitudeKm).toBe(repeat.result.outputs.altitudeKm);
    expect(flown.result.outputs.elementSets).toBe(8);
    expect(Math.abs(flown.result.outputs.ltanDifferenceMin as number)).toBeLessThan(5);
    expect(buildFigureSpec('as-flown-local-time-altitude', flown).ok).toBe(true);
  });
});
