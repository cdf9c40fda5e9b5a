/** Table of contents with page numbers (from the previous layout pass) and links to the headings. */
import { Link, StyleSheet, Text, View } from '@react-pdf/renderer';
import type { HeadingPageBook } from './heading-page-book';
import { INK, INK_FAINT, ORBIT, RULE } from './pdf-theme';

const s = StyleSheet.create({
  title: { fontSize: 11, fontWeight: 600, color: INK, marginBottom: 6, paddingBottom: 3, borderBottomWidth: 0.8, borderBottomColor: ORBIT },
  row: { flexDirection: 'row', alignItems: 'flex-end', marginBottom: 2.5 },
  number: { width: 34, color: ORBIT },
  text: { color: INK },
  leader: { flex: 1, borderBottomWidth: 0.6, borderBottomColor: RULE, borderBottomStyle: 'dotted', marginHorizontal: 4, marginBottom: 3 },
  page: { width: 22, textAlign: 'right', color: INK },
  link: { textDecoration: 'none', color: INK },
});

export interface ContentsEntry {
  id: string;
  number: string;
  title: string;
  level: number;
}

/** Page numbers are those of the previous pass ("–" in the first). */
export function ContentsView({ entries, book }: { entries: ContentsEntry[]; book: HeadingPageBook }) {
  return (
    <View style={{ marginBottom: 16 }}>
      <Text style={s.title}>Contents</Text>
      {entries.map((e) => (
        <Link key={e.id} src={`#${e.id}`} style={s.link}>
          <View style={[s.row, { paddingLeft: (e.level - 1) * 12, fontSize: e.level === 1 ? 9.5 : 9, fontWeight: e.level === 1 ? 500 : 400 }]}>
            <Text style={s.number}>{e.number}</Text>
            <Text style={s.text}>{e.title}</Text>
            <View style={s.leader} />
            <Text style={[s.page, { color: book.printed.has(e.id) ? INK : INK_FAINT }]}>{String(book.printed.get(e.id) ?? '–')}</Text>
          </View>
        </Link>
      ))}
    </View>
  );
}
