/**
 * Where headings land, for the contents, in one layout. react-pdf paginates a
 * document with page-number-dependent content twice (a first round, then a
 * round that knows the total page count); headings record their page as they
 * are placed, and the contents' page numbers are render props that read the
 * pages of the round before. The contents have the same size in every round
 * (one line per heading, a fixed-width page column), so nothing moves and the
 * second round prints where every heading landed. Should a number still be
 * wrong (it has not happened, but it is checked), the memo is laid out again
 * with the pages of this layout known from the start.
 */
export class HeadingPageBook {
  private readonly landed = new Map<string, number>();
  private readonly shown = new Map<string, number | undefined>();

  /** `known`: pages found by an earlier layout of the same memo. */
  constructor(private readonly known: ReadonlyMap<string, number> = new Map()) {}

  /** A heading was placed on `page` (the last call for a heading is its final page). */
  land(id: string, page: number): void {
    this.landed.set(id, page);
  }

  /** The page the contents print for a heading now: where it landed in an earlier round, or undefined. */
  pageFor(id: string): number | undefined {
    const page = this.landed.get(id) ?? this.known.get(id);
    this.shown.set(id, page);
    return page;
  }

  /** True when every heading landed where the contents last said it is. */
  consistent(): boolean {
    return this.landed.size === this.shown.size && [...this.landed].every(([id, page]) => this.shown.get(id) === page);
  }

  /** A book for another layout, knowing where headings landed in this one. */
  next(): HeadingPageBook {
    return new HeadingPageBook(new Map(this.landed));
  }
}
