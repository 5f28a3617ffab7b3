import { Document, Page } from '@react-pdf/renderer';
import { Approvals, RevisionHistory } from './parts/approvals.js';
import { Caution } from './parts/caution.js';
import { CHART_BLOCK, Chart } from './parts/chart.js';
import { DesignBasis } from './parts/design-basis.js';
import { DerivationChunk, planDerivation } from './parts/derivation.js';
import { FieldSettings, Justification } from './parts/field-settings.js';
import { Footer } from './parts/footer.js';
import { Inputs } from './parts/inputs.js';
import { StateBanner, StateMarking } from './parts/marking.js';
import { References } from './parts/references.js';
import { Purpose, Summary } from './parts/summary.js';
import { Heading } from './parts/table.js';
import { TitleBlock } from './parts/title-block.js';
import { packPages } from './layout-plan.js';
import { PAPER_SIZE, contentWidth, pageCapacity } from './paper.js';
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
  const capacity = pageCapacity(sheet);
  const chartPages = packPages(
    charts.map((c) => ({ item: c, height: CHART_BLOCK })),
    capacity,
    capacity - 30,
  );
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
        <Caution />
        <Summary sheet={sheet} />
        <Approvals sheet={sheet} />
        <RevisionHistory sheet={sheet} />
      </Page>
      <Page size={sheet.paper} style={s.page}>
        <Frame sheet={sheet} qr={qr} kind={kind} />
        <DesignBasis sheet={sheet} />
        <Inputs sheet={sheet} />
      </Page>
      {planDerivation(sheet, width, capacity).map((items, i) => (
        <Page key={`d${i}`} size={sheet.paper} style={s.page}>
          <Frame sheet={sheet} qr={qr} kind={kind} />
          <DerivationChunk items={items} sheet={sheet} />
        </Page>
      ))}
      {chartPages.map((page, i) => (
        <Page key={`c${i}`} size={sheet.paper} style={s.page}>
          <Frame sheet={sheet} qr={qr} kind={kind} />
          {i === 0 && <Heading>Charts</Heading>}
          {page.map((b) => (
            <Chart key={b.item.id} chart={b.item} system={sheet.unitSystem} width={width} />
          ))}
        </Page>
      ))}
      <Page size={sheet.paper} style={s.page}>
        <Frame sheet={sheet} qr={qr} kind={kind} />
        <Justification sheet={sheet} />
        <FieldSettings sheet={sheet} />
        <References sheet={sheet} />
      </Page>
    </Document>
  );
}
