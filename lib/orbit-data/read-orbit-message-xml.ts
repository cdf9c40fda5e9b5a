import { XMLParser, XMLValidator } from 'fast-xml-parser';
import { ORBIT_MESSAGE_LIMITS, OrbitMessageError, type KvnItem } from './orbit-message-types';

type XmlNode = Record<string, unknown> & { ':@'?: Record<string, string> };

/** Most ancestors an element may have: a value of an OPM or OEM has five (opm, body, segment, data, stateVector). */
const MAX_XML_DEPTH = 6;

/**
 * The XML parser's settings: no entity expansion (a message with a DOCTYPE or
 * ENTITY declaration is refused before parsing, so no internal or external
 * entity can be defined or fetched), values kept as text (numbers are read by
 * our own checks), document order kept so items come out as the KVN reader gives them.
 */
const parser = new XMLParser({
  preserveOrder: true,
  ignoreAttributes: false,
  attributeNamePrefix: '',
  processEntities: false,
  htmlEntities: false,
  parseTagValue: false,
  parseAttributeValue: false,
  trimValues: true,
  ignoreDeclaration: true,
  ignorePiTags: true,
  removeNSPrefix: true,
  commentPropName: false,
});

/** Line (1-based) of a character offset. */
function lineAt(text: string, offset: number): number {
  let line = 1;
  for (let i = 0; i < offset; i++) if (text.charCodeAt(i) === 10) line++;
  return line;
}

/** Line numbers of every opening tag, by local name, in document order (comments and CDATA blanked first). */
function openingTagLines(text: string): Map<string, number[]> {
  const blanked = text.replace(/<!--[\s\S]*?-->|<!\[CDATA\[[\s\S]*?\]\]>/g, (m) => m.replace(/[^\n]/g, ' '));
  const lines = new Map<string, number[]>();
  const tag = /<(?:[A-Za-z_][\w.-]*:)?([A-Za-z_][\w.-]*)(?=[\s>/])/g;
  let line = 1;
  let last = 0;
  for (let m = tag.exec(blanked); m; m = tag.exec(blanked)) {
    for (let i = last; i < m.index; i++) if (blanked.charCodeAt(i) === 10) line++;
    last = m.index;
    lines.set(m[1], [...(lines.get(m[1]) ?? []), line]);
  }
  return lines;
}

const tagOf = (node: XmlNode): string => Object.keys(node).find((k) => k !== ':@') as string;
const childrenOf = (node: XmlNode): XmlNode[] => (node[tagOf(node)] as XmlNode[]) ?? [];
const textOf = (node: XmlNode): string | null => {
  const kids = childrenOf(node);
  if (kids.some((k) => tagOf(k) !== '#text')) return null;
  return kids
    .map((k) => String(k['#text']))
    .join('')
    .trim();
};

/**
 * Reads an OPM or OEM in the XML encoding (NDM/XML, CCSDS 505.0-B, from memory;
 * element names as the KVN keywords) into the same items the KVN reader gives, so one set of checks
 * applies to both: each leaf element becomes `KEYWORD = value [units]`, the root's
 * `version` attribute the version keyword, an OEM segment's <metadata> is wrapped
 * in META_START … META_STOP, each OEM <stateVector> becomes a data line and each
 * OEM <covarianceMatrix> a COVARIANCE_START … COVARIANCE_STOP block. Line numbers
 * are those of the elements' opening tags.
 */
export function readOrbitMessageXml(text: string): { type: 'OPM' | 'OEM'; items: KvnItem[] } {
  if (text.length > ORBIT_MESSAGE_LIMITS.maxChars)
    throw new OrbitMessageError(
      0,
      null,
      `the message has ${text.length} characters; at most ${ORBIT_MESSAGE_LIMITS.maxChars} are accepted`,
    );
  const declaration = /<!(DOCTYPE|ENTITY)/i.exec(text);
  if (declaration)
    throw new OrbitMessageError(
      lineAt(text, declaration.index),
      null,
      `<!${declaration[1].toUpperCase()} …> declarations are not accepted in an orbit data message`,
    );
  const valid = XMLValidator.validate(text);
  if (valid !== true) throw new OrbitMessageError(valid.err.line, null, `the XML is not well formed: ${valid.err.msg}`);
  let tree: XmlNode[];
  try {
    tree = parser.parse(text) as XmlNode[];
  } catch (e) {
    // The parser's own limits (e.g. nesting depth) end here, as a refusal rather than an unexpected error.
    throw new OrbitMessageError(
      0,
      null,
      `the XML could not be read: ${e instanceof Error ? e.message.slice(0, 120) : 'parser error'}`,
    );
  }
  const roots = tree.filter((n) => tagOf(n) !== '#text');
  if (roots.length !== 1) throw new OrbitMessageError(1, null, 'expected one <opm> or <oem> root element');
  const root = roots[0];
  const rootTag = tagOf(root);
  const type = rootTag === 'opm' ? 'OPM' : rootTag === 'oem' ? 'OEM' : null;
  const tagLines = openingTagLines(text);
  const seen = new Map<string, number>();
  const nextLine = (tag: string): number => {
    const n = seen.get(tag) ?? 0;
    seen.set(tag, n + 1);
    return tagLines.get(tag)?.[n] ?? 0;
  };
  const rootLine = nextLine(rootTag);
  if (!type)
    throw new OrbitMessageError(
      rootLine,
      null,
      `<${rootTag.slice(0, 40)}> is not an OPM or OEM (root element <opm> or <oem>)`,
    );
  const versionKeyword = `CCSDS_${type}_VERS`;
  const version = root[':@']?.version;
  if (!version)
    throw new OrbitMessageError(
      rootLine,
      versionKeyword,
      `is missing: the <${rootTag}> element needs a version attribute`,
    );
  const items: KvnItem[] = [{ kind: 'keyword', line: rootLine, keyword: versionKeyword, value: version, unit: null }];
  let count = 0;

  const leaf = (node: XmlNode, tag: string, line: number): void => {
    const value = textOf(node);
    if (value === null) throw new OrbitMessageError(line, tag, 'holds elements where a value is expected');
    const keyword = tag === 'USER_DEFINED' ? `USER_DEFINED_${node[':@']?.parameter ?? ''}` : tag;
    if (tag !== 'COMMENT' && value === '') throw new OrbitMessageError(line, keyword, 'has no value');
    items.push({ kind: 'keyword', line, keyword, value, unit: node[':@']?.units ?? null });
  };

  const walk = (nodes: XmlNode[], parents: string[]): void => {
    for (const node of nodes) {
      const tag = tagOf(node);
      if (tag === '#text') continue;
      if (++count > ORBIT_MESSAGE_LIMITS.maxLines * 2)
        throw new OrbitMessageError(0, null, 'the message has too many elements');
      const line = nextLine(tag);
      // A value of an OPM or OEM has five ancestors: much deeper is not one of these messages.
      if (parents.length > MAX_XML_DEPTH)
        throw new OrbitMessageError(
          line,
          tag.slice(0, 40),
          `is nested ${parents.length} levels deep; an OPM or OEM nests at most ${MAX_XML_DEPTH}`,
        );
      const parent = parents.at(-1);
      if (type === 'OEM' && tag === 'metadata') {
        items.push({ kind: 'keyword', line, keyword: 'META_START', value: '', unit: null });
        walk(childrenOf(node), [...parents, tag]);
        items.push({ kind: 'keyword', line, keyword: 'META_STOP', value: '', unit: null });
      } else if (type === 'OEM' && tag === 'stateVector' && parent === 'data') {
        const fields: string[] = [];
        for (const kid of childrenOf(node)) {
          const kidTag = tagOf(kid);
          if (kidTag === '#text') continue;
          const kidLine = nextLine(kidTag);
          if (kidTag === 'COMMENT') continue;
          const value = textOf(kid);
          if (!value) throw new OrbitMessageError(kidLine, kidTag, 'has no value');
          fields.push(value);
        }
        items.push({ kind: 'data', line, fields });
      } else if (type === 'OEM' && tag === 'covarianceMatrix') {
        items.push({ kind: 'keyword', line, keyword: 'COVARIANCE_START', value: '', unit: null });
        walk(childrenOf(node), [...parents, tag]);
        items.push({ kind: 'keyword', line, keyword: 'COVARIANCE_STOP', value: '', unit: null });
      } else if (textOf(node) !== null && !['header', 'body', 'segment', 'metadata', 'data'].includes(tag)) {
        leaf(node, tag, line);
      } else {
        walk(childrenOf(node), [...parents, tag]);
      }
    }
  };
  walk(childrenOf(root), [rootTag]);
  return { type, items };
}
