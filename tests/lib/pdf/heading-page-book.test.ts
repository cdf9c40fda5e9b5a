/** The contents' page numbers within one layout: what the book prints, and when it asks for another layout. */
import { describe, expect, it } from 'vitest';
import { HeadingPageBook } from '@/lib/pdf/heading-page-book';

describe('HeadingPageBook', () => {
  it('prints nothing in the first round, then where each heading landed in it, and is then consistent', () => {
    const book = new HeadingPageBook();
    // Round 1: the contents come before the headings.
    expect(book.pageFor('h1')).toBeUndefined();
    expect(book.pageFor('h2')).toBeUndefined();
    book.land('h1', 3);
    book.land('h2', 5);
    expect(book.consistent()).toBe(false);
    // Round 2: the contents read round 1; the headings land in the same places.
    expect(book.pageFor('h1')).toBe(3);
    expect(book.pageFor('h2')).toBe(5);
    book.land('h1', 3);
    book.land('h2', 5);
    expect(book.consistent()).toBe(true);
  });

  it('asks for another layout when a heading moved after the contents printed, and that layout starts from the new pages', () => {
    const book = new HeadingPageBook();
    book.land('h1', 3);
    expect(book.pageFor('h1')).toBe(3);
    book.land('h1', 4);
    expect(book.consistent()).toBe(false);
    const again = book.next();
    expect(again.pageFor('h1')).toBe(4);
    again.land('h1', 4);
    expect(again.consistent()).toBe(true);
  });

  it('is not consistent while a heading has not been printed in the contents', () => {
    const book = new HeadingPageBook();
    book.land('h1', 2);
    expect(book.consistent()).toBe(false);
  });
});
