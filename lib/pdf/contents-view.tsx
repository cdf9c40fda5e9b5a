/** Contents, list of figures and list of tables: page numbers (render props reading where each entry landed) and links to the entries. */
import { Link, StyleSheet, Text, View } from '@react-pdf/renderer';
import type { HeadingPageBook } from './heading-page-book';
import { bookmarkProps } from './page-mark';
import { INK, INK_FAINT, ORBIT, RULE } from './pdf-theme';

const s = StyleSheet.create({
  title: {
    fontSize: 11,
    fontWeight: 600,
    color: INK,
    marginBottom: 6,
    paddingBottom: 3,
    borderBottomWidth: 0.8,
    borderBottomColor: ORBIT,
  },
  row: { flexDirection: 'row', alignItems: 'flex-end', marginBottom: 2.5 },
  number: { width: 34, color: ORBIT },
  text: { color: INK },
  leader: {
    flex: 1,
    borderBottomWidth: 0.6,
    borderBottomColor: RULE,
    borderBottomStyle: 'dotted',
    marginHorizontal: 4,
    marginBottom: 3,
  },
  page: { width: 22 },
  // The page number is a render prop, laid over the row's last column. react-pdf lays a render prop out
  // again from styles it has already resolved, where a unitless line height would be multiplied by the
  // font size a second time; the number's own Text, created fresh by the render prop, carries a line
  // height that wins over the inherited one. Kept out of the row: a row holding a render prop is laid out
  // again as a whole.
  pageCell: { position: 'absolute', right: 0, top: 0, width: 22 },
  pageNumber: { textAlign: 'right', lineHeight: 1.42 },
  link: { position: 'relative', textDecoration: 'none', color: INK },
});

export interface ContentsEntry {
  id: string;
  /** "1.2", "Appendix A", "Figure 3"; empty for an unnumbered entry. */
  number: string;
  title: string;
  level: number;
}

/** Page numbers are those of the previous pagination round ("–" in react-pdf's first round, which is not printed). */
export function ContentsView({
  title,
  entries,
  book,
  numberWidth = 34,
}: {
  title: string;
  entries: ContentsEntry[];
  book: HeadingPageBook;
  numberWidth?: number;
}) {
  if (entries.length === 0) return null;
  return (
    <View style={{ marginBottom: 16 }} {...bookmarkProps(title)}>
      <Text style={s.title} minPresenceAhead={40}>
        {title}
      </Text>
      {entries.map((e) => (
        <Link
          key={e.id}
          src={`#${e.id}`}
          style={[s.link, { fontSize: e.level === 1 ? 9.5 : 9, fontWeight: e.level === 1 ? 500 : 400 }]}
        >
          <View style={[s.row, { paddingLeft: (e.level - 1) * 12 }]}>
            <Text style={[s.number, { width: e.number ? numberWidth : 0 }]}>{e.number}</Text>
            <Text style={s.text}>{e.title}</Text>
            <View style={s.leader} />
            <View style={s.page} />
          </View>
          <View
            style={s.pageCell}
            render={() => {
              const page = book.pageFor(e.id);
              return (
                <Text style={[s.pageNumber, { color: page === undefined ? INK_FAINT : INK }]}>
                  {page === undefined ? '–' : String(page)}
                </Text>
              );
            }}
          />
        </Link>
      ))}
    </View>
  );
}
