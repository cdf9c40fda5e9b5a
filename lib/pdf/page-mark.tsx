import type { ReactNode } from 'react';
import { Text, View } from '@react-pdf/renderer';
import { styles } from './pdf-theme';
import type { HeadingPageBook } from './heading-page-book';

/**
 * A PDF outline entry. react-pdf's layout reads `bookmark` on any node (resolveBookmarks; an entry nests under the
 * nearest ancestor with one) while its renderer typings declare it on Page only, hence the untyped prop.
 */
export const bookmarkProps = (title: string): object => ({ bookmark: { title, fit: true } });

/** Records in the book the page this point of the flow lands on (for the contents and the lists of figures and tables). */
export function PageMark({
  id,
  book,
  minPresenceAhead,
}: {
  id: string;
  book: HeadingPageBook;
  minPresenceAhead?: number;
}) {
  return (
    <View
      minPresenceAhead={minPresenceAhead}
      render={({ pageNumber }) => {
        book.land(id, pageNumber);
        return null;
      }}
    />
  );
}

/**
 * A table caption ("Table 3. …") above its table, recording the table's page. It is the table's first child and has
 * minPresenceAhead: react-pdf's paginator never breaks right after such a first child, so a caption is never left
 * alone at a page foot.
 */
export function TableCaption({
  id,
  book,
  label,
  children,
}: {
  id: string;
  book: HeadingPageBook;
  label: string;
  children: ReactNode;
}) {
  return (
    <View wrap={false} minPresenceAhead={1}>
      <PageMark id={id} book={book} />
      <Text style={[styles.caption, { marginTop: 0, marginBottom: 3 }]}>
        <Text style={styles.captionLabel}>{label}</Text>
        {children}
      </Text>
    </View>
  );
}
