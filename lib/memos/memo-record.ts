import type { MemoAction } from '@/lib/auth/permissions';
import type { MemoStatus } from './memo-status';
import type { TiptapDoc } from './memo-schema';

export interface PersonRef {
  id: number;
  name: string;
}

export interface MemoSummary {
  id: number;
  documentNumber: string;
  title: string;
  status: MemoStatus;
  version: number;
  owner: PersonRef;
  /** Review threads on this memo that are still open. */
  openThreads: number;
  createdAt: string;
  updatedAt: string;
}

export interface MemoDetail extends MemoSummary {
  content: TiptapDoc;
  reviewers: PersonRef[];
  /** Analysts the owner added; with the owner they edit, submit and settle threads. */
  coAuthors: PersonRef[];
  /** What the requesting user may do with this memo now (decided by the permissions module). */
  allowedActions: MemoAction[];
  /** Why the requesting user may not edit the text now (the permissions module's reason), or null when they may. */
  editRefusal: string | null;
}

/**
 * An entry of a memo's history: an editing session shown as its last version
 * (`versionNumber`), or one save when every save is asked for (then
 * `firstVersionNumber` = `versionNumber` and `saveCount` = 1).
 */
export interface MemoVersionSummary {
  versionNumber: number;
  firstVersionNumber: number;
  saveCount: number;
  /** Title of the last version. */
  title: string;
  author: PersonRef;
  /** When the first save of the entry was made. */
  startedAt: string;
  /** When the last save of the entry was made. */
  createdAt: string;
  /** The name given to the last version ("Checkpoint: before review"), or null. */
  label: string | null;
  /** The older version this entry's save restored, or null. */
  restoredFrom: number | null;
}

export interface MemoVersionDetail {
  memoId: number;
  versionNumber: number;
  title: string;
  author: PersonRef;
  createdAt: string;
  label: string | null;
  content: TiptapDoc;
}

/** A name given to a saved version. */
export interface MemoVersionName {
  versionNumber: number;
  label: string;
  namedBy: PersonRef;
  namedAt: string;
}
