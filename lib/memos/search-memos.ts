import { Op } from 'sequelize';
import { Memo } from '@/models';
import { docPlainText } from '@/lib/documents/doc-plain-text';
import type { TiptapNode } from './memo-schema';
import type { MemoSummary } from './memo-record';

const wordsOf = (query: string) => query.toLowerCase().split(/\s+/).filter(Boolean).slice(0, 12);

/**
 * The memos (already limited to what the actor may see) in which every word of the query
 * appears in the document number, the title, the owner's name or, when `searchText`, the
 * memo's current text; order kept. Live values and calc blocks are not searched as text
 * (their numbers change with the engine), only the prose around them.
 */
export async function searchMemos(
  memos: MemoSummary[],
  query: string,
  { searchText }: { searchText: boolean },
): Promise<MemoSummary[]> {
  const words = wordsOf(query);
  if (words.length === 0) return memos;
  const metaOf = (m: MemoSummary) => `${m.documentNumber} ${m.title} ${m.owner.name}`.toLowerCase();
  const matches = (text: string) => words.every((w) => text.includes(w));
  const byMeta = new Set(memos.filter((m) => matches(metaOf(m))).map((m) => m.id));
  const rest = memos.filter((m) => !byMeta.has(m.id));
  const byText = new Set<number>();
  if (searchText && rest.length > 0) {
    const rows = await Memo.findAll({
      where: { id: { [Op.in]: rest.map((m) => m.id) } },
      attributes: ['id', 'content'],
    });
    const meta = new Map(rest.map((m) => [m.id, metaOf(m)]));
    for (const row of rows) {
      const text = `${meta.get(row.id) ?? ''} ${docPlainText(row.content as TiptapNode, () => '').toLowerCase()}`;
      if (matches(text)) byText.add(row.id);
    }
  }
  return memos.filter((m) => byMeta.has(m.id) || byText.has(m.id));
}
