import { z } from 'zod';
import type { CalcKindDescriptor } from '@/lib/calc';
import { parseInputText } from './parse-input-text';

/**
 * The zod schema of a calc block's input form: every field is the text the
 * analyst typed, checked by the same parser the server uses, plus "required"
 * for fields with neither default nor optional. Bounds are the engine's to
 * check (its message comes back from POST /api/calc).
 */
export function inputFormSchema(kind: CalcKindDescriptor): z.ZodType<Record<string, string>, Record<string, string>> {
  const shape: Record<string, z.ZodType<string>> = {};
  for (const field of kind.inputs) {
    shape[field.name] = z.string().superRefine((text, ctx) => {
      if (text.trim() === '') {
        if (!field.optional && field.default === undefined)
          ctx.addIssue({ code: 'custom', message: `${field.label} is required` });
        return;
      }
      const parsed = parseInputText(field, text);
      if (!parsed.ok) ctx.addIssue({ code: 'custom', message: parsed.message });
    });
  }
  // The shape is built from the registry at run time, so its static type is the record of texts.
  return z.object(shape) as unknown as z.ZodType<Record<string, string>, Record<string, string>>;
}
