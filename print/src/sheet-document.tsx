import { Document, Page } from '@react-pdf/renderer';
import type { BlockContext } from './blocks.js';
import { headingBlock } from './blocks.js';
import { paginate, type FlowBlock } from './flow.js';
import type { TextMeasure } from './measure.js';
import { approvalsBlock, revisionHistoryBlocks } from './parts/approvals.js';
import { Caution, cautionHeight } from './parts/caution.js';
import { chartBlock } from './parts/chart.js';
import { criteriaReviewBlocks } from './parts/criteria-reviews.js';
import { designBasisBlocks } from './parts/design-basis.js';
import { derivationBlocks } from './parts/derivation.js';
import { fieldSettingsBlocks, justificationBlocks } from './parts/field-settings.js';
import { Footer } from './parts/footer.js';
import { inputsBlocks } from './parts/inputs.js';
import { StateBanner, StateMarking } from './parts/marking.js';
import { referencesBlocks } from './parts/references.js';
import { minorChecksBlocks, purposeBlocks, summaryBlocks } from './parts/summary.js';
import { TitleBlock, type PageNumber } from './parts/title-block.js';
import { PAPER_SIZE, contentWidth, pageCapacity } from './paper.js';
import type { PrintableSheet } from './printable-sheet.js';
import { s } from './theme.js';

/** Frame every page of a Holdfast PDF carries: title block, state banner and marking, footer. */
export function Frame(props: {
  sheet: PrintableSheet;
  qr: string | null;
  kind: string;
  page?: PageNumber;
}) {
  const size = PAPER_SIZE[props.sheet.paper];
  return (
    <>
      <StateMarking sheet={props.sheet} width={size.width} height={size.height} />
      <TitleBlock sheet={props.sheet} qr={props.qr} kind={props.kind} page={props.page} />
      <StateBanner sheet={props.sheet} />
      <Footer sheet={props.sheet} />
    </>
  );
}

/** Marks the first block of a part of the sheet that starts on a new page. */
function newPage(blocks: FlowBlock[]): FlowBlock[] {
  return blocks.length === 0
    ? blocks
    : [{ ...blocks[0], pageBreakBefore: true }, ...blocks.slice(1)];
}

/**
 * The calculation sheet in reading order: summary, design basis and inputs; then the derivation,
 * the charts, and the settings with the references, each starting a new page.
 */
function sheetBlocks(ctx: BlockContext, sheet: PrintableSheet): FlowBlock[] {
  const charts = sheet.evaluation?.charts ?? [];
  return [
    ...purposeBlocks(ctx, sheet),
    {
      key: 'caution',
      height: cautionHeight(ctx.m, ctx.width, sheet.sheetType.id),
      element: <Caution key="caution" sheetTypeId={sheet.sheetType.id} />,
    },
    ...summaryBlocks(ctx, sheet),
    approvalsBlock(ctx, sheet),
    ...criteriaReviewBlocks(ctx, sheet),
    ...revisionHistoryBlocks(ctx, sheet),
    ...designBasisBlocks(ctx, sheet),
    ...inputsBlocks(ctx, sheet),
    ...newPage([...derivationBlocks(ctx, sheet), ...minorChecksBlocks(ctx, sheet)]),
    ...newPage(
      charts.length === 0
        ? []
        : [
            headingBlock(ctx, 'charts-h', 'Charts'),
            ...charts.map((c) => chartBlock(ctx, c, sheet.unitSystem)),
          ],
    ),
    ...newPage([
      ...justificationBlocks(ctx, sheet),
      ...fieldSettingsBlocks(ctx, sheet),
      ...referencesBlocks(ctx, sheet),
    ]),
  ];
}

/** The sheet cut into pages with the fonts' measure. */
export function planSheet(sheet: PrintableSheet, m: TextMeasure): FlowBlock[][] {
  const ctx = { m, width: contentWidth(sheet.paper) };
  return paginate(sheetBlocks(ctx, sheet), pageCapacity(sheet, m));
}

/**
 * How the planned pages go to react-pdf. 'planned': each page is final (no page breaking by
 * react-pdf, page numbers printed as text) — about twice as fast, because react-pdf lays out
 * every page again after each break and again for a dynamic "page n of N". 'flowing': react-pdf
 * may break a planned page that turned out too long and numbers the pages itself; the renderer
 * uses it when a planned page overflowed.
 */
export type PageMode = 'planned' | 'flowing';

/** The calculation sheet from its planned pages. */
export function SheetDocument(props: {
  sheet: PrintableSheet;
  qr: string | null;
  pages: FlowBlock[][];
  mode: PageMode;
  onRender?: (result: unknown) => void;
}) {
  const { sheet, qr, pages, mode } = props;
  const kind = 'Brake calculation sheet';
  const paper = PAPER_SIZE[sheet.paper];
  return (
    <Document
      title={`${sheet.documentNumber} rev ${sheet.revision.label} — ${sheet.title}`}
      author={sheet.author.name}
      subject={sheet.sheetType.title}
      creator="Holdfast"
      producer="Holdfast"
      onRender={props.onRender}
    >
      {pages.map((blocks, i) => (
        <Page
          key={i}
          size={sheet.paper}
          // A page that may not break is as tall as its content: hold it at the paper's height.
          style={mode === 'planned' ? { ...s.page, minHeight: paper.height } : s.page}
          wrap={mode === 'flowing'}
        >
          <Frame
            sheet={sheet}
            qr={qr}
            kind={kind}
            page={mode === 'planned' ? { n: i + 1, total: pages.length } : undefined}
          />
          {blocks.map((b) => b.element)}
        </Page>
      ))}
    </Document>
  );
}
