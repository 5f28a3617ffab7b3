import { View } from '@react-pdf/renderer';
import { Text } from '../text.js';
import type { PrintableSheet } from '../printable-sheet.js';
import { headingBlock, paragraphBlock, type BlockContext } from '../blocks.js';
import type { FlowBlock } from '../flow.js';

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

const CLOSING_NOTE =
  '"Common practice" marks a trade fact with no published source; values recalled from memory say so. Steps marked "definition" follow from the definition of the quantity.';

export function referencesBlocks(ctx: BlockContext, sheet: PrintableSheet): FlowBlock[] {
  const refs = collectReferences(sheet);
  const body = { fontSize: 8.5 };
  const blocks: FlowBlock[] = [headingBlock(ctx, 'refs-h', 'References')];
  if (refs.length === 0) {
    blocks.push(
      paragraphBlock(ctx, 'refs-none', 'No outside references: every step is a definition.'),
    );
  }
  refs.forEach((r, i) => {
    const key = `ref-${i}`;
    blocks.push({
      key,
      height: ctx.m.height(r, ctx.width - 22, body) + 1.5,
      element: (
        <View key={key} style={{ flexDirection: 'row', marginBottom: 1.5 }} wrap={false}>
          <Text style={{ width: 22 }}>[{i + 1}]</Text>
          <Text style={{ flex: 1 }}>{r}</Text>
        </View>
      ),
      carry: [headingBlock(ctx, 'refs-cont', 'References (continued)', 2)],
    });
  });
  blocks.push(paragraphBlock(ctx, 'refs-note', CLOSING_NOTE, { fontSize: 7, marginTop: 4 }));
  return blocks;
}
