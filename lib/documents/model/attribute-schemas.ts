import { z } from 'zod';
import { listCalcKinds } from '@/lib/calc';
import { getFigureKind } from '@/lib/figures/figure-kinds';
import { blockIdSchema, inputEntrySchema } from '../calc-nodes';
import { isAllowedLinkHref, LINK_SCHEMES_ALLOWED } from '../is-allowed-link-href';
import { COMPARISONS, requirementIdSchema } from '@/lib/requirements/requirement-attrs';
import type { MemoMarkType, MemoNodeType } from './node-types';

/**
 * The stored attributes of every node and mark type a memo may contain, as
 * zod schemas checked when content is saved (lib/documents/validate-memo-content.ts).
 * Each schema is strict: an attribute the extension does not declare is refused.
 * Every attribute is optional where the Tiptap extension gives it a default
 * (stored JSON may leave defaults out); `null` is accepted where the default is null.
 * Attributes of the stock extensions that the editor fills from pasted HTML
 * (list start and type, code language, cell spans, image size, link target)
 * accept what that parsing can give — Tiptap turns numeric attribute text
 * into numbers and keeps other text, and parseInt's NaN is stored as null —
 * so that pasting never makes a memo unsavable; they are bounded in size.
 * Our own nodes and everything that matters for safety are strict.
 *
 * The records are checked against MEMO_NODE_TYPES / MEMO_MARK_TYPES (./node-types.ts),
 * so a node type added to the model without an attribute schema here fails to
 * compile; MemoNode (./memo-node.ts) takes each node's attribute type from here.
 */

const none = z.strictObject({});
const optionalText = (max: number) => z.string().max(max, `must have at most ${max} characters`).nullable().optional();
/** An attribute read from pasted HTML: a number, or short text when it was not numeric. */
const fromHtml = z
  .union([z.number(), z.string().max(20, 'must have at most 20 characters')])
  .nullable()
  .optional();
/** Kind ids are kebab-case words (lib/calc/kinds); an id the registry does not know is refused. */
const CALC_KINDS: ReadonlySet<string> = new Set(listCalcKinds().map((k) => k.kind));
const knownCalcKind = z
  .string()
  .max(64)
  .refine((k) => CALC_KINDS.has(k), { error: (i) => `unknown calc kind "${String(i.input).slice(0, 64)}"` });
const knownFigureKind = z
  .string()
  .max(64)
  .refine((k) => getFigureKind(k) !== undefined, {
    error: (i) => `unknown figure kind "${String(i.input).slice(0, 64)}"`,
  });
/** A reference to a block or figure may be empty (not chosen yet) or dangling (shown as broken), but never junk. */
const idOrEmpty = z.union([z.literal(''), blockIdSchema]);

export const NODE_ATTRIBUTE_SCHEMAS = {
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
  heading: z.strictObject({
    level: z.union([z.literal(1), z.literal(2), z.literal(3)], { error: 'heading level must be 1, 2 or 3' }).optional(),
  }),
  codeBlock: z.strictObject({ language: optionalText(100) }),
  orderedList: z.strictObject({ start: z.number().nullable().optional(), type: fromHtml }),
  // The image's src is further checked against the memo's own attachments (validate-memo-content).
  image: z.strictObject({
    src: z.string().max(200),
    alt: optionalText(500),
    title: optionalText(500),
    caption: optionalText(500),
    width: fromHtml,
    height: fromHtml,
  }),
  tableCell: tableCellAttributes(),
  tableHeader: tableCellAttributes(),
  calcBlock: z.strictObject({
    blockId: blockIdSchema,
    kind: knownCalcKind,
    label: z.string().max(120).optional(),
    inputs: z
      .record(z.string().regex(/^[A-Za-z][A-Za-z0-9_]{0,63}$/, 'input names are letters and digits'), inputEntrySchema)
      .refine((r) => Object.keys(r).length <= 64, 'at most 64 inputs')
      .optional(),
  }),
  liveValue: z.strictObject({ blockId: idOrEmpty.optional(), output: z.string().max(64).optional() }),
  figure: z.strictObject({
    figureId: blockIdSchema,
    figureKind: knownFigureKind,
    blockId: idOrEmpty.optional(),
    caption: z.string().max(500).optional(),
  }),
  figureRef: z.strictObject({ figureId: idOrEmpty.optional() }),
  // Threshold and tolerance are text with a unit, read against the output's unit when the requirement is checked.
  requirement: z.strictObject({
    requirementId: requirementIdSchema,
    text: z.string().max(1000).optional(),
    blockId: idOrEmpty.optional(),
    output: z.string().max(64).optional(),
    comparison: z.enum(COMPARISONS, { error: `comparison must be one of ${COMPARISONS.join(', ')}` }).optional(),
    threshold: z.string().max(60).optional(),
    tolerance: z.string().max(60).optional(),
  }),
  complianceTable: none,
} satisfies Record<MemoNodeType, z.ZodType>;

function tableCellAttributes() {
  return z.strictObject({
    colspan: fromHtml,
    rowspan: fromHtml,
    colwidth: z.array(z.number().nullable()).max(1000).nullable().optional(),
    align: z.enum(['left', 'center', 'right']).nullable().optional(),
  });
}

export const MARK_ATTRIBUTE_SCHEMAS = {
  bold: none,
  italic: none,
  strike: none,
  underline: none,
  code: none,
  link: z.strictObject({
    href: z.string().max(2048).refine(isAllowedLinkHref, `only ${LINK_SCHEMES_ALLOWED} links are allowed`),
    target: optionalText(20),
    rel: optionalText(200),
    class: optionalText(200),
    title: optionalText(500),
  }),
} satisfies Record<MemoMarkType, z.ZodType>;
