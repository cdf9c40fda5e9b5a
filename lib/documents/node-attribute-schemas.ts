import { z } from 'zod';
import type { MEMO_MARK_TYPES, MEMO_NODE_TYPES } from '@/components/editor/extensions';
import { listCalcKinds } from '@/lib/calc';
import { getFigureKind } from '@/lib/figures/figure-kinds';
import { blockIdSchema, inputEntrySchema } from './calc-nodes';
import { isAllowedLinkHref, LINK_SCHEMES_ALLOWED } from './is-allowed-link-href';

/**
 * The stored attributes of every node and mark type a memo may contain, as
 * zod schemas checked when content is saved (lib/documents/validate-memo-content.ts).
 * Each schema is strict: an attribute the extension does not declare is refused.
 * Every attribute is optional where the Tiptap extension gives it a default
 * (stored JSON may leave defaults out); `null` is accepted where the default is null.
 *
 * The records are typed by MEMO_NODE_TYPES / MEMO_MARK_TYPES, so a node type added
 * to the extension list without an attribute schema here fails to compile.
 */

type MemoNodeType = (typeof MEMO_NODE_TYPES)[number];
type MemoMarkType = (typeof MEMO_MARK_TYPES)[number];

const none = z.strictObject({});
const optionalText = (max: number) => z.string().max(max, `must have at most ${max} characters`).nullable().optional();
const positiveInt = (max: number) => z.number().int().min(1).max(max);
/** Width or height of an image: pixels as a number, or the same as text ("320"), as the HTML attribute gives it. */
const imageDimension = z.union([z.number().positive().max(20_000), z.string().regex(/^\d{1,5}(\.\d+)?(px|%)?$/, 'must be a size such as 320 or 320px')]).nullable().optional();
/** Kind ids are kebab-case words (lib/calc/kinds); an id the registry does not know is refused. */
const CALC_KINDS: ReadonlySet<string> = new Set(listCalcKinds().map((k) => k.kind));
const knownCalcKind = z.string().max(64).refine((k) => CALC_KINDS.has(k), { error: (i) => `unknown calc kind "${String(i.input).slice(0, 64)}"` });
const knownFigureKind = z.string().max(64).refine((k) => getFigureKind(k) !== undefined, { error: (i) => `unknown figure kind "${String(i.input).slice(0, 64)}"` });
/** A reference to a block or figure may be empty (not chosen yet) or dangling (shown as broken), but never junk. */
const idOrEmpty = z.union([z.literal(''), blockIdSchema]);

export const NODE_ATTRIBUTE_SCHEMAS: Record<MemoNodeType, z.ZodType> = {
  doc: none,
  paragraph: none,
  text: none,
  blockquote: none,
  bulletList: none,
  listItem: none,
  hardBreak: none,
  horizontalRule: none,
  table: none,
  tableRow: none,
  heading: z.strictObject({ level: z.union([z.literal(1), z.literal(2), z.literal(3)], { error: 'heading level must be 1, 2 or 3' }).optional() }),
  codeBlock: z.strictObject({ language: z.string().regex(/^[A-Za-z0-9_+#.-]{1,40}$/, 'language must be a short name such as typescript').nullable().optional() }),
  orderedList: z.strictObject({ start: z.number().int().min(0).max(1_000_000).optional(), type: z.enum(['1', 'a', 'A', 'i', 'I']).nullable().optional() }),
  // The image's src is further checked against the memo's own attachments (validate-memo-content).
  image: z.strictObject({ src: z.string().max(200), alt: optionalText(500), title: optionalText(500), width: imageDimension, height: imageDimension }),
  tableCell: tableCellAttributes(),
  tableHeader: tableCellAttributes(),
  calcBlock: z.strictObject({
    blockId: blockIdSchema,
    kind: knownCalcKind,
    label: z.string().max(120).optional(),
    inputs: z.record(z.string().regex(/^[A-Za-z][A-Za-z0-9_]{0,63}$/, 'input names are letters and digits'), inputEntrySchema).refine((r) => Object.keys(r).length <= 64, 'at most 64 inputs').optional(),
  }),
  liveValue: z.strictObject({ blockId: idOrEmpty.optional(), output: z.string().max(64).optional() }),
  figure: z.strictObject({ figureId: blockIdSchema, figureKind: knownFigureKind, blockId: idOrEmpty.optional(), caption: z.string().max(500).optional() }),
  figureRef: z.strictObject({ figureId: idOrEmpty.optional() }),
};

function tableCellAttributes() {
  return z.strictObject({
    colspan: positiveInt(100).optional(),
    rowspan: positiveInt(100).optional(),
    colwidth: z.array(z.number().int().min(0).max(10_000)).max(100).nullable().optional(),
    align: z.enum(['left', 'center', 'right']).nullable().optional(),
  });
}

export const MARK_ATTRIBUTE_SCHEMAS: Record<MemoMarkType, z.ZodType> = {
  bold: none,
  italic: none,
  strike: none,
  underline: none,
  code: none,
  link: z.strictObject({
    href: z.string().max(2048).refine(isAllowedLinkHref, `only ${LINK_SCHEMES_ALLOWED} links are allowed`),
    target: z.enum(['_blank']).nullable().optional(),
    rel: optionalText(100),
    class: optionalText(100),
    title: optionalText(500),
  }),
};
