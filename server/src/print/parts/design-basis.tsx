import { DIMENSIONS, type Dimension } from '@holdfast/calc';
import { Text, View } from '@react-pdf/renderer';
import { qty } from '../format.js';
import type { PrintableSheet, PrintUnitSystem } from '../printable-sheet.js';
import { colours } from '../theme.js';
import { Heading, Table } from './table.js';

/** A criteria value in the sheet's units when its unit is a known SI unit, else as stored. */
function criterionText(value: number, unit: string, system: PrintUnitSystem): string {
  if (!unit) return String(value);
  const dims = (Object.keys(DIMENSIONS) as Dimension[]).filter(
    (d) => d !== 'dimensionless' && DIMENSIONS[d].siUnit === unit,
  );
  // 'K' is both a temperature and a temperature difference: ambiguous units print as stored.
  return dims.length === 1 ? qty(value, dims[0], system) : `${value} ${unit}`;
}

function KeyValue(props: { k: string; v: string }) {
  return (
    <View style={{ flexDirection: 'row', marginBottom: 1.5 }} wrap={false}>
      <Text style={{ width: 130, color: colours.muted }}>{props.k}</Text>
      <Text style={{ flex: 1 }}>{props.v}</Text>
    </View>
  );
}

/** Which method, criteria and software this revision rests on. */
export function DesignBasis(props: { sheet: PrintableSheet }) {
  const { sheet } = props;
  const c = sheet.criteria;
  return (
    <View>
      <Heading>Design basis</Heading>
      <KeyValue k="Sheet type" v={`${sheet.sheetType.title} (${sheet.sheetType.id})`} />
      <KeyValue k="Scope" v={sheet.sheetType.description} />
      <KeyValue k="Acceptance criteria" v={`${c.name} (${c.id}), version ${c.version}`} />
      <KeyValue k="Torque reference" v={sheet.designBasis.torqueReference} />
      <KeyValue k="Efficiency treatment" v={sheet.designBasis.efficiencyTreatment} />
      <KeyValue
        k="Calculation software"
        v={`Holdfast calculation core ${sheet.coreVersion ?? '(not evaluated)'}`}
      />
      <KeyValue
        k="Unit system"
        v={
          sheet.unitSystem === 'US'
            ? 'US customary (inputs kept as typed)'
            : 'SI (inputs kept as typed)'
        }
      />
      {c.values.length > 0 && (
        <>
          <Heading level={2}>Criteria values and their sources</Heading>
          <Table
            columns={[
              { title: 'Criterion', flex: 2.4 },
              { title: 'Value', flex: 1, align: 'right' },
              { title: 'Source', flex: 3.2 },
              { title: 'Confidence', flex: 1.1 },
            ]}
            rows={c.values.map((v) => [
              v.label,
              criterionText(v.value, v.unit, sheet.unitSystem),
              v.source,
              v.confidence,
            ])}
          />
        </>
      )}
    </View>
  );
}
