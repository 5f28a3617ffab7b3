import { View } from '@react-pdf/renderer';
import { Text } from '../text.js';
import type { ReactNode } from 'react';
import { colours, monoFont, ruledRow } from '../theme.js';

export interface Column {
  title: string;
  /** Flex weight of the column's width. */
  flex?: number;
  /** Fixed width in pt (wins over flex). */
  width?: number;
  align?: 'left' | 'right' | 'center';
  mono?: boolean;
}

type Cell = string | ReactNode;

const box = (c: Column) => (c.width !== undefined ? { width: c.width } : { flex: c.flex ?? 1 });

/** Column header row; `ruleAbove` draws the table's top rule (the first piece of a table). */
export function TableHeader(props: { columns: Column[]; fontSize?: number; ruleAbove?: boolean }) {
  const fontSize = props.fontSize ?? 7.8;
  return (
    <View
      wrap={false}
      minPresenceAhead={36}
      style={{
        flexDirection: 'row',
        backgroundColor: colours.band,
        borderBottomWidth: 0.6,
        borderColor: colours.ink,
        ...(props.ruleAbove ? { borderTopWidth: 1 } : {}),
      }}
    >
      {props.columns.map((c, i) => (
        <Text
          key={i}
          style={{
            ...box(c),
            padding: 3,
            fontSize: fontSize - 0.8,
            fontWeight: 700,
            textAlign: c.align ?? 'left',
          }}
        >
          {c.title}
        </Text>
      ))}
    </View>
  );
}

/** One ruled row; `last` adds the space a table leaves below itself. */
export function TableRow(props: {
  columns: Column[];
  row: Cell[];
  fontSize?: number;
  last?: boolean;
  /** Half the usual padding above and below: long numeric tables on a one-page card. */
  dense?: boolean;
}) {
  const { columns } = props;
  const fontSize = props.fontSize ?? 7.8;
  const paddingVertical = props.dense ? 0.5 : 2;
  return (
    <View wrap={false} style={{ ...ruledRow, ...(props.last ? { marginBottom: 6 } : {}) }}>
      {props.row.map((cell, i) => {
        const c = columns[i];
        const style = {
          ...box(c),
          paddingVertical,
          paddingHorizontal: 3,
          fontSize,
          textAlign: c.align ?? 'left',
          ...(c.mono ? monoFont : {}),
        } as const;
        return typeof cell === 'string' ? (
          <Text key={i} style={style}>
            {cell}
          </Text>
        ) : (
          <View key={i} style={{ ...box(c), padding: 2 }}>
            {cell}
          </View>
        );
      })}
    </View>
  );
}

/**
 * A ruled table whose rows never split across pages; the header row stays with at least
 * the first rows, so a page never ends on a lone header. (The calculation sheet cuts its tables
 * into blocks instead: see tableBlocks.)
 */
export function Table(props: {
  columns: Column[];
  rows: Cell[][];
  fontSize?: number;
  dense?: boolean;
}) {
  const { columns, rows, fontSize, dense } = props;
  return (
    <View style={{ borderTopWidth: 1, borderColor: colours.ink, marginBottom: 6 }}>
      <TableHeader columns={columns} fontSize={fontSize} />
      {rows.map((row, r) => (
        <TableRow key={r} columns={columns} row={row} fontSize={fontSize} dense={dense} />
      ))}
    </View>
  );
}

/** A section heading that refuses to sit alone at the foot of a page. */
export function Heading(props: { children: ReactNode; level?: 1 | 2; id?: string }) {
  const level = props.level ?? 1;
  return (
    <Text
      minPresenceAhead={60}
      style={
        level === 1
          ? {
              fontSize: 11.5,
              fontWeight: 700,
              color: colours.accent,
              marginTop: 10,
              marginBottom: 4,
            }
          : { fontSize: 9, fontWeight: 700, marginTop: 6, marginBottom: 3 }
      }
    >
      {props.children}
    </Text>
  );
}

/** Coloured PASS / FAIL badge: the word carries the meaning, the colour only helps. */
export function Verdict(props: { pass: boolean }) {
  return (
    <Text
      style={{
        fontSize: 7.5,
        fontWeight: 700,
        textAlign: 'center',
        paddingVertical: 1,
        color: props.pass ? colours.pass : colours.fail,
        backgroundColor: props.pass ? colours.passBg : colours.failBg,
      }}
    >
      {props.pass ? 'PASS' : 'FAIL'}
    </Text>
  );
}
