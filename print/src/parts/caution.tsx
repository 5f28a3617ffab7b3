import { View } from '@react-pdf/renderer';
import { rotorOf, securingCaution } from '@holdfast/calc';
import { Text } from '../text.js';
import type { TextMeasure } from '../measure.js';
import { colours } from '../theme.js';

// The check items of a field record are worded by the same rule (server/src/calc/field-targets.ts).
export { rotorOf, type BrakeRotor } from '@holdfast/calc';

/** How the load is secured, in calc's words; on a hoist also that nothing may hang from the hook. */
function securingLine(sheetTypeId: string): string {
  const hook =
    sheetTypeId === 'hoist-shoe-brake' ? '; nothing on the hook (no ladle, no load)' : '';
  return `${securingCaution(sheetTypeId)}${hook}.`;
}

/**
 * The usual cautions for work on a spring-applied, thruster-released brake, printed on the sheet
 * and on the field card (common practice for work on crane and conveyor brakes, no published
 * source; the governing standard and the maker's instructions decide).
 */
export function cautionLines(sheetTypeId: string): string[] {
  const rotor = rotorOf(sheetTypeId);
  // A caliper is opened by a thruster or a hydraulic unit; a drum brake here by a thruster.
  const opener = rotor === 'disc' ? 'release unit' : 'thruster';
  return [
    'These results support, and never replace, the judgement of a competent engineer.',
    "The governing standard, the brake maker's data, local codes and licensed practice decide where they differ from this sheet.",
    securingLine(sheetTypeId),
    `Isolate and lock out the drive and, separately, the ${opener} supply: an energised ${opener} opens the brake.`,
    `Keep hands clear of the arms and levers while the ${opener} can be energised. Adjust one brake at a time.`,
    `The ${rotor} and the ${opener === 'thruster' ? 'thruster' : 'hydraulic'} oil can be hot after running: stop the drive and let them cool.`,
    'Spring force is stored energy: release it with the adjusting means provided; never knock out pins or cut rods under load.',
  ];
}

/** The safety caution block (first page of the sheet, top of the field card). */
export function Caution(props: { sheetTypeId: string; extra?: string[] }) {
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
      {[...cautionLines(props.sheetTypeId), ...(props.extra ?? [])].map((line) => (
        <Text key={line} style={{ marginBottom: 1 }}>
          • {line}
        </Text>
      ))}
    </View>
  );
}

/** Height of the caution block in `width` pt (its 6 pt margin above included). */
export function cautionHeight(
  m: TextMeasure,
  width: number,
  sheetTypeId: string,
  extra: string[] = [],
): number {
  // Left rule 3, padding 2 × 6.
  const inner = width - 3 - 12;
  const body = { fontSize: 8.5 };
  const lines = [...cautionLines(sheetTypeId), ...extra].reduce(
    (sum, line) => sum + m.height(`• ${line}`, inner, body) + 1,
    0,
  );
  return 6 + 2 * 4 + m.lineHeight({ fontSize: 8.5, weight: 700 }) + 2 + lines;
}
