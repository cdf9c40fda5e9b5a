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

export interface MemoVersionSummary {
  versionNumber: number;
  title: string;
  author: PersonRef;
  createdAt: string;
}

export interface MemoVersionDetail extends MemoVersionSummary {
  memoId: number;
  content: TiptapDoc;
}
