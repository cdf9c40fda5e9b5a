import { OrbitMessageError, type KvnItem, type OrbitMessageHeader } from './orbit-message-types';
import { parseCcsdsEpoch } from './parse-ccsds-epoch';
import { requireEntry, type KeywordSection } from './collect-keywords';

/** ODM versions read: 1.0 (502.0-B-1), 2.0 (502.0-B-2) and 3.0 (502.0-B-3); the keywords used here are common to all three. */
const VERSIONS = new Set(['1.0', '2.0', '3.0']);

export const HEADER_KEYWORDS = (versionKeyword: string): ReadonlySet<string> =>
  new Set([versionKeyword, 'CREATION_DATE', 'ORIGINATOR', 'MESSAGE_ID']);

/** The first item must be the version keyword (502.0-B-3 header tables, from memory; every example of annex G starts so). */
export function checkVersionFirst(items: KvnItem[], versionKeyword: string): void {
  const first = items.find((i) => i.kind === 'data' || i.keyword !== 'COMMENT') ?? items[0];
  if (first.kind !== 'keyword' || first.keyword !== versionKeyword) {
    throw new OrbitMessageError(
      first.line,
      first.kind === 'keyword' ? first.keyword : null,
      `the message must start with ${versionKeyword}`,
    );
  }
}

/** Reads the header section (version, CREATION_DATE, ORIGINATOR mandatory; MESSAGE_ID optional). */
export function readMessageHeader(
  section: KeywordSection,
  versionKeyword: string,
  messageType: string,
): OrbitMessageHeader {
  const version = requireEntry(section, versionKeyword, messageType);
  if (!VERSIONS.has(version.value))
    throw new OrbitMessageError(
      version.line,
      versionKeyword,
      `version "${version.value.slice(0, 20)}" is not one of ${[...VERSIONS].join(', ')}`,
    );
  const created = requireEntry(section, 'CREATION_DATE', messageType);
  parseCcsdsEpoch(created.value, created.line, 'CREATION_DATE');
  return {
    version: version.value,
    creationDate: created.value,
    originator: requireEntry(section, 'ORIGINATOR', messageType).value,
    messageId: section.entries.get('MESSAGE_ID')?.value ?? null,
    comments: section.comments,
  };
}
