import { Image, View } from '@react-pdf/renderer';
import { Text } from '../text.js';
import { day, stateLabel } from '../format.js';
import type { PrintableSheet } from '../printable-sheet.js';
import type { TextMeasure } from '../measure.js';
import { colours, monoFont } from '../theme.js';

const cell = { paddingVertical: 3, paddingHorizontal: 5 } as const;
const QR_SIZE = 40;
const VERIFY_W = 112;
const VERIFY_HINT = 'Scan, or enter the code in Holdfast, to see if this revision is current.';
const noCodeText = (approvedLike: boolean) =>
  approvedLike ? 'No verification code recorded' : 'No code: not an approved revision';
const label = {
  fontSize: 6,
  color: colours.muted,
  textTransform: 'uppercase',
  letterSpacing: 0.4,
} as const;

/** The date a printout stands for: approval, else submission, else creation. */
export function revisionDate(sheet: PrintableSheet): string {
  const r = sheet.revision;
  return day(r.approvedAt ?? r.submittedAt ?? r.createdAt);
}

/** Page number and page count, known when the sheet is planned page by page. */
export interface PageNumber {
  n: number;
  total: number;
}

/**
 * Title block repeated on every page (fixed): identity, revision, page n of N, verification.
 * Without `page`, react-pdf fills in the page number after its own pagination (slower: it lays
 * every page out again).
 */
export function TitleBlock(props: {
  sheet: PrintableSheet;
  kind: string;
  qr: string | null;
  page?: PageNumber;
}) {
  const { sheet, kind, qr, page } = props;
  const approvedLike = sheet.revision.state === 'approved' || sheet.revision.state === 'superseded';
  return (
    <View
      fixed
      style={{ flexDirection: 'row', borderWidth: 1, borderColor: colours.ink, marginBottom: 8 }}
    >
      <View style={{ ...cell, width: 92, backgroundColor: colours.accent, color: '#ffffff' }}>
        <Text style={{ fontSize: 13, fontWeight: 700, letterSpacing: 1.2 }}>HOLDFAST</Text>
        <Text style={{ fontSize: 6.5, marginTop: 2 }}>{kind}</Text>
      </View>
      <View style={{ ...cell, flex: 1, borderLeftWidth: 1, borderColor: colours.ink }}>
        <Text style={{ ...monoFont, fontSize: 10, fontWeight: 700 }}>{sheet.documentNumber}</Text>
        <Text style={{ fontSize: 9, fontWeight: 600, marginTop: 1 }}>{sheet.title}</Text>
        <Text style={{ fontSize: 7, color: colours.muted, marginTop: 1 }}>
          {locationLine(sheet)}
        </Text>
      </View>
      <View style={{ ...cell, width: 118, borderLeftWidth: 1, borderColor: colours.ink }}>
        <Row k="Revision" v={sheet.revision.label} bold />
        <Row k="State" v={stateLabel(sheet.revision.state)} bold />
        <Row k="Date" v={revisionDate(sheet)} />
        <View style={{ flexDirection: 'row' }}>
          <Text style={{ ...label, width: 38 }}>Page</Text>
          {page ? (
            <Text style={{ fontSize: 7.5, flex: 1 }}>
              Page {page.n} of {page.total}
            </Text>
          ) : (
            // A dynamic Text starts empty: without flex it is laid out 0 wide and prints nothing.
            <Text
              style={{ fontSize: 7.5, flex: 1 }}
              render={({ pageNumber, totalPages }) => `Page ${pageNumber} of ${totalPages}`}
            />
          )}
        </View>
      </View>
      <View
        style={{
          ...cell,
          width: VERIFY_W,
          borderLeftWidth: 1,
          borderColor: colours.ink,
          flexDirection: 'row',
        }}
      >
        {sheet.verification && qr ? (
          <>
            <Image src={qr} style={{ width: QR_SIZE, height: QR_SIZE, marginRight: 4 }} />
            <View style={{ flex: 1 }}>
              <Text style={label}>Verify</Text>
              <Text style={{ ...monoFont, fontSize: 7.5, fontWeight: 700 }}>
                {sheet.verification.code}
              </Text>
              <Text style={{ fontSize: 5.8, color: colours.muted, marginTop: 1 }}>
                {VERIFY_HINT}
              </Text>
            </View>
          </>
        ) : (
          <View>
            <Text style={label}>Verify</Text>
            <Text style={{ fontSize: 6.5, color: colours.muted }}>{noCodeText(approvedLike)}</Text>
          </View>
        )}
      </View>
    </View>
  );
}

function Row(props: { k: string; v: string; bold?: boolean }) {
  return (
    <View style={{ flexDirection: 'row' }}>
      <Text style={{ ...label, width: 38 }}>{props.k}</Text>
      <Text style={{ fontSize: 7.5, fontWeight: props.bold ? 700 : 400 }}>{props.v}</Text>
    </View>
  );
}

/** Widths of the title block's fixed cells (the identity cell takes the rest). */
const FIXED_CELLS = 92 + 118 + 112;

/**
 * Height of the title block with its bottom margin, for page planning: the identity cell grows
 * when a long title or location wraps; the revision cell (four 7.5 pt rows) and the
 * verification cell are the floor.
 */
export function titleBlockHeight(sheet: PrintableSheet, m: TextMeasure, width: number): number {
  // Outer border 2, the identity cell's left border 1 and its 2 × 5 padding.
  const textWidth = width - 2 - FIXED_CELLS - 1 - 10;
  const identity =
    m.height(sheet.documentNumber, textWidth, { fontSize: 10, mono: true, weight: 700 }) +
    m.height(sheet.title, textWidth, { fontSize: 9, weight: 600 }) +
    1 +
    m.height(locationLine(sheet), textWidth, { fontSize: 7 }) +
    1;
  const revision = 4 * m.lineHeight({ fontSize: 7.5 });
  return (
    Math.max(identity, revision, verifyCellHeight(sheet, m)) + 2 * cell.paddingVertical + 2 + 8
  );
}

/** Content height of the verification cell: the QR code beside the code and its hint, or a note. */
function verifyCellHeight(sheet: PrintableSheet, m: TextMeasure): number {
  const label = m.lineHeight({ fontSize: 6 });
  // Cell less its left border and padding.
  const inner = VERIFY_W - 1 - 2 * cell.paddingHorizontal;
  if (!sheet.verification) {
    const approvedLike =
      sheet.revision.state === 'approved' || sheet.revision.state === 'superseded';
    return label + m.height(noCodeText(approvedLike), inner, { fontSize: 6.5 });
  }
  const text =
    label +
    m.lineHeight({ fontSize: 7.5, mono: true, weight: 700 }) +
    1 +
    m.height(VERIFY_HINT, inner - QR_SIZE - 4, { fontSize: 5.8 });
  return Math.max(QR_SIZE, text);
}

function locationLine(sheet: PrintableSheet): string {
  return `${sheet.site.name} / ${sheet.equipment.tag} ${sheet.equipment.name} / ${sheet.position.tag} ${sheet.position.description}`;
}
