import { Text, View } from '@react-pdf/renderer';
import type { PrintableSheet } from '../printable-sheet.js';
import { colours } from '../theme.js';
import { Heading, Table } from './table.js';

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
        v={sheet.unitSystem === 'US' ? 'US customary (inputs kept as typed)' : 'SI (inputs kept as typed)'}
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
              v.unit ? `${v.value} ${v.unit}` : String(v.value),
              v.source,
              v.confidence,
            ])}
          />
        </>
      )}
    </View>
  );
}
