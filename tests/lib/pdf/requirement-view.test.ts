/**
 * Requirements in the PDF: each in the text with its verdict and margin,
 * and the compliance table listing every requirement with value,
 * threshold, margin, verdict and source block. Values are those of the
 * engine for a 175-revolution, 12-day repeat orbit (692.837 km mean
 * altitude at 3 decimals); margins are worked by hand beside each line.
 */
import { describe, expect, it } from 'vitest';
import { evaluateDocument } from '@/lib/documents/evaluate-document';
import type { TiptapDoc } from '@/lib/memos/memo-schema';
import { renderMemoPdf } from '@/lib/pdf/render-memo-pdf';
import { calc, complianceTable, doc, h, requirement, typed } from '@/lib/templates/build-doc';
import { pdfTestMemo } from './support/pdf-test-memo';
import { pageTexts, pageToPng, writePdf } from './support/pdf-tools';

const render = (content: TiptapDoc) =>
  renderMemoPdf({ memo: pdfTestMemo(content), evaluations: evaluateDocument(content), paper: 'a4', draft: true });

describe('requirements in the PDF', () => {
  it('prints each requirement with verdict and margin, and the compliance table of all of them', async () => {
    const content = doc(
      h(1, 'Orbit'),
      calc('repeat', 'repeat-orbit', 'Selected repeat orbit', { revolutions: typed('175'), days: typed('12') }),
      // 700 − 692.837 = +7.163 km: met
      requirement('REQ-ORB-001', 'Mean altitude at most 700 km.', ['repeat', 'altitudeKm'], 'le', '700 km'),
      // 692.837 − 695 = −2.163 km: not met
      requirement('REQ-ORB-002', 'Mean altitude at least 695 km.', ['repeat', 'altitudeKm'], 'ge', '695'),
      // a length against a time: undecided, said so
      requirement('REQ-ORB-003', 'Nodal period check with a wrong unit.', ['repeat', 'nodalPeriodMin'], 'le', '5 km'),
      h(1, 'Requirements compliance'),
      complianceTable(),
    );
    const file = writePdf('memo-requirements.pdf', await render(content));
    pageToPng(file, 1, 'memo-requirements-page1');
    const text = pageTexts(file).join('\n').replace(/\s+/g, ' ');
    expect(text).toContain('REQ-ORB-001 Mean altitude at most 700 km.');
    expect(text).toMatch(/692\.837 km required ≤ 700 km ✓ met, margin \+7\.163 km/);
    expect(text).toMatch(/required ≥ 695 km ✗ not met, margin −2\.163 km/);
    expect(text).toMatch(/\? undecided: threshold: “5 km” is not a duration; the output is in min/);
    // The table: header, one row per requirement in document order, and its summary caption.
    expect(text).toMatch(/Requirement Statement Value Required Margin Verdict From/);
    expect(text).toMatch(
      /REQ-ORB-001 Mean altitude at most 700 km\. 692\.837 km ≤ 700 km \+7\.163 km ✓ met Selected repeat orbit · Mean altitude/,
    );
    expect(text).toMatch(/REQ-ORB-002 Mean altitude at least 695 km\. 692\.837 km ≥ 695 km −2\.163 km ✗ not met/);
    expect(text).toMatch(/Requirements compliance\. 3 requirements, 2 not met or undecided\./);
  });
});
