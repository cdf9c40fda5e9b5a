import { OrbitMessageError, type KvnEntry, type KvnItem } from './orbit-message-types';

/** Keywords of one section of a message, each kept with its line; COMMENT lines gathered apart. */
export interface KeywordSection {
  name: string;
  /** Line where the section starts (its first item), for "missing keyword" messages. */
  line: number;
  entries: Map<string, KvnEntry>;
  /** Repeatable keywords (manoeuvre blocks), in order. */
  repeated: Map<string, KvnEntry[]>;
  comments: string[];
}

export interface SectionRule {
  name: string;
  keywords: ReadonlySet<string>;
  /** Keywords that may appear more than once (each manoeuvre repeats its block, 502.0-B-3 §3.2.4.8). */
  repeatable?: ReadonlySet<string>;
  /** Accepts any keyword with this prefix (USER_DEFINED_x, §3.2.4.12). */
  prefix?: string;
}

/** Returns the last entry of a section's keyword, or throws naming it as missing (mandatory, "M" in the standard's tables). */
export function requireEntry(section: KeywordSection, keyword: string, messageType: string): KvnEntry {
  const entry = section.entries.get(keyword);
  if (!entry)
    throw new OrbitMessageError(
      section.line,
      keyword,
      `is missing: it is mandatory in the ${messageType} ${section.name}`,
    );
  return entry;
}

/**
 * Assigns keyword items to consecutive sections (header, metadata, data …):
 * a keyword belongs to the first section whose rule names it, sections never go
 * back (a header keyword after the metadata has started is refused), a keyword
 * appears at most once unless repeatable, and keywords no section names are
 * refused (502.0-B-3 §3.2.4.2 for the OPM data: only the keywords of the
 * tables shall be used; the same rule for header and metadata from memory). COMMENT lines belong to the section they stand in.
 */
export function collectKeywords(items: KvnItem[], rules: SectionRule[], messageType: string): KeywordSection[] {
  const sections: KeywordSection[] = rules.map((r) => ({
    name: r.name,
    line: 0,
    entries: new Map(),
    repeated: new Map(),
    comments: [],
  }));
  let current = 0;
  for (const item of items) {
    if (item.kind === 'data')
      throw new OrbitMessageError(item.line, null, `an ephemeris data line cannot stand in an ${messageType}`);
    const { keyword, line } = item;
    if (keyword === 'COMMENT') {
      if (sections[current].line === 0) sections[current].line = line;
      sections[current].comments.push(item.value);
      continue;
    }
    const index = rules.findIndex(
      (r) => r.keywords.has(keyword) || (r.prefix !== undefined && keyword.startsWith(r.prefix)),
    );
    if (index < 0) throw new OrbitMessageError(line, keyword, `is not a keyword of the ${messageType} (CCSDS 502.0-B)`);
    if (index < current)
      throw new OrbitMessageError(
        line,
        keyword,
        `belongs in the ${rules[index].name}, which ends before line ${sections[current].line}`,
      );
    current = index;
    const section = sections[index];
    if (section.line === 0) section.line = line;
    if (rules[index].repeatable?.has(keyword)) {
      section.repeated.set(keyword, [...(section.repeated.get(keyword) ?? []), item]);
      continue;
    }
    const earlier = section.entries.get(keyword);
    if (earlier) throw new OrbitMessageError(line, keyword, `appears a second time (first on line ${earlier.line})`);
    section.entries.set(keyword, item);
  }
  const lastLine = items.at(-1)?.line ?? 0;
  for (const s of sections) if (s.line === 0) s.line = lastLine;
  return sections;
}
