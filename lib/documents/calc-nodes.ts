import { z } from 'zod';

/**
 * The memo document's own node types and their stored attributes. A calc
 * block stores its inputs (what the analyst typed, or a reference to another
 * block's output), never its results.
 */
export const CALC_BLOCK = 'calcBlock';
export const LIVE_VALUE = 'liveValue';

export const blockIdSchema = z.string().regex(/^[A-Za-z0-9_-]{1,40}$/, 'block id must be 1–40 letters, digits, _ or -');

/**
 * Longest typed input text [characters]: a pasted table (the solar-activity CSV, at most 100 000 characters by its
 * field; a list of up to 200 TLE sets, about 20 000) or a pasted CCSDS orbit data message (at most 400 000: one day
 * of states every 60 s is about 160 000) is an input like any other, so a frozen revision keeps it; the engine limits
 * each field further.
 */
export const MAX_INPUT_TEXT_CHARS = 400_000;

export const inputEntrySchema = z.union([
  z.strictObject({ text: z.string().max(MAX_INPUT_TEXT_CHARS) }),
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
export const blockName = (b: Pick<CalcBlockAttrs, 'label' | 'kind' | 'blockId'>): string =>
  b.label ? `“${b.label}”` : `${b.kind} block ${b.blockId}`;
