/** The SVG reader and its mapping onto react-pdf primitives (SVG 1.1 inheritance of paint and font properties). */
import { describe, expect, it } from 'vitest';
import { isValidElement, type ReactElement, type ReactNode } from 'react';
import { Circle, ClipPath, Defs, G, Line, Path, Rect, Svg, Text } from '@react-pdf/renderer';
import { decodeEntities, parseSvg } from '@/lib/pdf/parse-svg';
import { svgToPdf } from '@/lib/pdf/svg-to-pdf';
import { MONO_STACK, SANS_STACK } from '@/lib/pdf/pdf-fonts';

type Props = Record<string, unknown> & { children?: ReactNode };

/** Every element below `el` (depth first), with its props. */
function flatten(node: ReactNode): ReactElement<Props>[] {
  if (Array.isArray(node)) return node.flatMap(flatten);
  if (!isValidElement<Props>(node)) return [];
  return [node, ...flatten(node.props.children)];
}

const SAMPLE = `<svg xmlns="http://www.w3.org/2000/svg" width="200" height="100" viewBox="0 0 200 100">
<rect width="200" height="100" fill="white"/>
<g fill="none" stroke-miterlimit="4" transform="translate(10,5)">
  <g class="mark-line" clip-path="url(#clip1)"><path d="M0,50L100,0" stroke="#2f4a7a" stroke-width="2" stroke-dasharray="6,3"/></g>
  <g font-family="IBM Plex Mono"><text text-anchor="middle" transform="translate(-19,75) rotate(-90)" font-size="10px" font-weight="bold" fill="#1d2430">Altitude &amp; time (km)</text></g>
  <text opacity="0" transform="translate(5,5)" font-size="9px">hidden</text>
  <line x2="50" stroke="#888"/>
  <circle cx="3" cy="4" r="2" fill="#a23b2a" opacity="0.5"/>
  <path d="" stroke="red"/>
</g>
<defs><clipPath id="clip1"><rect x="0" y="0" width="100" height="50"/></clipPath></defs>
</svg>`;

describe('parseSvg', () => {
  it('reads elements, attributes, text and entities', () => {
    const root = parseSvg(SAMPLE);
    expect(root.tag).toBe('svg');
    expect(root.attrs.viewBox).toBe('0 0 200 100');
    expect(root.children.filter((c) => 'tag' in c).map((c) => ('tag' in c ? c.tag : ''))).toEqual([
      'rect',
      'g',
      'defs',
    ]);
    expect(decodeEntities('a &lt;b&gt; &#x3b1; &#946; &quot;q&quot;')).toBe('a <b> α β "q"');
  });

  it('rejects what it does not understand instead of guessing', () => {
    expect(() => parseSvg('<svg><g></svg>')).toThrow(/closes <g>/);
    expect(() => parseSvg('<svg><g>')).toThrow(/not closed/);
    expect(() => decodeEntities('&nbsp;')).toThrow(/unknown entity &nbsp;/);
  });
});

describe('svgToPdf', () => {
  const el = svgToPdf(SAMPLE, 100);
  const all = flatten(el);

  it('keeps the aspect ratio when it scales down to the width, and never scales up', () => {
    expect(el.type).toBe(Svg);
    expect(el.props).toMatchObject({ width: 100, height: 50, viewBox: '0 0 200 100' });
    expect(svgToPdf(SAMPLE, 500).props).toMatchObject({ width: 200, height: 100 });
  });

  it('puts clip-path definitions first and keeps groups with their transforms and clip references', () => {
    const top = flatten((el.props as Props).children).filter((e) => e.type === Defs || e.type === G || e.type === Rect);
    expect(top[0].type).toBe(Defs);
    expect(all.some((e) => e.type === ClipPath && e.props.id === 'clip1')).toBe(true);
    expect(all.some((e) => e.type === G && e.props.transform === 'translate(10,5)')).toBe(true);
    expect(all.some((e) => e.type === G && e.props.clipPath === 'url(#clip1)')).toBe(true);
  });

  it('writes inherited paint onto shapes: the line path gets no fill (inherited none) and its own stroke and dash', () => {
    const path = all.find((e) => e.type === Path && e.props.d === 'M0,50L100,0');
    expect(path?.props).toMatchObject({ stroke: '#2f4a7a', strokeWidth: 2, strokeDasharray: '6,3' });
    expect(path?.props).not.toHaveProperty('fill');
    const line = all.find((e) => e.type === Line);
    expect(line?.props).toMatchObject({ x1: 0, y1: 0, x2: 50, y2: 0, stroke: '#888', strokeWidth: 1 });
    const circle = all.find((e) => e.type === Circle);
    expect(circle?.props).toMatchObject({ cx: 3, cy: 4, r: 2, fill: '#a23b2a', fillOpacity: 0.5 });
  });

  it('maps text with its transform, anchor, inherited font (mono stack) and decoded content; drops hidden text and empty paths', () => {
    const texts = all.filter((e) => e.type === Text);
    expect(texts).toHaveLength(1);
    expect(texts[0].props).toMatchObject({
      transform: 'translate(-19,75) rotate(-90)',
      textAnchor: 'middle',
      fontSize: 10,
      fontWeight: 700,
      fill: '#1d2430',
      fontFamily: MONO_STACK,
    });
    expect(texts[0].props.children).toBe('Altitude\u2007&\u2007time\u2007(km)');
    expect(all.some((e) => e.type === Path && e.props.d === '')).toBe(false);
    expect(MONO_STACK).not.toEqual(SANS_STACK);
  });

  it('throws on an element it has no mapping for', () => {
    expect(() => svgToPdf('<svg width="10" height="10"><image href="x.png"/></svg>', 10)).toThrow(
      /<image> has no PDF mapping/,
    );
  });
});
