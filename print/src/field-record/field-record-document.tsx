import { readingPrecision, toleranceText, type Dimension } from '@holdfast/calc';
import { Document, Page, View } from '@react-pdf/renderer';
import { Text } from '../text.js';
import { qty } from '../format.js';
import { Caution } from '../parts/caution.js';
import { Heading, Table } from '../parts/table.js';
import type { PrintableSheet } from '../printable-sheet.js';
import { Frame } from '../sheet-document.js';
import { colours, s } from '../theme.js';
import type { PrintableFieldRecord, PrintFieldSignature } from './printable-field-record.js';
import { targetText } from './target-text.js';

const STATUS_TEXT: Record<PrintableFieldRecord['status'], string> = {
  draft: 'DRAFT — not signed',
  signed: 'Signed by the technician, waiting for countersignature',
  countersigned: 'Countersigned',
};

const date = (iso: string) => iso.slice(0, 16).replace('T', ' ') + ' UTC';

/** The printed field record: what was found and left, against the revision it was set to. */
export function FieldRecordDocument(props: {
  record: PrintableFieldRecord;
  sheet: PrintableSheet;
  qr: string | null;
}) {
  const { record: r, sheet, qr } = props;
  const system = sheet.unitSystem;
  // A reading prints to the tool's resolution for that setting, as the fitter can read it.
  const reading = (v: number | null, key: string, dim: string) =>
    v === null ? '—' : qty(v, dim as Dimension, system, readingPrecision(key, dim as Dimension));
  const verdict = (within: boolean | null) => (within === null ? '—' : within ? 'within' : 'OUT');
  const flags = [
    r.flags.superseded && 'The revision this brake was set to has since been superseded.',
    r.flags.underReview && 'The revision this brake was set to is under review.',
  ].filter((x): x is string => typeof x === 'string');
  return (
    <Document
      title={`${r.positionTag} field record ${r.performedAt.slice(0, 10)}`}
      creator="Holdfast"
      producer="Holdfast"
    >
      <Page size={sheet.paper} style={s.page}>
        <Frame sheet={sheet} qr={qr} kind="Field record" />
        <Text style={{ fontWeight: 700, marginBottom: 2 }}>
          {r.kindLabel} — {r.positionTag} {sheet.position.description}
        </Text>
        <Text>
          Performed {date(r.performedAt)}
          {r.meterHours !== null ? `, meter ${r.meterHours} h` : ''}. Set to calculation{' '}
          {r.documentNumber} rev {r.revisionLabel}. Status: {STATUS_TEXT[r.status]}.
        </Text>
        {flags.map((f) => (
          <Text key={f} style={{ color: colours.caution, fontWeight: 700 }}>
            {f}
          </Text>
        ))}
        <Caution sheetTypeId={sheet.sheetType.id} />
        <Heading>Measurements</Heading>
        <Table
          columns={[
            { title: 'Setting', flex: 2.6 },
            { title: 'Target', flex: 1.2, align: 'right' },
            { title: 'Tolerance', flex: 1.3 },
            { title: 'As found', flex: 1.2, align: 'right' },
            { title: 'As left', flex: 1.2, align: 'right' },
            // "within", not "in": beside lengths, "in" reads as inches.
            { title: 'As left is', width: 38 },
          ]}
          rows={r.measurements.map((m) => [
            m.label,
            targetText(m, system),
            toleranceText(m.tolerance, m.dimension as Dimension, system, m.settingKey),
            reading(m.asFound, m.settingKey, m.dimension),
            reading(m.asLeft, m.settingKey, m.dimension),
            verdict(m.asLeftWithin),
          ])}
        />
        {r.measurements
          .filter((m) => m.reason)
          .map((m) => (
            <Text key={m.settingKey}>
              Reason, {m.label}: {m.reason}
            </Text>
          ))}
        <Text style={{ fontSize: 7 }}>
          Tolerances are common practice unless a source is named; the maker&apos;s data and the
          governing standard decide where they differ.
        </Text>
        <Heading>Checks</Heading>
        <Table
          columns={[
            { title: 'Check', flex: 3 },
            { title: 'Result', flex: 1 },
            { title: 'Value / note', flex: 2.4 },
          ]}
          rows={r.checks.map((c) => [
            c.label,
            c.result === 'ok' ? 'OK' : c.result === 'not-ok' ? 'NOT OK' : 'n/a',
            [
              c.value !== null ? qty(c.value, 'length', system) : '',
              c.cycles !== null ? `${c.cycles} cycles` : '',
              c.note,
            ]
              .filter(Boolean)
              .join('; '),
          ])}
        />
        <Heading>Findings</Heading>
        <Text>{r.findings || 'None recorded.'}</Text>
        <Heading>Photos</Heading>
        {r.photos.length === 0 ? (
          <Text>None filed.</Text>
        ) : (
          <Table
            columns={[
              { title: 'File', flex: 2.4 },
              { title: 'Filed by', flex: 2 },
              { title: 'Size', flex: 0.8, align: 'right' },
              // The start of the hash is enough to match a printout to the stored photo.
              { title: 'SHA-256 (start)', flex: 1.4 },
            ]}
            rows={r.photos.map((p) => [
              p.fileName,
              `${p.by}, ${date(p.at)}`,
              `${Math.max(1, Math.round(p.size / 1024))} KiB`,
              p.sha256.slice(0, 16),
            ])}
          />
        )}
        <View wrap={false}>
          <Heading>Signatures</Heading>
          <Table
            columns={[
              { title: 'Role', flex: 1.4 },
              { title: 'Name', flex: 2 },
              { title: 'Signed', flex: 1.6 },
            ]}
            rows={[
              ['Technician', r.signed, 'not signed'],
              ['Plant engineer', r.countersigned, 'not countersigned'],
            ].map(([role, sig, none]) => {
              const g = sig as PrintFieldSignature | null;
              return [
                role as string,
                g ? `${g.name} (${g.initials})` : '',
                g ? date(g.at) : (none as string),
              ];
            })}
          />
        </View>
      </Page>
    </Document>
  );
}
