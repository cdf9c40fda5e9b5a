import { beforeAll, describe, expect, it } from 'vitest';
import { listMemos } from '@/lib/memos/list-memos';
import { saveMemo } from '@/lib/memos/save-memo';
import { searchMemos } from '@/lib/memos/search-memos';
import type { Actor } from '@/lib/auth/permissions';
import { freshDatabase, makeMemo, makeUser } from '../../support/factories';

/** Issue 12: the memo list is searched by number, title, owner and text; every word must match. */
let ida: Actor;
let ids: { eclipse: number; drag: number };
let documentNumber = '';

beforeAll(async () => {
  await freshDatabase();
  ida = await makeUser('analyst', 'Ida Fernholt');
  const other = await makeUser('analyst', 'Tomas Quillan');
  const eclipse = await makeMemo(ida, { title: 'TERNLIGHT-1 eclipse seasons' });
  const drag = await makeMemo(other, { title: 'TERNLIGHT-1 drag and disposal' });
  await saveMemo(other, drag.id, {
    baseVersion: drag.version,
    content: {
      type: 'doc',
      content: [
        { type: 'paragraph', content: [{ type: 'text', text: 'The Northmere ground station sees every pass.' }] },
      ],
    },
  });
  ids = { eclipse: eclipse.id, drag: drag.id };
  documentNumber = eclipse.documentNumber;
});

const search = async (q: string, searchText = true) =>
  (await searchMemos(await listMemos(ida), q, { searchText })).map((m) => m.id).sort();

describe('searchMemos', () => {
  it('finds by document number, title words in any order and case, and owner name', async () => {
    expect(await search(documentNumber)).toEqual([ids.eclipse]);
    expect(await search('seasons ternlight')).toEqual([ids.eclipse]);
    expect(await search('quillan')).toEqual([ids.drag]);
    expect(await search('ternlight')).toEqual([ids.eclipse, ids.drag].sort());
  });

  it('finds by words of the text only when text search is on, and needs every word', async () => {
    expect(await search('northmere station')).toEqual([ids.drag]);
    expect(await search('northmere station', false)).toEqual([]);
    expect(await search('northmere eclipse')).toEqual([]);
    expect(await search('   ')).toEqual([ids.eclipse, ids.drag].sort());
  });
});
