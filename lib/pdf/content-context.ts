import type { BlockEvaluation } from '@/lib/documents/evaluate-document';
import type { HeadingPageBook } from './heading-page-book';
import type { PreparedMemo } from './prepare-memo-pdf';

/** What the content walker needs besides the node. */
export interface ContentContext {
  evaluations: ReadonlyMap<string, BlockEvaluation>;
  prepared: PreparedMemo;
  contentWidth: number;
  /** Records the page each heading lands on during pagination (the last call is the final page). */
  book: HeadingPageBook;
  /** Nesting depth of lists (0 outside lists). */
  listDepth: number;
}
