import type { TiptapDoc } from '@/lib/memos/memo-schema';

/** A starting document offered by "New memo". */
export interface MemoTemplate {
  id: string;
  title: string;
  description: string;
  build: () => TiptapDoc;
}
