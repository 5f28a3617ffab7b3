import { Anchor, Group, Paper, Stack, Text, Title } from '@mantine/core';
import { IconHistory } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import type { Revision } from '@holdfast/shared';
import { AuthorNote } from '../../../features/review/components/author-note';
import { CheckActions } from './check-actions';
import { isoDay } from '../../../lib/dates';

/**
 * The head of the review tab: the notes that travel with the revision (the author's note to the
 * checker, the approval note), the checker's Return and Approve, and the way to the audit trail.
 */
export function ReviewSummary({
  revision,
  openComments,
}: {
  revision: Revision;
  openComments: number;
}) {
  return (
    <Paper p="md" component="section" aria-labelledby="review-summary-title">
      <Group justify="space-between" align="flex-start" mb="xs" gap="sm">
        <div>
          <Title order={2} size="h5" id="review-summary-title">
            Check of revision {revision.label}
          </Title>
          <Text size="sm">
            Prepared by {revision.author.displayName}
            {revision.submittedAt ? `, sent for check ${isoDay(revision.submittedAt)}` : ''}
            {revision.checker && revision.approvedAt
              ? `; approved by ${revision.checker.displayName} ${isoDay(revision.approvedAt)}`
              : ''}
            .
          </Text>
        </div>
        <Group gap="xs">
          <CheckActions revision={revision} openComments={openComments} />
          <Anchor
            component={Link}
            to={`/sheets/${revision.sheetId}/audit`}
            size="sm"
            style={{ display: 'inline-flex', alignItems: 'center', gap: 4 }}
          >
            <IconHistory size={16} aria-hidden />
            Audit trail
          </Anchor>
        </Group>
      </Group>
      <Stack gap="xs">
        {revision.changeNote ? (
          <Text size="sm">
            <Text span fw={600} inherit>
              Change note:
            </Text>{' '}
            {revision.changeNote}
          </Text>
        ) : null}
        <AuthorNote justification={revision.justification} />
        {revision.approvalNote ? (
          <Text size="sm" data-testid="approval-note">
            <Text span fw={600} inherit>
              Approval note{revision.checker ? ` by ${revision.checker.displayName}` : ''}:
            </Text>{' '}
            {revision.approvalNote}
          </Text>
        ) : null}
      </Stack>
    </Paper>
  );
}
