/**
 * A small parser for the SVG that vega's renderer writes: well-formed XML
 * with double-quoted attributes, the five predefined entities and numeric
 * character references, no DOCTYPE, CDATA or processing instructions
 * (W3C XML 1.0, §2.4 and §4.6). Anything else is an error, not a guess.
 */

export interface SvgElement {
  tag: string;
  attrs: Record<string, string>;
  children: SvgNode[];
}
export type SvgNode = SvgElement | { text: string };

const ENTITIES: Record<string, string> = { amp: '&', lt: '<', gt: '>', quot: '"', apos: "'" };

export function decodeEntities(s: string): string {
  return s.replace(/&(#x[0-9a-fA-F]+|#[0-9]+|[a-z]+);/g, (whole, ref: string) => {
    if (ref.startsWith('#x')) return String.fromCodePoint(parseInt(ref.slice(2), 16));
    if (ref.startsWith('#')) return String.fromCodePoint(parseInt(ref.slice(1), 10));
    const named = ENTITIES[ref];
    if (named === undefined) throw new Error(`SVG: unknown entity ${whole}`);
    return named;
  });
}

const TAG = /<(\/?)([A-Za-z][\w:.-]*)((?:\s+[\w:.-]+\s*=\s*"[^"]*")*)\s*(\/?)>/y;
const ATTR = /([\w:.-]+)\s*=\s*"([^"]*)"/g;

/** Parses an SVG document into its root element. */
export function parseSvg(svg: string): SvgElement {
  const root: SvgElement = { tag: '#root', attrs: {}, children: [] };
  const stack: SvgElement[] = [root];
  let i = 0;
  while (i < svg.length) {
    const lt = svg.indexOf('<', i);
    const textEnd = lt === -1 ? svg.length : lt;
    if (textEnd > i) {
      const text = svg.slice(i, textEnd);
      if (text.trim()) stack[stack.length - 1].children.push({ text: decodeEntities(text) });
    }
    if (lt === -1) break;
    if (svg.startsWith('<!--', lt)) {
      const end = svg.indexOf('-->', lt);
      if (end === -1) throw new Error('SVG: unterminated comment');
      i = end + 3;
      continue;
    }
    TAG.lastIndex = lt;
    const m = TAG.exec(svg);
    if (!m) throw new Error(`SVG: malformed tag at offset ${lt}: ${svg.slice(lt, lt + 40)}`);
    const [, closing, tag, rawAttrs, selfClosing] = m;
    if (closing) {
      const open = stack.pop();
      if (!open || open.tag !== tag) throw new Error(`SVG: </${tag}> closes <${open?.tag ?? 'nothing'}>`);
    } else {
      const attrs: Record<string, string> = {};
      for (const a of rawAttrs.matchAll(ATTR)) attrs[a[1]] = decodeEntities(a[2]);
      const el: SvgElement = { tag, attrs, children: [] };
      stack[stack.length - 1].children.push(el);
      if (!selfClosing) stack.push(el);
    }
    i = TAG.lastIndex;
  }
  if (stack.length !== 1) throw new Error(`SVG: <${stack[stack.length - 1].tag}> is not closed`);
  const svgRoot = root.children.find((c): c is SvgElement => 'tag' in c && c.tag === 'svg');
  if (!svgRoot) throw new Error('SVG: no <svg> root element');
  return svgRoot;
}
