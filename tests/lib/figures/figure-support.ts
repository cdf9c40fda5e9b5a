import { runCalc } from '@/lib/calc';
import type { BlockEvaluation } from '@/lib/documents/evaluate-document';
import type { FigureSpec } from '@/lib/figures/figure-types';

/** A block evaluation straight from runCalc, as evaluateDocument would report it. */
export function evaluated(kind: string, inputs: Record<string, unknown>): Extract<BlockEvaluation, { status: 'ok' }> {
  const outcome = runCalc(kind, inputs);
  if (!outcome.ok) throw new Error(`${kind}: ${outcome.error}`);
  return {
    blockId: 'b1',
    status: 'ok',
    block: { blockId: 'b1', kind, label: '', inputs: {} },
    result: outcome.result,
    requestedInputs: inputs,
  };
}

type Layered = { name?: string; data?: { values?: unknown[] }; layer?: Layered[]; vconcat?: Layered[] };

/** The data values of the (nested) layer named `name`. */
export function layerValues(spec: FigureSpec, name: string): Record<string, unknown>[] {
  const stack: Layered[] = [spec as Layered];
  while (stack.length) {
    const node = stack.pop()!;
    if (node.name === name) return (node.data?.values ?? []) as Record<string, unknown>[];
    stack.push(...(node.layer ?? []), ...(node.vconcat ?? []));
  }
  throw new Error(`no layer named ${name}`);
}

/** Text content of every <text> element of an SVG. */
export const svgTexts = (svg: string): string[] =>
  [...svg.matchAll(/<text[^>]*>([^<]*)<\/text>/g)].map((m) => m[1].replace(/&amp;/g, '&'));
