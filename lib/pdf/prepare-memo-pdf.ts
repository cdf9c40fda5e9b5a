/**
 * The asynchronous part of a memo PDF, done before layout: every figure is
 * built from its bound block's server result and rendered to SVG, every
 * image is resolved to bytes; numbers come from the document index.
 */
import type { BlockEvaluation } from '@/lib/documents/evaluate-document';
import { buildFigureSpec } from '@/lib/figures/build-figure-spec';
import { renderFigureSvg } from '@/lib/figures/render-figure-svg';
import { documentIndex, type HeadingInfo } from '@/lib/documents/model/document-index';
import { walk } from '@/lib/documents/model/walk-document';
import type { TiptapNode } from '@/lib/memos/memo-schema';
import { checkRequirementWith, type RequirementCheck } from '@/lib/requirements/check-requirements';
import { lookupInEvaluations } from '@/lib/requirements/lookup-outputs';
import type { ImageResolver, PdfImage } from './memo-pdf-types';
import { numberTables, type TableIndex } from './number-tables';
import { NODE_HANDLERS } from './render-content';
import { MARK_HANDLERS, UnknownContentTypeError } from './render-inline';

export interface PreparedFigure {
  number: number;
  caption: string;
  svg?: string;
  error?: string;
}

export interface PreparedMemo {
  headings: Map<TiptapNode, HeadingInfo>;
  figures: Map<string, PreparedFigure>;
  images: Map<string, PdfImage | undefined>;
  tables: TableIndex;
  /** Every requirement in document order, checked against this document's evaluations. */
  requirements: RequirementCheck[];
}

/** Letter of the annex of full series tables, when the memo has a series cut in the body; the constants appendix follows it. */
export const ANNEX_LETTER = 'A';

const DATA_URL = /^data:image\/(png|jpe?g);base64,([A-Za-z0-9+/=\s]+)$/;

/** Data URLs of PNG and JPEG images decode here; every other source goes to the resolver. */
export async function resolveImageSource(src: string, resolver?: ImageResolver): Promise<PdfImage | undefined> {
  const m = DATA_URL.exec(src);
  if (m) return { data: Buffer.from(m[2], 'base64'), format: m[1] === 'png' ? 'png' : 'jpg' };
  return resolver ? resolver(src) : undefined;
}

/**
 * Every node and mark type must have a handler; checked before layout so
 * that the error names the type (react-pdf would bury an exception thrown
 * while it renders).
 */
export function assertKnownContent(doc: TiptapNode): void {
  walk(doc, (node) => {
    if (!(node.type in NODE_HANDLERS)) throw new UnknownContentTypeError('node', node.type, Object.keys(NODE_HANDLERS));
    for (const mark of node.marks ?? []) {
      if (!(mark.type in MARK_HANDLERS))
        throw new UnknownContentTypeError('mark', mark.type, Object.keys(MARK_HANDLERS));
    }
  });
}

export async function prepareMemoPdf(
  doc: TiptapNode,
  evaluations: ReadonlyMap<string, BlockEvaluation>,
  resolveImage?: ImageResolver,
): Promise<PreparedMemo> {
  assertKnownContent(doc);
  const index = documentIndex(doc);
  const figures = new Map<string, PreparedFigure>();
  for (const f of index.figures) {
    const base = { number: index.figureNumbers.get(f.figureId) ?? 0, caption: f.caption };
    const outcome = buildFigureSpec(f.figureKind, evaluations.get(f.blockId));
    figures.set(
      f.figureId,
      outcome.ok ? { ...base, svg: await renderFigureSvg(outcome.spec) } : { ...base, error: outcome.error },
    );
  }
  const images = new Map<string, PdfImage | undefined>();
  for (const src of index.imageSources) images.set(src, await resolveImageSource(src, resolveImage));
  const lookup = lookupInEvaluations(evaluations);
  return {
    headings: index.headings,
    figures,
    images,
    tables: numberTables(doc, evaluations, ANNEX_LETTER),
    requirements: index.requirements.map((r) => checkRequirementWith(r, lookup)),
  };
}
