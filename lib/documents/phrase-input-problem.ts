import type { CalcKindDescriptor } from '@/lib/calc';

export type PhrasedProblem = {
  /** The field's label ("Mean altitude"), or "Inputs" for a problem of the block as a whole. */
  label: string;
  /** The problem as a sentence naming the field by its label: "Mean altitude must be at most 5000 km (got 6000)." */
  sentence: string;
};

const capitalise = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);
const endSentence = (s: string) => (/[.!?]$/.test(s) ? s : `${s}.`);

/**
 * The engine names an input by its field id, as its API and CLI callers need
 * ("altitudeKm: must be at most 5000 km (got 6000)"); a person editing the memo
 * reads the field's label and a sentence instead. The id prefix, and an entry path
 * after it ("rows (2.date): …"), are recognised only when they name this very field.
 */
export function phraseInputProblem(
  kind: CalcKindDescriptor | undefined,
  fieldName: string,
  message: string,
): PhrasedProblem {
  const field = kind?.inputs.find((f) => f.name === fieldName);
  const label =
    field?.label ?? (fieldName === '_' || fieldName === 'inputs' || fieldName === 'kind' ? 'Inputs' : fieldName);
  let rest = message.trim();
  const prefix = new RegExp(`^${fieldName.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}(\\s*\\(([^)]*)\\))?:\\s*`);
  const m = prefix.exec(rest);
  if (m) rest = `${rest.slice(m[0].length)}${m[2] ? ` (entry ${m[2]})` : ''}`;
  // A message that starts with a verb ("must be at most …") reads as a sentence once the label leads it.
  if (field && /^(must|is|are|has|have|waits|refers|uses|cannot|should)\b/.test(rest)) rest = `${field.label} ${rest}`;
  return { label, sentence: endSentence(capitalise(rest)) };
}

/** Every field problem of a block as "Label: sentence", in the kind's field order. */
export function phraseInputProblems(kind: CalcKindDescriptor | undefined, fields: Record<string, string>): string[] {
  const order = (name: string) => {
    const i = kind?.inputs.findIndex((f) => f.name === name) ?? -1;
    return i < 0 ? Number.MAX_SAFE_INTEGER : i;
  };
  return Object.entries(fields)
    .sort(([a], [b]) => order(a) - order(b))
    .map(([name, message]) => {
      const p = phraseInputProblem(kind, name, message);
      return p.label === 'Inputs' || p.sentence.startsWith(p.label) ? p.sentence : `${p.label}: ${p.sentence}`;
    });
}
