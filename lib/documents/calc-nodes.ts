import { z } from 'zod';

/**
 * The memo document's own node types and their stored attributes. A calc
 * block stores its inputs (what the analyst typed, or a reference to another
 * block's output), never its results.
 */
export const CALC_BLOCK = 'calcBlock';
export const LIVE_VALUE = 'liveValue';

export const blockIdSchema = z.string().regex(/^[A-Za-z0-9_-]{1,40}$/, 'block id must be 1–40 letters, digits, _ or -');

/** Typed text of an input. */
export const MAX_INPUT_TEXT_CHARS = 500;
/**
 * Typed text of a long free-text input (an engine field of type 'string' whose
 * maxLength is above MAX_INPUT_TEXT_CHARS, e.g. a pasted orbit data message or
 * site list): the kind's own schema bounds it further. model/attribute-schemas
 * holds every other input to MAX_INPUT_TEXT_CHARS.
 */
export const MAX_LONG_INPUT_TEXT_CHARS = 400_000;

export const inputEntrySchema = z.union([
  z.strictObject({ text: z.string().max(MAX_LONG_INPUT_TEXT_CHARS) }),
  z.strictObject({ ref: z.strictObject({ blockId: blockIdSchema, output: z.string().min(1).max(64) }) }),
]);
export type InputEntry = z.infer<typeof inputEntrySchema>;

export const calcBlockAttrsSchema = z.object({
  blockId: blockIdSchema,
  kind: z.string().min(1).max(64),
  label: z.string().max(120).default(''),
  inputs: z.record(z.string(), inputEntrySchema).default({}),
});
export type CalcBlockAttrs = z.infer<typeof calcBlockAttrsSchema>;

export const liveValueAttrsSchema = z.object({ blockId: z.string(), output: z.string() });
export type LiveValueAttrs = z.infer<typeof liveValueAttrsSchema>;

export const isRef = (e: InputEntry): e is { ref: { blockId: string; output: string } } => 'ref' in e;

/** A new block id: short, random, URL-safe. */
export function newBlockId(): string {
  const alphabet = 'abcdefghijkmnpqrstuvwxyz23456789';
  let id = 'b';
  for (let i = 0; i < 7; i++) id += alphabet[Math.floor(Math.random() * alphabet.length)];
  return id;
}

/** How a block is named in messages: its label, else its kind and id. */
export const blockName = (b: Pick<CalcBlockAttrs, 'label' | 'kind' | 'blockId'>): string => (b.label ? `“${b.label}”` : `${b.kind} block ${b.blockId}`);
