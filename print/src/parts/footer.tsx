import { View } from '@react-pdf/renderer';
import { Text } from '../text.js';
import { stamp } from '../format.js';
import type { PrintableSheet } from '../printable-sheet.js';
import { colours } from '../theme.js';

/** Footer on every page: what this file is and when it was made, plus the one-line caution. */
export function Footer(props: { sheet: PrintableSheet }) {
  const { sheet } = props;
  return (
    <View
      fixed
      style={{
        position: 'absolute',
        left: 34,
        right: 34,
        bottom: 16,
        borderTopWidth: 0.5,
        borderColor: colours.rule,
        paddingTop: 3,
        flexDirection: 'row',
        justifyContent: 'space-between',
        fontSize: 6.5,
        color: colours.muted,
      }}
    >
      <Text style={{ flex: 1, paddingRight: 12 }}>
        {sheet.documentNumber} rev {sheet.revision.label} · printed {stamp(sheet.generatedAt)} ·
        Holdfast calc core {sheet.coreVersion ?? 'n/a'}
        {sheet.verification ? ` · verify: ${sheet.verification.url}` : ''}
      </Text>
      <Text style={{ width: 150, textAlign: 'right' }}>
        Supports, never replaces, a competent engineer&apos;s judgement.
      </Text>
    </View>
  );
}
