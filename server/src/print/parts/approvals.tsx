import { Text, View } from '@react-pdf/renderer';
import { day, stateLabel } from '../format.js';
import type { PrintableSheet } from '../printable-sheet.js';
import { colours } from '../theme.js';
import { Heading, Table } from './table.js';

const isApproved = (sheet: PrintableSheet) =>
  sheet.revision.state === 'approved' || sheet.revision.state === 'superseded';

/**
 * Sign-offs. Only an approved (or since superseded) revision prints its approvals; any other
 * state prints who prepared it and says plainly that it is not approved.
 */
export function Approvals(props: { sheet: PrintableSheet }) {
  const { sheet } = props;
  if (!isApproved(sheet)) {
    return (
      <View wrap={false}>
        <Heading>Approvals</Heading>
        <Text>
          Prepared by {sheet.author.name} ({sheet.author.initials})
          {sheet.revision.submittedAt ? `, submitted ${day(sheet.revision.submittedAt)}` : ''}.
        </Text>
        <Text style={{ fontWeight: 700, color: colours.marking, marginTop: 2 }}>
          Not approved: this revision is {stateLabel(sheet.revision.state).toLowerCase()} and must
          not be used for setting or operating the brake.
        </Text>
      </View>
    );
  }
  return (
    <View wrap={false}>
      <Heading>Approvals</Heading>
      <Table
        columns={[
          { title: 'Role', flex: 1.6 },
          { title: 'Name', flex: 2 },
          { title: 'Initials', flex: 0.8, align: 'center' },
          { title: 'Date', flex: 1.1 },
          { title: 'Note', flex: 2.5 },
        ]}
        rows={sheet.approvals.map((a) => [
          a.role,
          a.person.name,
          a.person.initials,
          day(a.at),
          a.note ?? '',
        ])}
      />
      <Text style={{ fontSize: 7, color: colours.muted }}>
        Approved in Holdfast by the checker named above, who did not author this revision. The
        approval is recorded with the revision&apos;s hash; the verification code identifies it.
      </Text>
    </View>
  );
}

export function RevisionHistory(props: { sheet: PrintableSheet }) {
  const { sheet } = props;
  // Short table: keep it whole with its heading rather than orphan the heading.
  return (
    <View wrap={sheet.history.length > 12}>
      <Heading>Revision history</Heading>
      <Table
        columns={[
          { title: 'Rev', width: 28, align: 'center' },
          { title: 'Date', width: 58 },
          { title: 'State', width: 58 },
          { title: 'Change', flex: 4 },
          { title: 'Author', flex: 1.3 },
          { title: 'Checker', flex: 1.3 },
        ]}
        rows={sheet.history.map((h) => [
          h.label,
          day(h.date),
          stateLabel(h.state),
          h.changeNote || '—',
          `${h.author.name} (${h.author.initials})`,
          h.checker ? `${h.checker.name} (${h.checker.initials})` : '—',
        ])}
      />
    </View>
  );
}
