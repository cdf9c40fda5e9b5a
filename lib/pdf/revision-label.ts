import type { RenderMemoPdfInput } from './memo-pdf-types';

/** "Draft, version 7" or "Revision B": on every page of the PDF and in its file name. */
export const revisionLabel = (input: Pick<RenderMemoPdfInput, 'draft' | 'revision' | 'memo'>): string =>
  input.draft ? `Draft, version ${input.memo.version}` : `Revision ${input.revision ?? '–'}`;
