import { View } from '@react-pdf/renderer';
import { Text } from './text.js';
import type { ReactElement, ReactNode } from 'react';
import type { FlowBlock } from './flow.js';
import type { TextMeasure, TextStyle } from './measure.js';
import { Heading, TableHeader, TableRow, type Column } from './parts/table.js';
import { ROW_RULE } from './theme.js';

/** What a block builder needs: the fonts' measure and the width of the text column. */
export interface BlockContext {
  m: TextMeasure;
  width: number;
}

/** Heading sizes and margins, as parts/table.tsx prints them. */
const HEADING = {
  1: { style: { fontSize: 11.5, weight: 700 }, margins: 10 + 4 },
  2: { style: { fontSize: 9, weight: 700 }, margins: 6 + 3 },
} as const;

export function headingBlock(
  ctx: BlockContext,
  key: string,
  text: string,
  level: 1 | 2 = 1,
  extra: Partial<FlowBlock> = {},
): FlowBlock {
  const h = HEADING[level];
  return {
    key,
    height: ctx.m.height(text, ctx.width, h.style) + h.margins,
    element: (
      <Heading key={key} level={level}>
        {text}
      </Heading>
    ),
    keepWithNext: true,
    ...extra,
  };
}

/** A block whose content is given with its own height (a composed element). */
export function elementBlock(key: string, height: number, element: ReactElement): FlowBlock {
  return { key, height, element: <View key={key}>{element}</View> };
}

/** A table cell that is not plain text (a verdict badge, a box to write in) with its height. */
interface NodeCell {
  node: ReactNode;
  height: number;
}

type BlockCell = string | NodeCell;

const isNode = (c: BlockCell): c is NodeCell => typeof c !== 'string';

/** Widths in pt of the columns of a `width`-wide row (fixed widths first, then flex shares). */
function columnWidths(columns: Column[], width: number): number[] {
  const fixed = columns.reduce((sum, c) => sum + (c.width ?? 0), 0);
  const flex = columns.reduce((sum, c) => sum + (c.width === undefined ? (c.flex ?? 1) : 0), 0);
  return columns.map((c) =>
    c.width !== undefined ? c.width : ((c.flex ?? 1) / flex) * Math.max(0, width - fixed),
  );
}

/**
 * A table as blocks: the header (kept with the first row) and one block per row. A row that
 * opens a page repeats the heading (as "… (continued)") and the column header above it.
 */
export function tableBlocks(
  ctx: BlockContext,
  key: string,
  table: { columns: Column[]; rows: BlockCell[][]; fontSize?: number; continuedTitle?: string },
): FlowBlock[] {
  const { m } = ctx;
  const { columns } = table;
  const fontSize = table.fontSize ?? 7.8;
  const widths = columnWidths(columns, ctx.width);
  const headerStyle: TextStyle = { fontSize: fontSize - 0.8, weight: 700 };
  const headerText = Math.max(
    ...columns.map((c, i) => m.height(c.title, widths[i] - 6, headerStyle)),
  );
  // 3 pt padding above and below, 0.6 pt rule below, 1 pt table rule above the first header.
  const header = (ruleAbove: boolean, k: string): FlowBlock => ({
    key: k,
    height: headerText + 6 + 0.6 + (ruleAbove ? 1 : 0),
    element: <TableHeader key={k} columns={columns} fontSize={fontSize} ruleAbove={ruleAbove} />,
    keepWithNext: true,
  });
  const carry: FlowBlock[] = [
    ...(table.continuedTitle
      ? [headingBlock(ctx, `${key}-cont`, `${table.continuedTitle} (continued)`, 2)]
      : []),
    header(true, `${key}-head-cont`),
  ];
  const blocks: FlowBlock[] = [header(true, `${key}-head`)];
  table.rows.forEach((row, r) => {
    const last = r === table.rows.length - 1;
    const cellHeights = row.map((cell, i) => {
      if (isNode(cell)) return cell.height + 4;
      const c = columns[i];
      const style: TextStyle = { fontSize, mono: c.mono };
      return m.height(cell, widths[i] - 6, style) + 4;
    });
    blocks.push({
      key: `${key}-r${r}`,
      height: Math.max(...cellHeights) + ROW_RULE + (last ? 6 : 0),
      element: (
        <TableRow
          key={`${key}-r${r}`}
          columns={columns}
          row={row.map((cell) => (isNode(cell) ? cell.node : cell))}
          fontSize={fontSize}
          last={last}
        />
      ),
      carry,
    });
  });
  return blocks;
}

/** A paragraph of plain text with optional bottom margin. */
export function paragraphBlock(
  ctx: BlockContext,
  key: string,
  text: string,
  style: TextStyle & { color?: string; marginBottom?: number; marginTop?: number } = {
    fontSize: 8.5,
  },
): FlowBlock {
  const margins = (style.marginBottom ?? 0) + (style.marginTop ?? 0);
  return {
    key,
    height: ctx.m.height(text, ctx.width, style) + margins,
    element: (
      <Text
        key={key}
        style={{
          fontSize: style.fontSize,
          fontWeight: style.weight ?? 400,
          ...(style.color ? { color: style.color } : {}),
          ...(style.marginBottom ? { marginBottom: style.marginBottom } : {}),
          ...(style.marginTop ? { marginTop: style.marginTop } : {}),
        }}
      >
        {text}
      </Text>
    ),
  };
}
