/** A text attribute `attr`, written to and read from the HTML (copy, cut and paste) as `data-<html>`. */
export const textAttr = <T extends string | null>(attr: string, html: string, fallback: T) => ({
  default: fallback,
  parseHTML: (el: HTMLElement) => el.getAttribute(`data-${html}`) ?? fallback,
  renderHTML: (attrs: Record<string, unknown>) => ({ [`data-${html}`]: attrs[attr] ?? fallback }),
});
