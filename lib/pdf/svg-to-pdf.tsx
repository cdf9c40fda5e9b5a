/**
 * Maps an SVG document (as vega writes it) onto react-pdf's vector
 * primitives, so that figures stay vector graphics in the PDF. Presentation
 * attributes are resolved here with SVG's inheritance rules (SVG 1.1 §6.6:
 * fill, stroke and font properties inherit; opacity multiplies down groups)
 * and written onto each shape, so nothing depends on react-pdf's own
 * inheritance. Hidden elements (display none, opacity 0 — vega's overlapping
 * axis labels) are dropped. An element type without a mapping throws.
 */
import type { ReactElement, ReactNode } from 'react';
import { Circle, ClipPath, Defs, G, Line, Path, Rect, Svg, Text } from '@react-pdf/renderer';
import { MONO, MONO_STACK, monoText, SANS, SANS_STACK } from './pdf-fonts';
import { parseSvg, type SvgElement, type SvgNode } from './parse-svg';

interface Paint {
  fill: string;
  stroke: string;
  strokeWidth: number;
  strokeDasharray?: string;
  strokeLinecap?: string;
  strokeLinejoin?: string;
  strokeOpacity: number;
  fillOpacity: number;
  opacity: number;
  fontFamily: string;
  fontSize: number;
  fontWeight: number;
  fontStyle: string;
  textAnchor: string;
}

const INITIAL: Paint = {
  fill: 'black',
  stroke: 'none',
  strokeWidth: 1,
  strokeOpacity: 1,
  fillOpacity: 1,
  opacity: 1,
  fontFamily: SANS,
  fontSize: 16,
  fontWeight: 400,
  fontStyle: 'normal',
  textAnchor: 'start',
};

const num = (v: string | undefined, fallback: number): number => {
  const n = v === undefined ? NaN : parseFloat(v);
  return Number.isFinite(n) ? n : fallback;
};

const fontWeight = (v: string | undefined, fallback: number): number =>
  v === 'bold' ? 700 : v === 'normal' ? 400 : num(v, fallback);
const fontFamily = (v: string | undefined, fallback: string): string =>
  v === undefined ? fallback : /mono/i.test(v) ? MONO : SANS;

/** The paint of an element given its parent's (inherited properties) and its own attributes. */
function resolvePaint(parent: Paint, a: Record<string, string>): Paint {
  return {
    fill: a.fill ?? parent.fill,
    stroke: a.stroke ?? parent.stroke,
    strokeWidth: num(a['stroke-width'], parent.strokeWidth),
    strokeDasharray: a['stroke-dasharray'] ?? parent.strokeDasharray,
    strokeLinecap: a['stroke-linecap'] ?? parent.strokeLinecap,
    strokeLinejoin: a['stroke-linejoin'] ?? parent.strokeLinejoin,
    strokeOpacity: num(a['stroke-opacity'], parent.strokeOpacity),
    fillOpacity: num(a['fill-opacity'], parent.fillOpacity),
    opacity: parent.opacity * num(a.opacity, 1),
    fontFamily: fontFamily(a['font-family'], parent.fontFamily),
    fontSize: num(a['font-size'], parent.fontSize),
    fontWeight: fontWeight(a['font-weight'], parent.fontWeight),
    fontStyle: a['font-style'] ?? parent.fontStyle,
    textAnchor: a['text-anchor'] ?? parent.textAnchor,
  };
}

/** Shape paint props for react-pdf; "none" is expressed by leaving the prop out. */
function shapeProps(p: Paint) {
  const hasFill = p.fill !== 'none' && p.fill !== 'transparent';
  const hasStroke = p.stroke !== 'none' && p.stroke !== 'transparent';
  return {
    ...(hasFill ? { fill: p.fill, fillOpacity: p.fillOpacity * p.opacity } : {}),
    ...(hasStroke
      ? {
          stroke: p.stroke,
          strokeWidth: p.strokeWidth,
          strokeOpacity: p.strokeOpacity * p.opacity,
          ...(p.strokeDasharray && p.strokeDasharray !== 'none' ? { strokeDasharray: p.strokeDasharray } : {}),
          ...(p.strokeLinecap ? { strokeLinecap: p.strokeLinecap as 'butt' | 'round' | 'square' } : {}),
          ...(p.strokeLinejoin ? { strokeLinejoin: p.strokeLinejoin as 'miter' | 'round' | 'bevel' } : {}),
        }
      : {}),
  };
}

const isElement = (n: SvgNode): n is SvgElement => 'tag' in n;
const isHidden = (a: Record<string, string>) =>
  a.display === 'none' || a.visibility === 'hidden' || num(a.opacity, 1) === 0;
const textOf = (el: SvgElement): string => el.children.map((c) => (isElement(c) ? textOf(c) : c.text)).join('');
const clipRef = (a: Record<string, string>) => (a['clip-path'] ? { clipPath: a['clip-path'] } : {});
const transformOf = (a: Record<string, string>) => (a.transform ? { transform: a.transform } : {});

type Mapper = (el: SvgElement, paint: Paint, key: number) => ReactNode;

const children = (el: SvgElement, paint: Paint): ReactNode[] =>
  el.children.filter(isElement).map((c, i) => mapElement(c, paint, i));

const MAPPERS: Record<string, Mapper> = {
  g: (el, paint, key) => (
    <G key={key} {...transformOf(el.attrs)} {...clipRef(el.attrs)}>
      {children(el, paint)}
    </G>
  ),
  path: (el, paint, key) =>
    el.attrs.d ? <Path key={key} d={el.attrs.d} {...transformOf(el.attrs)} {...shapeProps(paint)} /> : null,
  line: (el, paint, key) => (
    <Line
      key={key}
      x1={num(el.attrs.x1, 0)}
      y1={num(el.attrs.y1, 0)}
      x2={num(el.attrs.x2, 0)}
      y2={num(el.attrs.y2, 0)}
      {...transformOf(el.attrs)}
      {...shapeProps(paint)}
    />
  ),
  rect: (el, paint, key) => (
    <Rect
      key={key}
      x={num(el.attrs.x, 0)}
      y={num(el.attrs.y, 0)}
      width={num(el.attrs.width, 0)}
      height={num(el.attrs.height, 0)}
      {...transformOf(el.attrs)}
      {...shapeProps(paint)}
    />
  ),
  circle: (el, paint, key) => (
    <Circle
      key={key}
      cx={num(el.attrs.cx, 0)}
      cy={num(el.attrs.cy, 0)}
      r={num(el.attrs.r, 0)}
      {...transformOf(el.attrs)}
      {...shapeProps(paint)}
    />
  ),
  text: (el, paint, key) => {
    const content = textOf(el);
    if (!content.trim()) return null;
    const fill = paint.fill === 'none' ? 'black' : paint.fill;
    // react-pdf reads the font of SVG text from its props; its typings list only presentation attributes.
    const font = {
      fontFamily: paint.fontFamily === MONO ? MONO_STACK : SANS_STACK,
      fontSize: paint.fontSize,
      fontWeight: paint.fontWeight,
    };
    return (
      <Text
        key={key}
        x={num(el.attrs.x, 0)}
        y={num(el.attrs.y, 0)}
        {...transformOf(el.attrs)}
        fill={fill}
        opacity={paint.fillOpacity * paint.opacity}
        {...font}
        textAnchor={paint.textAnchor as 'start' | 'middle' | 'end'}
      >
        {paint.fontFamily === MONO ? monoText(content) : content}
      </Text>
    );
  },
  defs: (el, paint, key) => <Defs key={key}>{children(el, paint)}</Defs>,
  clipPath: (el, paint, key) => (
    <ClipPath key={key} id={el.attrs.id}>
      {children(el, paint)}
    </ClipPath>
  ),
};

function mapElement(el: SvgElement, parent: Paint, key: number): ReactNode {
  if (isHidden(el.attrs)) return null;
  const mapper = MAPPERS[el.tag];
  if (!mapper)
    throw new Error(`SVG element <${el.tag}> has no PDF mapping (mapped: ${Object.keys(MAPPERS).join(', ')})`);
  return mapper(el, resolvePaint(parent, el.attrs), key);
}

/**
 * The SVG as a react-pdf <Svg>, scaled down (never up) to `maxWidth` points
 * with its aspect ratio kept. Clip-path definitions come first so that
 * react-pdf finds them when it draws the groups that use them.
 */
export function svgToPdf(svg: string, maxWidth: number): ReactElement {
  const root = parseSvg(svg);
  const width = num(root.attrs.width, maxWidth);
  const height = num(root.attrs.height, maxWidth / 2);
  const scale = Math.min(1, maxWidth / width);
  const elements = root.children.filter(isElement);
  const ordered = [...elements.filter((e) => e.tag === 'defs'), ...elements.filter((e) => e.tag !== 'defs')];
  return (
    <Svg width={width * scale} height={height * scale} viewBox={root.attrs.viewBox ?? `0 0 ${width} ${height}`}>
      {ordered.map((el, i) => mapElement(el, INITIAL, i))}
    </Svg>
  );
}
