/**
 * Where headings land, for the contents. Headings record their page while
 * react-pdf paginates (the last call for a heading is its final page); the
 * contents print the pages of the previous pass, so a memo renders twice
 * (the contents have as many lines in each pass, so nothing moves) and a
 * third time only if a printed number turned out wrong.
 */
export class HeadingPageBook {
  private readonly landed = new Map<string, number>();

  /** `printed`: the pages the contents show in this pass. */
  constructor(readonly printed: ReadonlyMap<string, number> = new Map()) {}

  land(id: string, page: number): void {
    this.landed.set(id, page);
  }

  /** True when every heading landed where the contents say it is. */
  consistent(): boolean {
    return this.landed.size === this.printed.size && [...this.landed].every(([id, page]) => this.printed.get(id) === page);
  }

  /** A book for the next pass, printing where headings landed in this one. */
  next(): HeadingPageBook {
    return new HeadingPageBook(new Map(this.landed));
  }
}
