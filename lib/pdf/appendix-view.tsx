/** Appendix generated from the engine: every constant with value, unit and source; every method used in the memo with its references. */
import { StyleSheet, Text, View } from '@react-pdf/renderer';
import { engineVersion, getCalcKind, listConstants } from '@/lib/calc';
import type { BlockEvaluation } from '@/lib/documents/evaluate-document';
import { INK, INK_SOFT, ORBIT, PAPER, RULE } from './pdf-theme';

const s = StyleSheet.create({
  title: { fontSize: 13, fontWeight: 600, color: INK, marginBottom: 8, paddingBottom: 4, borderBottomWidth: 0.8, borderBottomColor: ORBIT },
  subtitle: { fontSize: 10.5, fontWeight: 600, marginTop: 10, marginBottom: 4 },
  row: { flexDirection: 'row', borderBottomWidth: 0.5, borderBottomColor: RULE, paddingVertical: 2 },
  head: { backgroundColor: PAPER, fontWeight: 600 },
  cell: { fontSize: 8, paddingHorizontal: 3 },
  method: { marginBottom: 7 },
  methodTitle: { fontSize: 9, fontWeight: 600 },
  small: { fontSize: 8, color: INK_SOFT },
});

const SUPERSCRIPT: Record<string, string> = { '-': '⁻', '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹' };

/** A constant as the engine holds it, every digit kept: "398600.4418", "1.08262668355 × 10⁻³". */
export function formatConstant(value: number): string {
  const abs = Math.abs(value);
  if (abs !== 0 && (abs < 1e-2 || abs >= 1e7)) {
    const [mantissa, exponent] = value.toExponential().split('e');
    return `${mantissa}\u00a0×\u00a010${[...String(Number(exponent))].map((c) => SUPERSCRIPT[c] ?? c).join('')}`;
  }
  return String(value);
}

/** The methods used by the memo's evaluated blocks, one entry per calc kind in document order. */
export function methodsUsed(evaluations: ReadonlyMap<string, BlockEvaluation>): { kind: string; title: string; method: string; references: string[] }[] {
  const seen = new Map<string, { kind: string; title: string; method: string; references: string[] }>();
  for (const e of evaluations.values()) {
    if (e.status !== 'ok' || seen.has(e.result.kind)) continue;
    seen.set(e.result.kind, { kind: e.result.kind, title: getCalcKind(e.result.kind)?.title ?? e.result.kind, method: e.result.model.method, references: e.result.model.references });
  }
  return [...seen.values()];
}

export function AppendixView({ evaluations, letter }: { evaluations: ReadonlyMap<string, BlockEvaluation>; letter: string }) {
  const constants = listConstants();
  const methods = methodsUsed(evaluations);
  return (
    <View break>
      <Text style={s.title}>{`Appendix ${letter}  Constants and models`}</Text>
      <Text style={s.small}>{`Generated from the calc engine at render time: ${engineVersion}.`}</Text>
      <Text style={s.subtitle}>Constants</Text>
      <View style={[s.row, s.head]}>
        <Text style={[s.cell, { flex: 2 }]}>Constant</Text>
        <Text style={[s.cell, { flex: 0.8 }]}>Symbol</Text>
        <Text style={[s.cell, { flex: 2.6 }]}>Value</Text>
        <Text style={[s.cell, { flex: 0.9 }]}>Unit</Text>
        <Text style={[s.cell, { flex: 3.2 }]}>Source</Text>
      </View>
      {constants.map((c) => (
        <View key={c.name} style={s.row} wrap={false}>
          <Text style={[s.cell, { flex: 2 }]}>{c.name}</Text>
          <Text style={[s.cell, { flex: 0.8 }]}>{c.symbol}</Text>
          <Text style={[s.cell, { flex: 2.6 }]}>{formatConstant(c.value)}</Text>
          <Text style={[s.cell, { flex: 0.9 }]}>{c.unit}</Text>
          <Text style={[s.cell, { flex: 3.2, color: INK_SOFT }]}>{c.source}</Text>
        </View>
      ))}
      <Text style={s.subtitle}>Methods used in this memo</Text>
      {methods.length === 0 ? <Text style={s.small}>No calc block in this memo has a result.</Text> : null}
      {methods.map((m) => (
        <View key={m.kind} style={s.method} wrap={false}>
          <Text style={s.methodTitle}>{`${m.title} (${m.kind})`}</Text>
          <Text style={{ fontSize: 8.5 }}>{m.method}</Text>
          {m.references.map((r, i) => (
            <Text key={i} style={s.small}>{`[${i + 1}] ${r}`}</Text>
          ))}
        </View>
      ))}
    </View>
  );
}
