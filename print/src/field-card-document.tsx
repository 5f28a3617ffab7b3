import {
  acceptedRange,
  getSheetType,
  bandedTolerance,
  settingPrecision,
  toleranceText,
  type FieldSetting,
  type FieldTolerance,
} from '@holdfast/calc';
import { Document, Page, View } from '@react-pdf/renderer';
import { Text } from './text.js';
import { groupFieldSettings, type DiscStackSetup } from './field-card-groups.js';
import { qty } from './format.js';
import { Caution, rotorOf, type BrakeRotor } from './parts/caution.js';
import { SettingTable } from './parts/field-settings.js';
import { afterSettingLines } from './parts/after-setting.js';

import { Heading, Table } from './parts/table.js';
import type { PrintableSheet, PrintUnitSystem } from './printable-sheet.js';
import { Frame } from './sheet-document.js';
import { colours, s } from './theme.js';

type Tolerances = (key: string) => FieldTolerance | undefined;

const Box = (props: { h?: number }) => (
  <View
    style={{
      borderWidth: 0.8,
      borderColor: colours.ink,
      height: props.h ?? 13,
      backgroundColor: '#ffffff',
    }}
  />
);

/**
 * The values a tolerance accepts, rounded inward to the reading, then the tolerance: the target is
 * printed to the step a fitter sets by (221.5 mm for 221.25 mm), so "± 0.5 mm" read around the
 * printed figure would accept 222.0 mm, which the record judges out.
 */
function toleranceCell(
  f: FieldSetting,
  tolerance: FieldTolerance | undefined,
  system: PrintUnitSystem,
): string {
  const text = toleranceText(tolerance, f.dimension, system, f.key);
  const range = acceptedRange(f.value, tolerance, f.key, f.dimension, system);
  return range ? `${range.text} (${text})` : text;
}

/** ' (60° to 75°)': the values a back-off tolerance accepts, or nothing for a one-sided one. */
function acceptedEnds(f: FieldSetting, tolerance: FieldTolerance, system: PrintUnitSystem) {
  const range = acceptedRange(f.value, tolerance, f.key, f.dimension, system);
  return range ? ` (${range.text})` : '';
}

/** Target values with empty boxes for what was measured and the setter's initials. */
function SettingsWithBoxes(props: {
  items: FieldSetting[];
  system: PrintUnitSystem;
  tolerance: Tolerances;
  prefix?: string;
}) {
  const label = (f: FieldSetting) => {
    const text =
      props.prefix && f.label.startsWith(props.prefix)
        ? f.label.slice(props.prefix.length).replace(/^[\s:—-]+/, '')
        : f.label;
    const shown = text.charAt(0).toUpperCase() + text.slice(1);
    return f.note ? `${shown} — ${f.note}` : shown;
  };
  return (
    <Table
      columns={[
        { title: 'Setting', flex: 3 },
        { title: 'Target', flex: 1, align: 'right' },
        { title: 'Accepted (tolerance)', flex: 2 },
        { title: 'Measured', flex: 0.9 },
        { title: 'Initials', width: 44 },
      ]}
      rows={props.items.map((f) => [
        label(f),
        qty(f.value, f.dimension, props.system, settingPrecision(f.key, f.dimension)),
        toleranceCell(f, props.tolerance(f.key), props.system),
        <Box key="m" />,
        <Box key="i" />,
      ])}
    />
  );
}

function DiscStack(props: {
  stack: DiscStackSetup;
  system: PrintUnitSystem;
  tolerance: Tolerances;
}) {
  const { stack, system } = props;
  const backOffTol = stack.backOff ? props.tolerance(stack.backOff.key) : undefined;
  const q = (f: FieldSetting | null) =>
    f ? qty(f.value, f.dimension, system, settingPrecision(f.key, f.dimension)) : 'see sheet';
  return (
    <View wrap={false} style={{ marginBottom: 6 }}>
      <Text style={{ fontWeight: 700 }}>{stack.name}</Text>
      <Text>
        1. Tighten the nut until the disc-spring stack is just flat (solid); do not overtighten.
      </Text>
      <Text>
        2. Back off the nut by <Text style={{ fontWeight: 700 }}>{q(stack.backOff)}</Text> and lock
        it.
      </Text>
      {backOffTol && stack.backOff && (
        <Text>
          Tolerance {toleranceText(backOffTol, stack.backOff.dimension, system, stack.backOff.key)}
          {acceptedEnds(stack.backOff, backOffTol, system)}
          {backOffTol.rule ? `. ${backOffTol.rule}` : ''} ({backOffTol.source})
        </Text>
      )}
      <Text>
        3. The stack then carries a preload of about{' '}
        <Text style={{ fontWeight: 700 }}>{q(stack.preload)}</Text>.
      </Text>
      {stack.others.length > 0 && (
        <SettingsWithBoxes
          items={stack.others}
          system={system}
          tolerance={props.tolerance}
          prefix={stack.name}
        />
      )}
      <View style={{ flexDirection: 'row', marginTop: 3, alignItems: 'center' }}>
        <Text style={{ width: 150 }}>Back-off applied (measured):</Text>
        <View style={{ width: 80 }}>
          <Box />
        </View>
        <Text style={{ width: 60, marginLeft: 10 }}>Initials:</Text>
        <View style={{ width: 44 }}>
          <Box />
        </View>
      </View>
    </View>
  );
}

/** The push rod line of the card's caution: it is no handle and no lifting point. */
export const PUSH_ROD_CAUTION =
  'The thruster push rod is not a lifting point and no handle: open the brake with the hand release.';

/** What wear does to the setting, under the clearance rows: a caliper has pads and no thruster reserve. */
const WEAR_NOTE: Record<BrakeRotor, string> = {
  drum: 'Lining wear uses up the reserve: re-adjust before it falls below the minimum given. With the reserve stroke used up the brake can lose all holding torque.',
  disc: 'Pad wear widens the air gap and lets the springs extend, which lowers the clamp force: re-adjust at the pad wear given. Worn further, the brake may no longer hold the required torque.',
};

/** The field setting card: what to set, what to measure, where to record it. */
export function FieldCardDocument(props: { sheet: PrintableSheet; qr: string | null }) {
  const { sheet, qr } = props;
  const rotor = rotorOf(sheet.sheetType.id);
  const system = sheet.unitSystem;
  const ev = sheet.evaluation;
  const g = ev ? groupFieldSettings(ev) : null;
  const card = getSheetType(sheet.sheetType.id)?.fieldCard;
  const tolerance: Tolerances = (key) => {
    const s = ev?.fieldSettings.find((f) => f.key === key);
    // Held inside the band where every check passes, as the records are judged.
    return (s && ev ? bandedTolerance(s, card, ev) : card?.settings[key]?.tolerance) ?? undefined;
  };
  return (
    <Document
      title={`${sheet.documentNumber} rev ${sheet.revision.label} — field setting card`}
      creator="Holdfast"
      producer="Holdfast"
    >
      <Page size={sheet.paper} style={s.page}>
        <Frame sheet={sheet} qr={qr} kind="Field setting card" />
        <Text style={{ marginBottom: 2 }}>
          Settings for {sheet.position.tag} {sheet.position.description} on {sheet.equipment.tag}{' '}
          {sheet.equipment.name}, from calculation {sheet.documentNumber} rev {sheet.revision.label}
          . Check the revision is current with the verification code before you start.
        </Text>
        <Caution
          sheetTypeId={sheet.sheetType.id}
          extra={rotor === 'drum' ? [PUSH_ROD_CAUTION] : []}
        />
        {!g ? (
          <Text>This revision has no evaluation, so there are no settings to print.</Text>
        ) : (
          <>
            {(g.spring.length > 0 || g.springTables.length > 0) && (
              <View>
                <Heading>
                  {g.spring.some((f) => /clamp/i.test(f.key))
                    ? 'Clamp force setting'
                    : 'Main spring setting'}
                </Heading>
                <SettingsWithBoxes items={g.spring} system={system} tolerance={tolerance} />
                {g.springTables.map((t) => (
                  <SettingTable key={t.id} table={t} system={system} ev={ev!} />
                ))}
              </View>
            )}
            {(g.thruster.length > 0 || g.clearance.length > 0) && (
              <View wrap={false}>
                <Heading>
                  {g.thruster.some((f) => /thruster|stroke/i.test(`${f.key} ${f.label}`))
                    ? 'Thruster stroke, reserve and shoe clearance'
                    : 'Clearance and wear'}
                </Heading>
                <SettingsWithBoxes
                  items={[...g.thruster, ...g.clearance]}
                  system={system}
                  tolerance={tolerance}
                />
                <Text style={{ fontSize: 7.5 }}>{WEAR_NOTE[rotor]}</Text>
              </View>
            )}
            {g.discStacks.length > 0 && (
              <View>
                {/* The heading travels with the first stack: never alone at a page foot. */}
                <View wrap={false}>
                  <Heading>Disc-spring stacks</Heading>
                  <DiscStack stack={g.discStacks[0]} system={system} tolerance={tolerance} />
                </View>
                {g.discStacks.slice(1).map((st) => (
                  <DiscStack key={st.name} stack={st} system={system} tolerance={tolerance} />
                ))}
              </View>
            )}
            {g.other.length > 0 && (
              <View>
                <Heading>Other settings</Heading>
                <SettingsWithBoxes items={g.other} system={system} tolerance={tolerance} />
              </View>
            )}
            {g.otherTables.map((t) => (
              <SettingTable key={t.id} table={t} system={system} ev={ev!} />
            ))}
          </>
        )}
        <View wrap={false}>
          <Heading>After setting</Heading>
          {afterSettingLines(sheet).map((line) => (
            <View key={line} style={{ flexDirection: 'row', marginBottom: 2 }}>
              <View
                style={{
                  width: 8,
                  height: 8,
                  borderWidth: 0.8,
                  borderColor: colours.ink,
                  marginRight: 6,
                  marginTop: 1,
                }}
              />
              <Text style={{ flex: 1 }}>{line}</Text>
            </View>
          ))}
        </View>
        <View wrap={false}>
          <Heading>Record</Heading>
          <Table
            columns={[
              { title: 'Role', flex: 1.2 },
              { title: 'Name', flex: 2 },
              { title: 'Signature', flex: 2 },
              { title: 'Date', flex: 1.2 },
            ]}
            rows={['Set by', 'Checked by'].map((role) => [
              role,
              <Box key="n" h={18} />,
              <Box key="s" h={18} />,
              <Box key="d" h={18} />,
            ])}
          />
          <Text style={{ fontSize: 7 }}>Remarks:</Text>
          <Box h={40} />
        </View>
      </Page>
    </Document>
  );
}
