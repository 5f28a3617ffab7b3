import { View } from '@react-pdf/renderer';
import { Text } from '../text.js';
import { elementBlock, headingBlock, tableBlocks, type BlockContext } from '../blocks.js';
import type { FlowBlock } from '../flow.js';
import { day, stateLabel } from '../format.js';
import type { PrintableSheet } from '../printable-sheet.js';
import { colours } from '../theme.js';
import type { Column } from './table.js';

const isApproved = (sheet: PrintableSheet) =>
  sheet.revision.state === 'approved' || sheet.revision.state === 'superseded';

const APPROVAL_COLUMNS: Column[] = [
  { title: 'Role', flex: 1.6 },
  { title: 'Name', flex: 2 },
  { title: 'Initials', flex: 0.8, align: 'center' },
  { title: 'Date', flex: 1.1 },
  { title: 'Note', flex: 2.5 },
];

const APPROVAL_NOTE =
  "Approved in Holdfast by the checker named above, who did not author this revision. The approval is recorded with the revision's hash; the verification code identifies it.";

/**
 * Sign-offs, as one block kept whole. Only an approved (or since superseded) revision prints its
 * approvals; any other state prints who prepared it and says plainly that it is not approved.
 */
export function approvalsBlock(ctx: BlockContext, sheet: PrintableSheet): FlowBlock {
  const heading = headingBlock(ctx, 'approvals-h', 'Approvals');
  if (!isApproved(sheet)) {
    const prepared = `Prepared by ${sheet.author.name} (${sheet.author.initials})${
      sheet.revision.submittedAt ? `, submitted ${day(sheet.revision.submittedAt)}` : ''
    }.`;
    const warning = `Not approved: this revision is ${stateLabel(sheet.revision.state).toLowerCase()} and must not be used for setting or operating the brake.`;
    const height =
      heading.height +
      ctx.m.height(prepared, ctx.width, { fontSize: 8.5 }) +
      2 +
      ctx.m.height(warning, ctx.width, { fontSize: 8.5, weight: 700 });
    return elementBlock(
      'approvals',
      height,
      <View wrap={false}>
        {heading.element}
        <Text>{prepared}</Text>
        <Text style={{ fontWeight: 700, color: colours.marking, marginTop: 2 }}>{warning}</Text>
      </View>,
    );
  }
  const table = tableBlocks(ctx, 'approvals', {
    columns: APPROVAL_COLUMNS,
    rows: sheet.approvals.map((a) => [
      a.role,
      a.person.name,
      a.person.initials,
      day(a.at),
      a.note ?? '',
    ]),
  });
  const height =
    heading.height +
    table.reduce((sum, b) => sum + b.height, 0) +
    ctx.m.height(APPROVAL_NOTE, ctx.width, { fontSize: 7 });
  return elementBlock(
    'approvals',
    height,
    <View wrap={false}>
      {heading.element}
      {table.map((b) => b.element)}
      <Text style={{ fontSize: 7, color: colours.muted }}>{APPROVAL_NOTE}</Text>
    </View>,
  );
}

export function revisionHistoryBlocks(ctx: BlockContext, sheet: PrintableSheet): FlowBlock[] {
  return [
    headingBlock(ctx, 'history-h', 'Revision history'),
    ...tableBlocks(ctx, 'history', {
      continuedTitle: 'Revision history',
      columns: [
        { title: 'Rev', width: 28, align: 'center' },
        { title: 'Date', width: 58 },
        { title: 'State', width: 58 },
        { title: 'Change', flex: 4 },
        { title: 'Author', flex: 1.3 },
        { title: 'Checker', flex: 1.3 },
      ],
      rows: sheet.history.map((h) => [
        h.label,
        day(h.date),
        stateLabel(h.state),
        h.changeNote || '—',
        `${h.author.name} (${h.author.initials})`,
        h.checker ? `${h.checker.name} (${h.checker.initials})` : '—',
      ]),
    }),
  ];
}
