import { View } from '@react-pdf/renderer';
import { Text } from '../text.js';
import { day } from '../format.js';
import type { PrintableSheet } from '../printable-sheet.js';
import { colours } from '../theme.js';

/** The words a revision that is not the current approved one carries on every page, or null. */
export function markingText(sheet: PrintableSheet): string | null {
  switch (sheet.revision.state) {
    case 'draft':
      return 'NOT FOR USE — DRAFT';
    case 'in_check':
      return 'NOT FOR USE — IN CHECK';
    case 'returned':
      return 'NOT FOR USE — RETURNED';
    case 'superseded':
      return sheet.supersededBy
        ? `SUPERSEDED by rev ${sheet.supersededBy.label} on ${day(sheet.supersededBy.date)}`
        : 'SUPERSEDED';
    default:
      return null;
  }
}

/**
 * A diagonal marking across every page plus a plain banner under the title block, so that the
 * state survives photocopying and is still read by someone who only skims the header.
 */
export function StateMarking(props: { sheet: PrintableSheet; width: number; height: number }) {
  const text = markingText(props.sheet);
  if (!text) return null;
  const superseded = props.sheet.revision.state === 'superseded';
  const size = superseded ? 34 : 48;
  // Box as wide as the page diagonal, centred, rotated along the diagonal.
  const diag = Math.hypot(props.width, props.height);
  const angle = (-Math.atan2(props.height, props.width) * 180) / Math.PI;
  return (
    <View
      fixed
      style={{
        position: 'absolute',
        left: (props.width - diag) / 2,
        top: props.height / 2 - size,
        width: diag,
        height: size * 2,
        justifyContent: 'center',
        alignItems: 'center',
        transform: `rotate(${angle}deg)`,
        opacity: 0.16,
      }}
    >
      <Text style={{ fontSize: size, fontWeight: 700, color: colours.marking, letterSpacing: 2 }}>
        {text}
      </Text>
    </View>
  );
}

export function StateBanner(props: { sheet: PrintableSheet }) {
  const text = markingText(props.sheet);
  if (!text) return null;
  return (
    <View
      fixed
      style={{
        borderWidth: 1.2,
        borderColor: colours.marking,
        color: colours.marking,
        paddingVertical: 2,
        marginTop: -4,
        marginBottom: 8,
        alignItems: 'center',
      }}
    >
      <Text style={{ fontSize: 8, fontWeight: 700, letterSpacing: 0.6 }}>{text}</Text>
    </View>
  );
}
