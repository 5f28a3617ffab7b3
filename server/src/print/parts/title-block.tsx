import { Image, Text, View } from '@react-pdf/renderer';
import { day, stateLabel } from '../format.js';
import type { PrintableSheet } from '../printable-sheet.js';
import { colours, monoFont } from '../theme.js';

const cell = { paddingVertical: 3, paddingHorizontal: 5 } as const;
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

/** Title block repeated on every page (fixed): identity, revision, page n of N, verification. */
export function TitleBlock(props: { sheet: PrintableSheet; kind: string; qr: string | null }) {
  const { sheet, kind, qr } = props;
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
          {sheet.site.name} / {sheet.equipment.tag} {sheet.equipment.name} / {sheet.position.tag}{' '}
          {sheet.position.description}
        </Text>
      </View>
      <View style={{ ...cell, width: 118, borderLeftWidth: 1, borderColor: colours.ink }}>
        <Row k="Revision" v={sheet.revision.label} bold />
        <Row k="State" v={stateLabel(sheet.revision.state)} bold />
        <Row k="Date" v={revisionDate(sheet)} />
        <View style={{ flexDirection: 'row' }}>
          <Text style={{ ...label, width: 38 }}>Page</Text>
          {/* A dynamic Text starts empty: without flex it is laid out 0 wide and prints nothing. */}
          <Text
            style={{ fontSize: 7.5, flex: 1 }}
            render={({ pageNumber, totalPages }) => `Page ${pageNumber} of ${totalPages}`}
          />
        </View>
      </View>
      <View
        style={{
          ...cell,
          width: 112,
          borderLeftWidth: 1,
          borderColor: colours.ink,
          flexDirection: 'row',
        }}
      >
        {sheet.verification && qr ? (
          <>
            <Image src={qr} style={{ width: 40, height: 40, marginRight: 4 }} />
            <View style={{ flex: 1 }}>
              <Text style={label}>Verify</Text>
              <Text style={{ ...monoFont, fontSize: 7.5, fontWeight: 700 }}>
                {sheet.verification.code}
              </Text>
              <Text style={{ fontSize: 5.8, color: colours.muted, marginTop: 1 }}>
                Scan, or enter the code in Holdfast, to see if this revision is current.
              </Text>
            </View>
          </>
        ) : (
          <View>
            <Text style={label}>Verify</Text>
            <Text style={{ fontSize: 6.5, color: colours.muted }}>
              {approvedLike ? 'No verification code recorded' : 'No code: not an approved revision'}
            </Text>
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
