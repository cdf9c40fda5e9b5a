/** Title page, approval block and revision record. */
import { Text, View } from '@react-pdf/renderer';
import type { Approvals, ApprovalEntry, ApprovalSignature, RevisionRecordRow } from './memo-pdf-types';
import { CAUTION_TEXT, CAUTION_TITLE, DOCUMENT_KIND } from './pdf-text';
import { frontStyles as s } from './front-matter-styles';
import { formatDateTime } from '@/lib/format/format-date';

export interface TitlePageProps {
  organisation: string;
  documentNumber: string;
  title: string;
  revisionLabel: string;
  date: string;
  author: string;
  distribution: string;
}

export const isoDate = (iso: string | undefined): string =>
  iso && !Number.isNaN(Date.parse(iso)) ? new Date(iso).toISOString().slice(0, 10) : '';

export function TitlePage(p: TitlePageProps) {
  const facts: [string, string][] = [
    ['Document', p.documentNumber],
    ['Revision', p.revisionLabel],
    ['Date', p.date],
    ['Author', p.author],
    ['Organisation', p.organisation],
  ];
  return (
    <View style={s.titleBlock}>
      <Text style={s.kicker}>{`${p.organisation} · ${DOCUMENT_KIND}`}</Text>
      <Text style={s.title}>{p.title}</Text>
      <View style={s.facts}>
        {facts.map(([k, v]) => (
          <View key={k} style={s.factRow}>
            <Text style={s.factKey}>{k}</Text>
            <Text style={s.factValue}>{v}</Text>
          </View>
        ))}
      </View>
      <Text style={s.distribution}>{p.distribution}</Text>
    </View>
  );
}

export function CautionNote() {
  return (
    <View style={s.caution} wrap={false}>
      <Text style={s.cautionTitle}>{CAUTION_TITLE}</Text>
      <Text>{CAUTION_TEXT}</Text>
    </View>
  );
}

const APPROVAL_ROLES: { key: Exclude<keyof Approvals, 'signatures'>; role: string }[] = [
  { key: 'author', role: 'Author' },
  { key: 'reviewer', role: 'Reviewer' },
  { key: 'configurationManager', role: 'Configuration manager' },
];

const BLANK = ' ';

export function ApprovalBlock({ approvals }: { approvals: Approvals }) {
  if (approvals.signatures) return <SignedApprovalBlock approvals={approvals} signatures={approvals.signatures} />;
  return (
    <View style={s.section} wrap={false}>
      <Text style={s.sectionTitle}>Approval</Text>
      <View style={[s.gridRow, s.gridHead]}>
        <Text style={[s.gridCell, { flex: 1.2 }]}>Role</Text>
        <Text style={[s.gridCell, { flex: 1.6 }]}>Name</Text>
        <Text style={[s.gridCell, { flex: 1.6 }]}>Signature</Text>
        <Text style={[s.gridCell, { flex: 1 }]}>Date</Text>
      </View>
      {APPROVAL_ROLES.map(({ key, role }) => {
        const entry: ApprovalEntry = approvals[key] ?? {};
        return (
          <View key={key} style={[s.gridRow, s.signRow]}>
            <Text style={[s.gridCell, { flex: 1.2 }]}>{role}</Text>
            <Text style={[s.gridCell, s.line, { flex: 1.6 }]}>{entry.name ?? BLANK}</Text>
            <Text style={[s.gridCell, s.line, { flex: 1.6 }]}>{BLANK}</Text>
            <Text style={[s.gridCell, s.line, { flex: 1 }]}>{isoDate(entry.date) || BLANK}</Text>
          </View>
        );
      })}
    </View>
  );
}

const SIGNED_COLUMNS = { role: 1.3, name: 1.5, meaning: 2.3, at: 1.3 };

/**
 * A frozen revision's approval block: the author's submission, then every
 * electronic signature with the signer's printed name, role, the meaning of
 * the signature and its date and time in UTC — the items a signed record
 * shows in its human-readable form (21 CFR 11.50).
 */
function SignedApprovalBlock({ approvals, signatures }: { approvals: Approvals; signatures: ApprovalSignature[] }) {
  const rows: ApprovalSignature[] = [
    {
      role: 'Author',
      name: approvals.author?.name ?? '',
      meaning: 'Author; submitted for review',
      signedAt: approvals.author?.date ?? '',
    },
    ...signatures,
  ];
  return (
    <View style={s.section} wrap={false}>
      <Text style={s.sectionTitle}>Approval</Text>
      <View style={[s.gridRow, s.gridHead]}>
        <Text style={[s.gridCell, { flex: SIGNED_COLUMNS.role }]}>Role</Text>
        <Text style={[s.gridCell, { flex: SIGNED_COLUMNS.name }]}>Name</Text>
        <Text style={[s.gridCell, { flex: SIGNED_COLUMNS.meaning }]}>Meaning of signature</Text>
        <Text style={[s.gridCell, { flex: SIGNED_COLUMNS.at }]}>Date and time</Text>
      </View>
      {rows.map((r, i) => (
        <View key={i} style={s.gridRow}>
          <Text style={[s.gridCell, { flex: SIGNED_COLUMNS.role }]}>{r.role}</Text>
          <Text style={[s.gridCell, s.signedName, { flex: SIGNED_COLUMNS.name }]}>{r.name}</Text>
          <Text style={[s.gridCell, { flex: SIGNED_COLUMNS.meaning }]}>{r.meaning}</Text>
          <Text style={[s.gridCell, { flex: SIGNED_COLUMNS.at }]}>{r.signedAt ? formatDateTime(r.signedAt) : ''}</Text>
        </View>
      ))}
      <Text style={s.signedNote}>
        Signed electronically in Nodewright: each reviewer and the configuration manager entered their password again to
        sign. Names, roles, meanings and times (UTC) are stored with this revision and in its audit trail; the
        author&apos;s line records the submission for review.
      </Text>
    </View>
  );
}

const RECORD_COLUMNS = { revision: 0.7, date: 0.9, description: 2.4, author: 1.2, reviewers: 1.4, releasedBy: 1.5 };

export function RevisionRecord({ rows }: { rows: RevisionRecordRow[] }) {
  return (
    <View style={s.section} wrap={false}>
      <Text style={s.sectionTitle}>Revision record</Text>
      <View style={[s.gridRow, s.gridHead]}>
        <Text style={[s.gridCell, { flex: RECORD_COLUMNS.revision }]}>Revision</Text>
        <Text style={[s.gridCell, { flex: RECORD_COLUMNS.date }]}>Date</Text>
        <Text style={[s.gridCell, { flex: RECORD_COLUMNS.description }]}>Description</Text>
        <Text style={[s.gridCell, { flex: RECORD_COLUMNS.author }]}>Author</Text>
        <Text style={[s.gridCell, { flex: RECORD_COLUMNS.reviewers }]}>Reviewed by</Text>
        <Text style={[s.gridCell, { flex: RECORD_COLUMNS.releasedBy }]}>Released by</Text>
      </View>
      {rows.map((r, i) => (
        <View key={i} style={s.gridRow}>
          <Text style={[s.gridCell, { flex: RECORD_COLUMNS.revision }]}>{r.revision}</Text>
          <Text style={[s.gridCell, { flex: RECORD_COLUMNS.date }]}>{isoDate(r.date) || r.date}</Text>
          <Text style={[s.gridCell, { flex: RECORD_COLUMNS.description }]}>{r.description}</Text>
          <Text style={[s.gridCell, { flex: RECORD_COLUMNS.author }]}>{r.author ?? ''}</Text>
          <Text style={[s.gridCell, { flex: RECORD_COLUMNS.reviewers }]}>{r.reviewers ?? ''}</Text>
          <Text style={[s.gridCell, { flex: RECORD_COLUMNS.releasedBy }]}>{r.releasedBy ?? '–'}</Text>
        </View>
      ))}
    </View>
  );
}
