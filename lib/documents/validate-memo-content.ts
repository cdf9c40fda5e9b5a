import { getSchema } from '@tiptap/core';
import { Fragment, type Mark, type Node as PmNode, type Schema } from '@tiptap/pm/model';
import type { z } from 'zod';
import { MEMO_MARK_TYPES, MEMO_NODE_TYPES, memoExtensions } from '@/lib/documents/model/memo-extensions';
import type { TiptapDoc } from '@/lib/memos/memo-schema';
import { isAllowedLinkHref, LINK_SCHEMES_ALLOWED } from './is-allowed-link-href';
import { MARK_ATTRIBUTE_SCHEMAS, NODE_ATTRIBUTE_SCHEMAS } from './model/attribute-schemas';

/**
 * Limits of a memo document. Depth counts nodes below the document (a paragraph
 * in the document is at depth 1; text in it at depth 2); real memos stay under
 * about 10 (lists in table cells). Node count: the editor benchmark's memo of
 * 40 calc blocks and 100 live values is 363 nodes (21 KB), the PDF benchmark's
 * 25-page memo 219; 20 000 leaves room for a long memo with heavy formatting
 * (every change of marks starts a text node) while bounding a save's work
 * (measured ≈ 4 ms for the 363-node memo, warm).
 */
export const MAX_CONTENT_DEPTH = 50;
export const MAX_CONTENT_NODES = 20_000;
/** Serialised size of the document (UTF-8 JSON); images are stored separately. */
export const MAX_CONTENT_BYTES = 2 * 1024 * 1024;
/** Nesting of JSON inside one node's attributes or marks (calc block inputs need 3). */
const MAX_ATTRIBUTE_DEPTH = 8;

export interface ContentProblem {
  /** What is wrong, with where: `unknown node type "foo" at content[3].content[0]`. */
  message: string;
  /** Where, as a path from the document (`content[3].content[0]`; empty for the document itself). */
  at: string;
}

export type ContentCheck = { ok: true; doc: TiptapDoc; nodeCount: number } | { ok: false; problem: ContentProblem };

export interface ContentRules {
  /**
   * URLs an image may point at: this memo's own attachments (`/api/attachments/<id>`), or 'any' for
   * stored content about to be rendered (the PDF resolves only the memo's own attachments anyway).
   */
  attachmentUrls: ReadonlySet<string> | 'any';
  /**
   * 'allow-list' refuses a link outside LINK_SCHEMES_ALLOWED (saves); 'any' leaves it to the PDF,
   * which prints such a link as plain text (stored content about to be rendered).
   */
  linkTargets: 'allow-list' | 'any';
}

const NODE_KEYS = new Set(['type', 'attrs', 'content', 'marks', 'text']);
const MARK_KEYS = new Set(['type', 'attrs']);
const NODE_TYPES: ReadonlySet<string> = new Set(MEMO_NODE_TYPES);
const MARK_TYPES: ReadonlySet<string> = new Set(MEMO_MARK_TYPES);

let schemaOnce: Schema | undefined;
/** The ProseMirror schema of the shared extension list (the editor builds the same one). */
const memoSchema = (): Schema => (schemaOnce ??= getSchema(memoExtensions()));

type Raw = Record<string, unknown>;
const isObject = (v: unknown): v is Raw => typeof v === 'object' && v !== null && !Array.isArray(v);
const where = (at: string) => (at ? ` at ${at}` : ' (the document)');
const quote = (s: string) => JSON.stringify(s.length > 60 ? `${s.slice(0, 60)}…` : s);
const fail = (message: string, at: string): ContentCheck => ({ ok: false, problem: { message, at } });

class Refusal extends Error {
  constructor(readonly problem: ContentProblem) {
    super(problem.message);
  }
}
const refuse = (message: string, at: string): never => {
  throw new Refusal({ message, at });
};

/** Depth of a JSON value, without recursion, stopping as soon as it passes `limit`. */
function jsonDepthExceeds(value: unknown, limit: number): boolean {
  const stack: [unknown, number][] = [[value, 1]];
  while (stack.length) {
    const top = stack.pop();
    if (top === undefined) break;
    const [v, d] = top;
    if (typeof v !== 'object' || v === null) continue;
    if (d > limit) return true;
    for (const child of Array.isArray(v) ? v : Object.values(v)) stack.push([child, d + 1]);
  }
  return false;
}

/**
 * The shape pass, on the raw JSON and without recursion, so that no
 * nesting (1 500 levels or 100 000) can exhaust the stack: every node is
 * an object, `content` and `marks` are arrays, depth and node count stay
 * within limits, attributes stay shallow. Everything after it may recurse.
 */
function checkShape(raw: unknown): ContentProblem | { nodeCount: number } {
  if (!isObject(raw) || raw.type !== 'doc') return { message: 'must be a document: an object with type "doc"', at: '' };
  const stack: [unknown, string, number][] = [[raw, '', 0]];
  let nodeCount = 0;
  while (stack.length) {
    const top = stack.pop();
    if (top === undefined) break;
    const [node, at, depth] = top;
    if (!isObject(node)) return { message: `expected a node (an object with a type)${where(at)}`, at };
    if (depth > MAX_CONTENT_DEPTH)
      return { message: `content is nested more than ${MAX_CONTENT_DEPTH} levels deep${where(at)}`, at };
    if (++nodeCount > MAX_CONTENT_NODES)
      return { message: `the document has more than ${MAX_CONTENT_NODES} nodes`, at: '' };
    for (const key of ['attrs', 'marks'] as const) {
      if (node[key] !== undefined && jsonDepthExceeds(node[key], MAX_ATTRIBUTE_DEPTH))
        return { message: `${key} nested too deeply${where(at)}`, at };
    }
    if (node.content === undefined) continue;
    if (!Array.isArray(node.content)) return { message: `content must be a list of nodes${where(at)}`, at };
    const prefix = at ? `${at}.` : '';
    for (let i = node.content.length - 1; i >= 0; i--)
      stack.push([node.content[i], `${prefix}content[${i}]`, depth + 1]);
  }
  return { nodeCount };
}

function describeIssue(issues: z.core.$ZodIssue[]): string {
  const first = issues[0];
  const path = first.path.map(String).join('.');
  return path ? `${path}: ${first.message}` : first.message;
}

function checkAttributes(schema: z.ZodType, attrs: unknown, what: string, at: string): void {
  if (attrs !== undefined && attrs !== null && !isObject(attrs))
    refuse(`attributes of ${what} must be an object${where(at)}`, at);
  const parsed = schema.safeParse(attrs ?? {});
  if (!parsed.success) refuse(`invalid attribute of ${what}${where(at)}: ${describeIssue(parsed.error.issues)}`, at);
}

function buildMarks(schema: Schema, raw: unknown, at: string, rules: ContentRules): Mark[] {
  if (raw === undefined) return [];
  if (!Array.isArray(raw)) return refuse(`marks must be a list${where(at)}`, at);
  const seen = new Set<string>();
  return raw.map((mark, i) => {
    const markAt = `${at}.marks[${i}]`;
    if (!isObject(mark) || typeof mark.type !== 'string')
      return refuse(`expected a mark (an object with a type) at ${markAt}`, markAt);
    const extra = Object.keys(mark).find((k) => !MARK_KEYS.has(k));
    if (extra) refuse(`unknown field ${quote(extra)} on a mark at ${markAt}`, markAt);
    if (!MARK_TYPES.has(mark.type) || !schema.marks[mark.type])
      refuse(`unknown mark type ${quote(mark.type)} at ${markAt}`, markAt);
    if (seen.has(mark.type)) refuse(`mark ${quote(mark.type)} appears twice at ${markAt}`, markAt);
    seen.add(mark.type);
    let attrs = mark.attrs;
    if (mark.type === 'link' && isObject(attrs) && !isAllowedLinkHref(attrs.href)) {
      const { href } = attrs;
      if (rules.linkTargets === 'allow-list') {
        refuse(
          `link ${typeof href === 'string' ? `to ${quote(href)} ` : 'without a target '}at ${markAt} is not allowed: only ${LINK_SCHEMES_ALLOWED} links are`,
          markAt,
        );
      }
      attrs = { ...attrs, href: '#rendered-as-plain-text' };
    }
    checkAttributes(
      MARK_ATTRIBUTE_SCHEMAS[mark.type as keyof typeof MARK_ATTRIBUTE_SCHEMAS],
      attrs,
      `mark ${quote(mark.type)}`,
      markAt,
    );
    return schema.mark(mark.type, (mark.attrs as Raw | undefined) ?? null);
  });
}

interface BuildState {
  schema: Schema;
  rules: ContentRules;
  /** Where each calc block id and figure id was first seen. */
  ids: Map<string, string>;
}

/** Builds the ProseMirror node of one raw node, refusing with the first problem and where it is. */
function buildNode(raw: Raw, at: string, state: BuildState): PmNode {
  const { schema } = state;
  const type = raw.type;
  if (typeof type !== 'string') return refuse(`node without a type${where(at)}`, at);
  if (!NODE_TYPES.has(type) || !schema.nodes[type]) return refuse(`unknown node type ${quote(type)}${where(at)}`, at);
  const extra = Object.keys(raw).find((k) => !NODE_KEYS.has(k));
  if (extra) refuse(`unknown field ${quote(extra)} on a ${quote(type)} node${where(at)}`, at);
  checkAttributes(NODE_ATTRIBUTE_SCHEMAS[type as keyof typeof NODE_ATTRIBUTE_SCHEMAS], raw.attrs, quote(type), at);
  const attrs = (raw.attrs as Raw | undefined) ?? null;
  checkReferences(type, attrs, at, state);
  const marks = buildMarks(schema, raw.marks, at, state.rules);

  if (type === 'text') {
    if (typeof raw.text !== 'string' || raw.text.length === 0) return refuse(`text node without text${where(at)}`, at);
    if (raw.content !== undefined) refuse(`text node with content${where(at)}`, at);
    return schema.text(raw.text, marks);
  }
  if (raw.text !== undefined) refuse(`${quote(type)} node may not carry text${where(at)}`, at);
  const children = ((raw.content as Raw[] | undefined) ?? []).map((child, i) =>
    buildNode(child, `${at ? `${at}.` : ''}content[${i}]`, state),
  );
  const nodeType = schema.nodes[type];
  const fragment = Fragment.from(children);
  if (!nodeType.validContent(fragment)) {
    const held = children.length
      ? children
          .map((c) => c.type.name + (c.marks.length ? `(${c.marks.map((m) => m.type.name).join(',')})` : ''))
          .join(', ')
      : 'nothing';
    refuse(
      `${quote(type)} may not contain [${held}]${where(at)} (it takes ${nodeType.spec.content ? `"${nodeType.spec.content}"` : 'no content'}${nodeType.spec.marks !== undefined ? `, marks "${nodeType.spec.marks}"` : ''})`,
      at,
    );
  }
  return nodeType.create(attrs, fragment, marks);
}

/** Ids must be unique (live values, figure references and the compliance table address them), images must be this memo's own. */
function checkReferences(type: string, attrs: Raw | null, at: string, state: BuildState): void {
  const { attachmentUrls } = state.rules;
  if (type === 'image' && attachmentUrls !== 'any') {
    const src = String(attrs?.src ?? '');
    if (!attachmentUrls.has(src))
      refuse(`image source ${quote(src)}${where(at)} is not an image uploaded to this memo`, at);
  }
  const id =
    type === 'calcBlock'
      ? attrs?.blockId
      : type === 'figure'
        ? attrs?.figureId
        : type === 'requirement'
          ? attrs?.requirementId
          : undefined;
  if (typeof id !== 'string') return;
  const first = state.ids.get(id);
  if (first !== undefined) refuse(`id ${quote(id)}${where(at)} is already used${where(first)}`, at);
  state.ids.set(id, at);
}

/**
 * Checks a memo document against the one document schema before it is
 * stored or rendered: the ProseMirror schema of the shared extension list
 * (node and mark types, which node may contain which), the attribute
 * schemas of every node and mark, link schemes, image sources, unique ids,
 * depth, node count and size. The first problem is returned with where it
 * is; nothing here throws on any input.
 */
export function validateMemoContent(raw: unknown, rules: ContentRules): ContentCheck {
  const shape = checkShape(raw);
  if ('message' in shape) return fail(shape.message, shape.at);
  const bytes = Buffer.byteLength(JSON.stringify(raw), 'utf8');
  if (bytes > MAX_CONTENT_BYTES)
    return fail(
      `the document is ${(bytes / 1024 / 1024).toFixed(1)} MiB as JSON; at most ${MAX_CONTENT_BYTES / 1024 / 1024} MiB`,
      '',
    );
  const schema = memoSchema();
  try {
    const doc = buildNode(raw as Raw, '', { schema, rules, ids: new Map() });
    // ProseMirror's own consistency check of the whole tree (content, marks, attributes).
    doc.check();
    return { ok: true, doc: raw as unknown as TiptapDoc, nodeCount: shape.nodeCount };
  } catch (err) {
    if (err instanceof Refusal) return { ok: false, problem: err.problem };
    if (err instanceof RangeError) return fail(err.message, '');
    throw err;
  }
}
