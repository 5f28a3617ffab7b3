import { Text, View } from '@react-pdf/renderer';
import type { TextMeasure } from '../measure.js';
import { colours } from '../theme.js';

export const CAUTION_LINES = [
  'These results support, and never replace, the judgement of a competent engineer.',
  "The governing standard, the brake maker's data and local codes decide where they differ from this sheet.",
  'Work on a brake only with the load lowered to the ground or positively secured, and the drive isolated and locked out.',
  'Spring force is stored energy: release it with the adjusting means provided; never knock out pins or cut rods under load.',
];

/** The safety caution block (first page of the sheet, top of the field card). */
export function Caution(props: { extra?: string[] }) {
  return (
    <View
      wrap={false}
      style={{
        borderLeftWidth: 3,
        borderColor: colours.caution,
        backgroundColor: colours.cautionBg,
        paddingVertical: 4,
        paddingHorizontal: 6,
        marginTop: 6,
      }}
    >
      <Text style={{ fontWeight: 700, color: colours.caution, marginBottom: 2 }}>Caution</Text>
      {[...CAUTION_LINES, ...(props.extra ?? [])].map((line) => (
        <Text key={line} style={{ marginBottom: 1 }}>
          • {line}
        </Text>
      ))}
    </View>
  );
}

/** Height of the caution block in `width` pt (its 6 pt margin above included). */
export function cautionHeight(m: TextMeasure, width: number, extra: string[] = []): number {
  // Left rule 3, padding 2 × 6.
  const inner = width - 3 - 12;
  const body = { fontSize: 8.5 };
  const lines = [...CAUTION_LINES, ...extra].reduce(
    (sum, line) => sum + m.height(`• ${line}`, inner, body) + 1,
    0,
  );
  return 6 + 2 * 4 + m.lineHeight({ fontSize: 8.5, weight: 700 }) + 2 + lines;
}
