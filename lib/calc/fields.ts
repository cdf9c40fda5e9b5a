/**
 * Input field builders: each returns a zod schema carrying its editor metadata
 * (label, unit, default, min, max, ...) through zod's `.meta()`; the registry
 * reads that metadata back to build the JSON descriptor of a kind.
 */
import { z } from 'zod';
import type { CalcInputField, InputFrame } from './types';

export type FieldMeta = Omit<CalcInputField, 'name'>;

interface NumberOptions {
  min: number;
  max: number;
  /** exclusive bounds (e.g. eccentricity < 1) */
  minExclusive?: boolean;
  maxExclusive?: boolean;
  default?: number;
  optional?: boolean;
  help?: string;
}

function bounded(base: z.ZodNumber, o: NumberOptions): z.ZodNumber {
  const lower = o.minExclusive ? base.gt(o.min) : base.gte(o.min);
  return o.maxExclusive ? lower.lt(o.max) : lower.lte(o.max);
}

interface MetaOptions {
  min?: number;
  max?: number;
  optional?: boolean;
  help?: string;
  options?: string[];
  default?: unknown;
}

function metaOf(label: string, unit: string | null, type: CalcInputField['type'], o: MetaOptions): FieldMeta {
  const meta: FieldMeta = { label, unit, type };
  if (o.default !== undefined) meta.default = o.default;
  if (o.min !== undefined) meta.min = o.min;
  if (o.max !== undefined) meta.max = o.max;
  if (o.optional) meta.optional = true;
  if (o.options) meta.options = o.options;
  if (o.help) meta.help = o.help;
  return meta;
}

/** A real-valued field in the unit named. */
export function numberField(
  label: string,
  unit: string | null,
  o: NumberOptions & { default: number },
): z.ZodDefault<z.ZodNumber>;
export function numberField(
  label: string,
  unit: string | null,
  o: NumberOptions & { optional: true },
): z.ZodOptional<z.ZodNumber>;
export function numberField(label: string, unit: string | null, o: NumberOptions): z.ZodNumber;
export function numberField(label: string, unit: string | null, o: NumberOptions): z.ZodType {
  const base = bounded(z.number(), o);
  const meta = metaOf(label, unit, 'number', o);
  if (o.default !== undefined) return base.default(o.default).meta(meta);
  if (o.optional) return base.optional().meta(meta);
  return base.meta(meta);
}

/** An integer field. */
export function integerField(
  label: string,
  unit: string | null,
  o: NumberOptions & { default: number },
): z.ZodDefault<z.ZodNumber>;
export function integerField(label: string, unit: string | null, o: NumberOptions): z.ZodNumber;
export function integerField(label: string, unit: string | null, o: NumberOptions): z.ZodType {
  const base = bounded(z.number().int(), o);
  const meta = metaOf(label, unit, 'integer', o);
  return o.default !== undefined ? base.default(o.default).meta(meta) : base.meta(meta);
}

/** One of a fixed list of strings. */
export function enumField<const T extends readonly [string, ...string[]]>(
  label: string,
  options: T,
  def: T[number],
  help?: string,
): z.ZodDefault<z.ZodEnum<{ [K in T[number]]: K }>> {
  return z
    .enum(options)
    .default(def)
    .meta(metaOf(label, null, 'enum', { options: [...options], default: def, help }));
}

const ISO_UTC = /^(\d{4})-(\d{2})-(\d{2})(?:[T ](\d{2}):(\d{2})(?::(\d{2})(?:\.(\d{1,9}))?)?)?(Z|z|[+-]00:?00)?$/;

/** Earliest and latest epochs accepted (the almanac Sun formulae are quoted for 1950–2050; we allow 1900–2100 with a warning outside). */
export const EPOCH_MIN_YEAR = 1900;
export const EPOCH_MAX_YEAR = 2100;

/** Parse an ISO 8601 UTC date/time ('2025-03-20', '2025-03-20T12:00:00Z'); undefined when malformed or out of range. */
export function parseUtcEpoch(text: string): Date | undefined {
  const m = ISO_UTC.exec(text.trim());
  if (!m) return undefined;
  const [y, mo, d, h, mi, s] = [m[1], m[2], m[3], m[4] ?? '0', m[5] ?? '0', m[6] ?? '0'].map(Number);
  const frac = m[7] ? Number(`0.${m[7]}`) : 0;
  if (y < EPOCH_MIN_YEAR || y > EPOCH_MAX_YEAR || mo < 1 || mo > 12 || h > 23 || mi > 59 || s > 59) return undefined;
  const ms = Date.UTC(y, mo - 1, d, h, mi, s) + frac * 1000;
  const date = new Date(ms);
  if (!Number.isFinite(ms) || date.getUTCDate() !== d) return undefined;
  return date;
}

/** An ISO 8601 UTC epoch string. */
export function epochField(label: string, o: { default?: string; help?: string }): z.ZodType<string>;
export function epochField(label: string, o: { optional: true; help?: string }): z.ZodType<string | undefined>;
export function epochField(label: string): z.ZodType<string>;
export function epochField(
  label: string,
  o: { default?: string; help?: string; optional?: boolean } = {},
): z.ZodType<string | undefined> {
  const base = z
    .string()
    .max(40)
    .refine((t) => parseUtcEpoch(t) !== undefined, {
      message: `not an ISO 8601 UTC epoch between ${EPOCH_MIN_YEAR} and ${EPOCH_MAX_YEAR} (e.g. 2025-03-20T12:00:00Z)`,
    });
  const meta = metaOf(label, null, 'epoch', { default: o.default, help: o.help, optional: o.optional });
  if (o.optional) return base.optional().meta(meta);
  return (o.default !== undefined ? base.default(o.default) : base).meta(meta) as z.ZodType<string>;
}

/** Free text with a length limit; `multiline` text (a pasted TLE) gets a text area in the editor. */
export function stringField(label: string, o: { maxLength: number; help?: string; multiline?: boolean }): z.ZodString {
  const meta = metaOf(label, null, 'string', { help: o.help });
  return z
    .string()
    .min(1)
    .max(o.maxLength)
    .meta(o.multiline ? { ...meta, multiline: true } : meta);
}

/**
 * Multi-line text pasted by the analyst (a CSV table), optional, with a length limit; stored in the calc block's
 * inputs like any typed value, so a frozen revision keeps it. The editor shows a text area.
 */
export function textField(label: string, o: { maxLength: number; help?: string }): z.ZodOptional<z.ZodString> {
  return z
    .string()
    .max(o.maxLength)
    .optional()
    .meta({ ...metaOf(label, null, 'text', { optional: true, help: o.help }), maxLength: o.maxLength });
}

/** A map of names to strings (e.g. named quantities with units). */
export function recordField(label: string, o: { maxEntries: number; maxLength: number; help?: string }) {
  const base = z
    .record(
      z.string().regex(/^[A-Za-z_][A-Za-z0-9_]{0,31}$/, 'names must be identifiers (letters, digits, _)'),
      z.string().max(o.maxLength),
    )
    .refine((r) => Object.keys(r).length <= o.maxEntries, { message: `at most ${o.maxEntries} entries` });
  return base.default({}).meta(metaOf(label, null, 'record', { default: {}, help: o.help }));
}

/**
 * Marks an orbital-element field with the frame its value must be expressed in
 * (`'TOD'`: true equator and equinox of date, the frame of the engine's secular
 * theory and local-time functions). Returns the same schema with that metadata.
 */
export function inFrame<T extends z.ZodType>(schema: T, frame: InputFrame): T {
  const meta = readFieldMeta(schema);
  if (!meta) throw new Error('inFrame: the field has no metadata');
  return schema.meta({ ...meta, frame }) as T;
}

/** Metadata stored on a field schema by the builders above. */
export function readFieldMeta(schema: z.ZodType): FieldMeta | undefined {
  const meta = schema.meta();
  if (!meta || typeof meta.label !== 'string' || typeof meta.type !== 'string') return undefined;
  return meta as unknown as FieldMeta;
}
