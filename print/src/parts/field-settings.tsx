import {
  bandOf,
  checkFigures,
  getSheetType,
  marksText,
  settingTableRows,
  settingTableTitle,
  toleranceBeyondBand,
  failAdvice,
  bandSentence,
  rowVerdictText,
  settingPrecision,
  type SettingTableRow,
  type SheetEvaluation,
} from '@holdfast/calc';
import { View } from '@react-pdf/renderer';
import { Text } from '../text.js';
import { pct, qtyParts, qty, unitLabel } from '../format.js';
import type { PrintableSheet, PrintUnitSystem } from '../printable-sheet.js';
import { colours } from '../theme.js';
import { headingBlock, paragraphBlock, tableBlocks, type BlockContext } from '../blocks.js';
import type { FlowBlock } from '../flow.js';
import { limitText } from './summary.js';
import { Heading, Table, type Column } from './table.js';

type EvalTable = SheetEvaluation['tables'][number];

/** A calc table (e.g. the spring setting table) with every column in the sheet's units. */
export function SettingTable(props: {
  table: EvalTable;
  system: PrintUnitSystem;
  extra?: Column[];
  /** The evaluation the table is from: its band, when the record carries one, and its checks. */
  ev: SheetEvaluation;
}) {
  const { table, system, ev } = props;
  const band = bandOf(ev, table.id);
  const rows = settingTableRows(ev, table, system);
  const columns = settingColumns(table, system);
  const extra = props.extra ?? [];
  return (
    // Kept whole: a table split over the page went on without its title or column heads, and a
    // fitter read bare numbers at the top of page 2.
    <View wrap={false}>
      <Heading level={2}>{settingTableTitle(table.title, system)}</Heading>
      {band && (
        <Text style={{ fontSize: 7.5, marginBottom: 3 }}>{bandSentence(band, system, ev)}</Text>
      )}
      <Table
        dense
        columns={[...columns, ...(band ? [CARD_VERDICT_COLUMN] : []), ...extra]}
        rows={rows.map((row) => [
          ...settingCells(table, row, system),
          // The card keeps a row short: the sentence above names the checks.
          ...(band
            ? [
                (row.failing?.length ? 'no' : 'yes') +
                  (row.marks.length ? `, ${marksText(row.marks, true)}` : ''),
              ]
            : []),
          ...extra.map(() => ''),
        ])}
      />
    </View>
  );
}

/** A card tolerance the band narrowed: bold, in the caution colour, for the engineer to see. */
const NARROWED_STYLE = {
  fontSize: 7.5,
  weight: 700,
  color: colours.caution,
  marginBottom: 3,
} as const;

/** A setting table row's figures, each to the step a fitter sets it by. */
function settingCells(table: EvalTable, row: SettingTableRow, system: PrintUnitSystem): string[] {
  return table.columns.map(
    (c) =>
      qtyParts(row.values[c.key]!, c.dimension, system, settingPrecision(c.key, c.dimension)).text,
  );
}

/** The column saying, per row, whether every check of the sheet passes at that setting. */
const VERDICT_COLUMN: Column = { title: 'Other checks at this setting', flex: 2.2 };
const CARD_VERDICT_COLUMN: Column = { title: 'Every check passes', flex: 1.1, align: 'center' };

function settingColumns(table: EvalTable, system: PrintUnitSystem): Column[] {
  return table.columns.map((c) => {
    const unit = unitLabel(c.dimension, system);
    return { title: unit ? `${c.label} (${unit})` : c.label, flex: 1, align: 'right' as const };
  });
}

const SETTINGS_NOTE =
  'The values the field team sets and measures. The field setting card carries the same values with room to record what was measured.';

/** Field settings and tables as printed in the calculation sheet. */
export function fieldSettingsBlocks(ctx: BlockContext, sheet: PrintableSheet): FlowBlock[] {
  const ev = sheet.evaluation;
  if (!ev || (ev.fieldSettings.length === 0 && ev.tables.length === 0)) return [];
  const system = sheet.unitSystem;
  const blocks: FlowBlock[] = [
    headingBlock(ctx, 'settings-h', 'Field settings'),
    paragraphBlock(ctx, 'settings-note', SETTINGS_NOTE, { fontSize: 7.5, marginBottom: 3 }),
  ];
  if (ev.fieldSettings.length > 0) {
    blocks.push(
      ...tableBlocks(ctx, 'settings', {
        continuedTitle: 'Field settings',
        columns: [
          { title: 'Setting', flex: 2.6 },
          { title: 'Value', flex: 1.2, align: 'right' },
          { title: 'Note', flex: 3 },
        ],
        rows: ev.fieldSettings.map((f) => [
          f.label,
          qty(f.value, f.dimension, system, settingPrecision(f.key, f.dimension)),
          f.note ?? '',
        ]),
      }),
    );
  }
  const card = getSheetType(sheet.sheetType.id)?.fieldCard;
  ev.tables.forEach((t) => {
    const band = bandOf(ev, t.id);
    const rows = settingTableRows(ev, t, system);
    const narrowed = toleranceBeyondBand(ev, t, card, system);
    blocks.push(
      headingBlock(ctx, `${t.id}-h`, settingTableTitle(t.title, system), 2),
      ...(band
        ? [
            paragraphBlock(ctx, `${t.id}-band`, bandSentence(band, system, ev), {
              fontSize: 7.5,
              marginBottom: 3,
            }),
          ]
        : []),
      ...narrowed.map((line, i) =>
        paragraphBlock(ctx, `${t.id}-narrowed-${i}`, `Tolerance narrowed: ${line}`, NARROWED_STYLE),
      ),
      ...tableBlocks(ctx, t.id, {
        continuedTitle: settingTableTitle(t.title, system),
        columns: [...settingColumns(t, system), ...(band ? [VERDICT_COLUMN] : [])],
        rows: rows.map((row) => [
          ...settingCells(t, row, system),
          ...(band ? [rowVerdictText(row)] : []),
        ]),
      }),
    );
  });
  return blocks;
}

/**
 * The failed checks and the author's reasons for submitting them. Each paragraph of the reasons is
 * its own block, and none is locked against breaking, so a long justification runs on.
 */
export function justificationBlocks(ctx: BlockContext, sheet: PrintableSheet): FlowBlock[] {
  const failed = sheet.evaluation?.checks.filter((c) => !c.pass) ?? [];
  if (failed.length === 0) return [];
  const { m, width } = ctx;
  const body = { fontSize: 8.5 };
  const blocks: FlowBlock[] = [
    headingBlock(ctx, 'justification-h', 'Justification for failed checks'),
  ];
  failed.forEach((c, i) => {
    const head = `FAIL — ${c.label}: ${checkFigures(c, sheet.unitSystem).value} against ${limitText(c, sheet)} (${pct(c.utilisation)})`;
    // The head already gives the label, value and limit; of the message only its advice is new.
    const detail = failAdvice(c.message);
    const height =
      m.height(head, width, { ...body, weight: 700 }) +
      (detail ? m.height(detail, width, body) : 0) +
      2;
    blocks.push({
      key: `failed-${c.id}`,
      height,
      element: (
        <View key={`failed-${c.id}`} style={{ marginBottom: 2 }} wrap={false}>
          <Text style={{ color: colours.fail, fontWeight: 700 }}>{head}</Text>
          {detail && <Text style={{ color: colours.muted }}>{detail}</Text>}
        </View>
      ),
      // The last failed check stays with the start of the reasons.
      keepWithNext: i === failed.length - 1,
    });
  });
  const reason = sheet.justification ?? 'No justification was recorded with this revision.';
  const paragraphs = reason.split(/\n+/).filter((p) => p.trim() !== '');
  const inner = width - 2 - 6;
  paragraphs.forEach((text, i) => {
    const key = `justification-${i}`;
    const first = i === 0;
    const last = i === paragraphs.length - 1;
    blocks.push({
      key,
      height: m.height(text, inner, body) + (first ? 4 : 0) + (last ? 0 : 3),
      element: (
        <View
          key={key}
          style={{
            borderLeftWidth: 2,
            borderColor: colours.rule,
            paddingLeft: 6,
            ...(first ? { marginTop: 4 } : {}),
            ...(last ? {} : { paddingBottom: 3 }),
          }}
        >
          <Text>{text}</Text>
        </View>
      ),
    });
  });
  return blocks;
}
