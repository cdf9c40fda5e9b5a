/** Title page, approval block and revision record. */
import { Text, View } from '@react-pdf/renderer';
import type { Approvals, ApprovalEntry, RevisionRecordRow } from './memo-pdf-types';
import { CAUTION_TEXT, CAUTION_TITLE, DOCUMENT_KIND } from './pdf-text';
import { frontStyles as s } from './front-matter-styles';

export interface TitlePageProps {
  organisation: string;
  documentNumber: string;
  title: string;
  revisionLabel: string;
  date: string;
  author: string;
  distribution: string;
}

export const isoDate = (iso: string | undefined): string => (iso && !Number.isNaN(Date.parse(iso)) ? new Date(iso).toISOString().slice(0, 10) : '');

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

const APPROVAL_ROLES: { key: keyof Approvals; role: string }[] = [
  { key: 'author', role: 'Author' },
  { key: 'reviewer', role: 'Reviewer' },
  { key: 'configurationManager', role: 'Configuration manager' },
];

const BLANK = ' ';

export function ApprovalBlock({ approvals }: { approvals: Approvals }) {
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

export function RevisionRecord({ rows }: { rows: RevisionRecordRow[] }) {
  return (
    <View style={s.section} wrap={false}>
      <Text style={s.sectionTitle}>Revision record</Text>
      <View style={[s.gridRow, s.gridHead]}>
        <Text style={[s.gridCell, { flex: 1 }]}>Revision</Text>
        <Text style={[s.gridCell, { flex: 1 }]}>Date</Text>
        <Text style={[s.gridCell, { flex: 3.2 }]}>Description</Text>
        <Text style={[s.gridCell, { flex: 1.4 }]}>Author</Text>
      </View>
      {rows.map((r, i) => (
        <View key={i} style={s.gridRow}>
          <Text style={[s.gridCell, { flex: 1 }]}>{r.revision}</Text>
          <Text style={[s.gridCell, { flex: 1 }]}>{isoDate(r.date) || r.date}</Text>
          <Text style={[s.gridCell, { flex: 3.2 }]}>{r.description}</Text>
          <Text style={[s.gridCell, { flex: 1.4 }]}>{r.author ?? ''}</Text>
        </View>
      ))}
    </View>
  );
}
