import { Text, View } from '@react-pdf/renderer';
import type { PrintableSheet } from '../printable-sheet.js';
import { Heading } from './table.js';

/** Unique references of the derivation steps, the checks and the criteria values, in first-use order. */
export function collectReferences(sheet: PrintableSheet): string[] {
  const all = [
    ...(sheet.evaluation?.derivation.map((s) => s.reference) ?? []),
    ...(sheet.evaluation?.checks.map((c) => c.source) ?? []),
    ...sheet.criteria.values.map((v) => v.source),
  ];
  const seen = new Set<string>();
  for (const r of all) {
    const t = r.trim();
    if (t && t.toLowerCase() !== 'definition') seen.add(t);
  }
  return [...seen];
}

export function References(props: { sheet: PrintableSheet }) {
  const refs = collectReferences(props.sheet);
  return (
    <View>
      <Heading>References</Heading>
      {refs.length === 0 ? (
        <Text>No outside references: every step is a definition.</Text>
      ) : (
        refs.map((r, i) => (
          <View key={r} style={{ flexDirection: 'row', marginBottom: 1.5 }} wrap={false}>
            <Text style={{ width: 22 }}>[{i + 1}]</Text>
            <Text style={{ flex: 1 }}>{r}</Text>
          </View>
        ))
      )}
      <Text style={{ marginTop: 4, fontSize: 7 }}>
        &quot;Common practice&quot; marks a trade fact with no published source; values recalled
        from memory say so. Steps marked &quot;definition&quot; follow from the definition of the
        quantity.
      </Text>
    </View>
  );
}
