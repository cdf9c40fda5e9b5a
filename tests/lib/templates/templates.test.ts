import { describe, expect, it } from 'vitest';
import { MEMO_TEMPLATES, getTemplate } from '@/lib/templates';
import { evaluateDocument } from '@/lib/documents/evaluate-document';
import { documentIndex } from '@/lib/documents/model/document-index';
import { buildFigureSpec } from '@/lib/figures/build-figure-spec';
import { validateMemoContent } from '@/lib/documents/validate-memo-content';

describe('memo templates', () => {
  it('offers the three starting documents, each a valid stored document', () => {
    expect(MEMO_TEMPLATES.map((t) => t.id)).toEqual(['sso-design-rationale', 'candidate-trade-study', 'orbit-maintenance-plan']);
    for (const t of MEMO_TEMPLATES) expect(validateMemoContent(t.build(), { attachmentUrls: new Set(), linkTargets: 'allow-list' }).ok, t.id).toBe(true);
    expect(getTemplate('nope')).toBeUndefined();
  });

  it('every figure in a template draws from a block of a kind it accepts', () => {
    for (const t of MEMO_TEMPLATES) {
      const doc = t.build();
      const ev = evaluateDocument(doc);
      for (const f of documentIndex(doc).figures) {
        const outcome = buildFigureSpec(f.figureKind, ev.get(f.blockId));
        expect(outcome.ok ? 'ok' : outcome.error, `${t.id}/${f.figureId}`).toBe('ok');
      }
    }
    expect(documentIndex(getTemplate('sso-design-rationale')!.build()).figures.length).toBe(5);
  });
});
