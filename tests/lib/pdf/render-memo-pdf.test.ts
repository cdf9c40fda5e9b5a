/**
 * The memo PDF read back with poppler: numbers are the engine's (runCalc
 * results formatted at each output's display precision), every page has
 * the running header, "page X of N" and the DRAFT marking, the contents
 * point at the pages the headings are on, figures are vector (no raster
 * image in a memo without photos), and the appendix lists the engine's
 * constants and the methods used.
 */
import fs from 'node:fs';
import { beforeAll, describe, expect, it } from 'vitest';
import { engineVersion, getCalcKind, listConstants, runCalc } from '@/lib/calc';
import { formatValue } from '@/lib/format/format-output';
import { formatConstant } from '@/lib/pdf/appendix-view';
import { documentIndex } from '@/lib/documents/model/document-index';
import { renderMemoPdf } from '@/lib/pdf/render-memo-pdf';
import { CAUTION_TEXT } from '@/lib/pdf/pdf-text';
import { evaluate, pdfTestDocument, pdfTestMemo } from './support/pdf-test-memo';
import { listImages, pageTexts, pageToPng, pdfInfo, writePdf } from './support/pdf-tools';

/** An engine output as the PDF prints it. */
function shown(kind: string, inputs: Record<string, unknown>, output: string): string {
  const outcome = runCalc(kind, inputs);
  if (!outcome.ok) throw new Error(outcome.error);
  const field = getCalcKind(kind)?.outputs.find((o) => o.name === output);
  if (!field) throw new Error(`${kind} has no output ${output}`);
  return formatValue(outcome.result.outputs[output], field.unit, field.precision);
}

function rawOutput(kind: string, inputs: Record<string, unknown>, output: string): number {
  const outcome = runCalc(kind, inputs);
  if (!outcome.ok) throw new Error(outcome.error);
  return outcome.result.outputs[output] as number;
}

describe('memo PDF, A4 draft', () => {
  let file = '';
  let pages: string[] = [];
  let all = '';
  const doc = pdfTestDocument();

  beforeAll(async () => {
    // The organisation comes from the setting (lib/organisation); the test passes the demo's as the seed stores it.
    const bytes = await renderMemoPdf({
      memo: pdfTestMemo(doc),
      evaluations: evaluate(doc),
      paper: 'a4',
      draft: true,
      organisation: 'Brightwater Orbital',
    });
    file = writePdf('memo-a4-draft.pdf', bytes);
    pages = pageTexts(file);
    all = pages.join(' ');
  }, 120_000);

  it('is an A4 document of more than ten pages with the memo as its title', () => {
    const info = pdfInfo(file);
    expect(info['Page size']).toMatch(/^595\.2\d* x 841\.8\d* pts/);
    expect(Number(info.Pages)).toBeGreaterThan(10);
    expect(Number(info.Pages)).toBe(pages.length);
    expect(info.Title).toBe('BWO-TL1-DM-001 TERNLIGHT-1 orbit design rationale');
  });

  it('quotes the engine values at display precision in the live text', () => {
    const repeat = { revolutions: 175, days: 12 };
    const altitudeKm = rawOutput('repeat-orbit', repeat, 'altitudeKm');
    const sso = { altitudeKm, eccentricity: 0.0011 };
    expect(all).toContain(
      `The selected orbit has a mean altitude of ${shown('repeat-orbit', repeat, 'altitudeKm')} (semi-major axis ${shown('repeat-orbit', repeat, 'semiMajorAxisKm')})`,
    );
    expect(all).toContain(
      `requires an inclination of ${shown('sso-inclination', sso, 'inclinationDeg')}, for a node rate of ${shown('sso-inclination', sso, 'nodeRateDegPerDay')}`,
    );
    const inclinationDeg = rawOutput('sso-inclination', sso, 'inclinationDeg');
    const inject = { altitudeKm, inclinationDeg, inclinationErrorDeg: 0.05, altitudeErrorKm: 5 };
    expect(all).toContain(
      `drift the node local time by ${shown('injection-sensitivity', inject, 'driftFromInclinationMinPerYear')}`,
    );
    const drag = { altitudeKm, massKg: 310, areaM2: 1.6, dragCoefficient: 2.2, solarActivity: 'moderate' };
    expect(all).toContain(
      `holding it costs about ${shown('drag-decay', drag, 'maintenanceDeltaVMpsPerYear')} per year`,
    );
    // The example values are what we expect of a 175/12 sun-synchronous orbit: about 693 km at 98.16°.
    expect(altitudeKm).toBeGreaterThan(690);
    expect(altitudeKm).toBeLessThan(696);
  });

  it('prints each calc block with its inputs, results and units, and its model note', () => {
    const repeat = { revolutions: 175, days: 12 };
    expect(all).toContain('Selected repeat orbit');
    expect(all).toContain(`Nodal period ${shown('repeat-orbit', repeat, 'nodalPeriodMin')}`);
    expect(all).toContain('Revolutions per repeat cycle 175');
    expect(all).toContain('Method. Repeat condition');
    // A referenced input shows its source block and the upstream value at its precision.
    expect(all).toMatch(
      new RegExp(
        `Mean altitude \\(mean semi-major axis − equatorial radius\\) from Selected repeat orbit \\(mean altitude \\(a − equatorial radius\\)\\) ${shown('repeat-orbit', repeat, 'altitudeKm').replace('.', '\\.')}`,
      ),
    );
    // A rows output is a numbered table cut to its first rows, pointing at the full table in the annex.
    const count = runCalc('repeat-options', { minAltitudeKm: 600, maxAltitudeKm: 800, maxDays: 16 });
    const rows = count.ok ? (count.result.outputs.options as unknown[]).length : NaN;
    expect(all).toMatch(
      new RegExp(
        `Table \\d+\\. Repeat cycles in the altitude band: repeat options \\(first 8 of ${rows} rows; all rows in Table A-1\\)`,
      ),
    );
    expect(all).toMatch(
      new RegExp(
        `Table A-1\\. Repeat cycles in the altitude band: repeat options \\(all ${rows} rows; cut in Table \\d+\\)`,
      ),
    );
  });

  it('shows a live value whose block is gone as a visible placeholder', () => {
    expect(all).toContain(
      'A broken reference: [value unavailable: the calc block it quotes is no longer in the memo].',
    );
  });

  it('carries the running header, "page X of N" and the DRAFT marking on every page', () => {
    pages.forEach((text, i) => {
      expect(text).toContain(`page ${i + 1} of ${pages.length}`);
      expect(text).toContain('BWO-TL1-DM-001 · Draft, version 7');
      expect(text).toContain('DRAFT — not a frozen revision');
      expect(text).toMatch(/\bDRAFT\b/);
    });
  });

  it('has a title page with number, title, revision, date, author, organisation, distribution, approvals and the caution', () => {
    const title = pages[0];
    for (const s of [
      'BWO-TL1-DM-001',
      'TERNLIGHT-1 orbit design rationale',
      'Draft, version 7',
      '2027-06-01',
      'Ilse Marrow',
      'Brightwater Orbital',
      'Distribution:',
      'Approval',
      'Configuration manager',
      'Tobias Quenby',
    ])
      expect(title).toContain(s);
    expect(title).toContain(CAUTION_TEXT);
    expect(pages[1]).toContain(
      'Revision record Revision Date Description Author Reviewed by Released by Draft 2027-06-01 Working draft, version 7; not released. Ilse Marrow Tobias Quenby –',
    );
  });

  it('lists every heading in the contents with the page it is printed on', () => {
    const contents = pages[1];
    const headings: [string, string][] = [
      ['1', 'Purpose and scope'],
      ['3.1', 'Coverage'],
      ['6', 'Sun and eclipse geometry'],
      ['10', 'Design state for the launcher'],
      ['12.1.1', 'Review notes'],
      ['13', 'Conclusion'],
    ];
    for (const [number, title] of headings) {
      const m = new RegExp(`${number.replace(/\./g, '\\.')} ${title} (\\d+)`).exec(contents);
      expect(m, `${number} ${title} in the contents`).not.toBeNull();
      const page = Number(m?.[1]);
      const bodyPage = pages.findIndex((p, i) => i > 1 && p.includes(`${number} ${title}`)) + 1;
      expect(page).toBe(bodyPage);
    }
  });

  it('has a bookmark (PDF outline entry) for every numbered heading, in document order', () => {
    const raw = fs.readFileSync(file).toString('latin1');
    expect(raw).toMatch(/\/Outlines \d+ 0 R/);
    const titles = [...raw.matchAll(/\/Title \(([^)]*)\)/g)].map((m) => m[1]);
    expect(titles).toEqual(
      expect.arrayContaining([
        '1  Purpose and scope',
        '3.1  Coverage',
        '6  Sun and eclipse geometry',
        '10  Design state for the launcher',
        '13  Conclusion',
      ]),
    );
    expect(titles.indexOf('3.1  Coverage')).toBeGreaterThan(titles.indexOf('1  Purpose and scope'));
    expect(titles.indexOf('13  Conclusion')).toBeGreaterThan(titles.indexOf('10  Design state for the launcher'));
  });

  it('draws figures as vector graphics with numbered captions: no raster image, axis titles as text', () => {
    expect(listImages(file)).toEqual([]);
    const figures = documentIndex(doc).figures;
    expect(figures.length).toBeGreaterThanOrEqual(6);
    const numbers = documentIndex(doc).figureNumbers;
    for (const f of figures) expect(all).toContain(`Figure ${numbers.get(f.figureId)}. ${f.caption}`);
    expect(figures.map((f) => numbers.get(f.figureId))).toEqual(figures.map((_, i) => i + 1));
    for (const axis of [
      'Mean altitude (km)',
      'Repeat cycle (days)',
      'Beta angle (deg)',
      'Node local-time drift (min)',
      'Longitude (deg)',
    ])
      expect(all).toContain(axis);
  });

  it('ends with the appendix: every engine constant with value, unit and source, every method used, the engine version', () => {
    // (the contents page names the appendix too; its own first page carries the engine version line)
    const start = pages.findIndex((p) => p.includes('Appendix B Constants and models Generated from the calc engine'));
    expect(start).toBeGreaterThan(1);
    const appendix = pages.slice(start).join(' ');
    for (const c of listConstants()) {
      expect(appendix).toContain(c.name);
      expect(appendix).toContain(formatConstant(c.value).replace(/\u00a0/g, ' '));
    }
    expect(appendix).toContain('WGS-84, NIMA TR8350.2');
    expect(appendix).toContain(engineVersion);
    for (const kind of [
      'repeat-options',
      'repeat-orbit',
      'coverage',
      'sso-inclination',
      'node-local-time',
      'sun-geometry',
      'frozen-orbit',
      'drag-decay',
      'injection-sensitivity',
      'ground-track',
    ]) {
      expect(appendix).toContain(getCalcKind(kind)?.title);
    }
  });

  it('writes page 1 and a figure page as PNG for a person to look at', () => {
    const first = pageToPng(file, 1, 'memo-a4-draft-page1');
    const figurePage = pages.findIndex((p) => p.includes('Figure 2.')) + 1;
    expect(figurePage).toBeGreaterThan(2);
    const second = pageToPng(file, figurePage, 'memo-a4-draft-figure');
    for (const png of [first, second]) expect(fs.statSync(png).size).toBeGreaterThan(20_000);
  });
});

describe('formatConstant', () => {
  it("keeps the published digits of a constant (up to 12 significant) and drops a derived one's floating-point tail", () => {
    // 1/298.257223563, WGS-84's flattening (NIMA TR8350.2 Table 3.1), is 3.3528106647474805e-3 as a double.
    expect(formatConstant(1 / 298.257223563)).toBe('3.35281066475\u00a0×\u00a010⁻³');
    expect(formatConstant(398600.4418)).toBe('398600.4418');
    expect(formatConstant(1.08262668355e-3)).toBe('1.08262668355\u00a0×\u00a010⁻³');
    expect(formatConstant(149597870.7)).toBe('1.495978707\u00a0×\u00a010⁸');
  });
});
