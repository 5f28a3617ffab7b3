import { Document, Page, View } from '@react-pdf/renderer';
import { Approvals, RevisionHistory } from './parts/approvals.js';
import { Caution } from './parts/caution.js';
import { Chart } from './parts/chart.js';
import { DesignBasis } from './parts/design-basis.js';
import { Derivation } from './parts/derivation.js';
import { FieldSettings, Justification } from './parts/field-settings.js';
import { Footer } from './parts/footer.js';
import { Inputs } from './parts/inputs.js';
import { StateBanner, StateMarking } from './parts/marking.js';
import { References } from './parts/references.js';
import { Purpose, Summary } from './parts/summary.js';
import { Heading } from './parts/table.js';
import { TitleBlock } from './parts/title-block.js';
import { PAPER_SIZE, contentWidth } from './paper.js';
import type { PrintableSheet } from './printable-sheet.js';
import { s } from './theme.js';

/** Frame every page of a Holdfast PDF carries: title block, state banner and marking, footer. */
export function Frame(props: { sheet: PrintableSheet; qr: string | null; kind: string }) {
  const size = PAPER_SIZE[props.sheet.paper];
  return (
    <>
      <StateMarking sheet={props.sheet} width={size.width} height={size.height} />
      <TitleBlock sheet={props.sheet} qr={props.qr} kind={props.kind} />
      <StateBanner sheet={props.sheet} />
      <Footer sheet={props.sheet} />
    </>
  );
}

/** The calculation sheet: summary page first, then basis, inputs, derivation, charts, settings. */
export function SheetDocument(props: { sheet: PrintableSheet; qr: string | null }) {
  const { sheet, qr } = props;
  const width = contentWidth(sheet.paper);
  const charts = sheet.evaluation?.charts ?? [];
  const kind = 'Brake calculation sheet';
  return (
    <Document
      title={`${sheet.documentNumber} rev ${sheet.revision.label} — ${sheet.title}`}
      author={sheet.author.name}
      subject={sheet.sheetType.title}
      creator="Holdfast"
      producer="Holdfast"
    >
      {/* Separate Page elements: react-pdf re-lays out everything after a page break on every
          break (page n of N is dynamic), so one long Page costs quadratic time. */}
      <Page size={sheet.paper} style={s.page}>
        <Frame sheet={sheet} qr={qr} kind={kind} />
        <Purpose sheet={sheet} />
        <Summary sheet={sheet} />
        <Approvals sheet={sheet} />
        <RevisionHistory sheet={sheet} />
        <Caution />
      </Page>
      <Page size={sheet.paper} style={s.page}>
        <Frame sheet={sheet} qr={qr} kind={kind} />
        <DesignBasis sheet={sheet} />
        <Inputs sheet={sheet} />
      </Page>
      {sheet.evaluation && sheet.evaluation.derivation.length > 0 && (
        <Page size={sheet.paper} style={s.page}>
          <Frame sheet={sheet} qr={qr} kind={kind} />
          <Derivation sheet={sheet} />
        </Page>
      )}
      <Page size={sheet.paper} style={s.page}>
        <Frame sheet={sheet} qr={qr} kind={kind} />
        {charts.length > 0 && (
          <View>
            <Heading>Charts</Heading>
            {charts.map((c) => (
              <Chart key={c.id} chart={c} system={sheet.unitSystem} width={width} />
            ))}
          </View>
        )}
        <Justification sheet={sheet} />
        <FieldSettings sheet={sheet} />
        <References sheet={sheet} />
      </Page>
    </Document>
  );
}
