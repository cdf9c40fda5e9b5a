import type { BlockChange, CompareUnit, TableRowChange, TextSegment } from '@/lib/revisions/compare-blocks';

const INSERTED = 'bg-moss-50 text-moss-700 [text-decoration-line:underline] decoration-moss-500 underline-offset-2';
const DELETED = 'bg-ember-50 text-ember-700 line-through';

function Segments({ segments }: { segments: TextSegment[] }) {
  return (
    <>
      {segments.map((s, i) =>
        s.op === 'equal' ? (
          <span key={i}>{s.text}</span>
        ) : s.op === 'insert' ? (
          <ins key={i} className={INSERTED}>
            {s.text}
          </ins>
        ) : (
          <del key={i} className={DELETED}>
            {s.text}
          </del>
        ),
      )}
    </>
  );
}

const ROW_TONE: Record<TableRowChange['op'], string> = {
  equal: '',
  change: 'bg-sunline-50',
  insert: 'bg-moss-50',
  delete: 'bg-ember-50',
};
const ROW_LABEL: Record<TableRowChange['op'], string> = {
  equal: '',
  change: 'Row changed',
  insert: 'Row inserted',
  delete: 'Row deleted',
};

function TableRows({ rows, whole }: { rows: TableRowChange[]; whole?: 'insert' | 'delete' }) {
  return (
    <div className="overflow-x-auto">
      <table className="w-full border-collapse text-note">
        <tbody>
          {rows.map((r, i) => {
            const Cell = r.header ? 'th' : 'td';
            return (
              <tr
                key={i}
                className={whole ? '' : ROW_TONE[r.op]}
                aria-label={whole ? undefined : ROW_LABEL[r.op] || undefined}
              >
                {r.cells.map((c, j) => (
                  <Cell key={j} className="border border-rule px-2 py-1 text-left align-top">
                    <Segments segments={c} />
                  </Cell>
                ))}
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}

function Picture({ unit, tone }: { unit: Extract<CompareUnit, { kind: 'image' }>; tone: 'before' | 'after' | 'same' }) {
  const frame = tone === 'before' ? 'border-ember-500' : tone === 'after' ? 'border-moss-500' : 'border-rule';
  return (
    <figure className={`min-w-0 flex-1 rounded-card border-2 ${frame} p-2`}>
      {/* eslint-disable-next-line @next/next/no-img-element -- user attachment served by our API; next/image optimisation does not apply */}
      <img src={unit.src} alt={unit.alt || 'Image without a description'} className="mx-auto max-h-64 max-w-full" />
      <figcaption className="mt-1 text-micro text-ink-soft">
        {tone === 'before' ? 'Before' : tone === 'after' ? 'After' : 'Image'}
        {unit.alt ? `: ${unit.alt}` : ''}
      </figcaption>
    </figure>
  );
}

function Unit({ unit, op }: { unit: CompareUnit; op: 'equal' | 'insert' | 'delete' }) {
  const wholeSegments = (text: string): TextSegment[] => [{ op, text }];
  if (unit.kind === 'text')
    return (
      <p className="whitespace-pre-wrap">
        <Segments segments={wholeSegments(unit.text)} />
      </p>
    );
  if (unit.kind === 'image')
    return (
      <div className="flex">
        <Picture unit={unit} tone={op === 'delete' ? 'before' : op === 'insert' ? 'after' : 'same'} />
      </div>
    );
  const rows: TableRowChange[] = unit.rows.map((r) => ({
    op,
    header: r.header,
    cells: r.cells.map((c) => (c ? wholeSegments(c) : [])),
  }));
  return <TableRows rows={rows} whole={op === 'equal' ? undefined : op} />;
}

const CHANGE_LABEL = { insert: 'Inserted', delete: 'Deleted', change: 'Changed' } as const;

/**
 * The memo part by part: unchanged parts as they read, and each change
 * (marked `data-change` for the change navigator) with what was inserted
 * and deleted — text word by word, tables cell by cell, images before and after.
 */
export function BlockChanges({ blocks }: { blocks: BlockChange[] }) {
  return (
    <div className="space-y-3 break-words text-body leading-relaxed">
      {blocks.map((b, i) => {
        if (b.op === 'equal')
          return (
            <div key={i}>
              <Unit unit={b.unit} op="equal" />
            </div>
          );
        const kind = b.op === 'change' ? b.kind : b.unit.kind;
        return (
          <div
            key={i}
            data-change={b.op}
            className="rounded-card border-l-4 border-sunline-500 py-1 pl-3 outline-offset-2 data-[change-current]:outline data-[change-current]:outline-2 data-[change-current]:outline-orbit-500"
            aria-label={`${CHANGE_LABEL[b.op]} ${kind === 'text' ? 'text' : kind}`}
            role="group"
          >
            {b.op !== 'change' ? (
              <Unit unit={b.unit} op={b.op} />
            ) : b.kind === 'text' ? (
              <p className="whitespace-pre-wrap">
                <Segments segments={b.segments} />
              </p>
            ) : b.kind === 'table' ? (
              <TableRows rows={b.rows} />
            ) : (
              <div className="flex flex-col gap-2 sm:flex-row">
                <Picture unit={b.from} tone="before" />
                <Picture unit={b.to} tone="after" />
              </div>
            )}
          </div>
        );
      })}
    </div>
  );
}
