import { useState } from 'react';
import { Alert, Button, Group, List, Stack, Text } from '@mantine/core';
import { IconAlertTriangle, IconNotes } from '@tabler/icons-react';
import type { CriteriaReview } from '@holdfast/shared';
import { formatNumber } from '@holdfast/calc';
import { ActionDialog } from '../../../components/action-dialog';
import { useCriteriaReview } from '../api/get-criteria-review';
import { useDisposeReview } from '../api/dispose-review';
import { isoDay } from '../../../lib/dates';

/** "Under review since …": the approval fails a newer criteria version; how it can be cleared. */
function OpenReview({
  review,
  revisionId,
  canDispose,
  revisionLabel,
}: {
  review: CriteriaReview;
  revisionId: string;
  canDispose: boolean;
  revisionLabel?: string;
}) {
  const [opened, setOpened] = useState(false);
  const dispose = useDisposeReview(revisionId);
  return (
    <Alert
      color="fail"
      variant="light"
      icon={<IconAlertTriangle size={18} />}
      title={`${revisionLabel ? `Approved revision ${revisionLabel}: under review` : 'Under review'} since ${isoDay(review.flaggedAt)}: criteria ${review.criteriaSetName} v${review.criteriaSetVersion}`}
      data-under-review
      role="status"
    >
      <Stack gap="xs">
        <Text size="sm">
          This approval stands on record, but its stored inputs fail version{' '}
          {review.criteriaSetVersion} of the criteria set:
        </Text>
        <List size="sm" withPadding>
          {review.failing.map((f) => (
            <List.Item key={f.id}>
              {f.label}
              {f.unit || f.limit
                ? ` — ${formatNumber(f.value, 4)} against ${formatNumber(f.limit, 4)} ${f.unit}`
                : ''}
            </List.Item>
          ))}
        </List>
        <Text size="sm">
          Approve a new revision of the sheet, or have a checker record why this one stands.
        </Text>
        {canDispose ? (
          <Group>
            <Button size="xs" variant="default" onClick={() => setOpened(true)}>
              Record why it stands
            </Button>
          </Group>
        ) : null}
      </Stack>
      <ActionDialog
        opened={opened}
        onClose={() => setOpened(false)}
        title="Reviewed: the approval stands"
        intro={
          <Text size="sm">
            Your disposition clears the flag, goes into the audit trail and is printed on every
            later print of this revision. Name the grounds: the document, the duty, the margin.
          </Text>
        }
        textLabel="Stands because"
        textField="disposition"
        textRequired
        requiredMessage="Say why the approved revision stands."
        confirmLabel="Record disposition"
        onConfirm={(disposition) => dispose.mutateAsync({ disposition })}
      />
    </Alert>
  );
}

/** The review state of an approved revision: the open flag, then earlier dispositions. */
export function UnderReviewBanner({
  revisionId,
  approved,
  revisionLabel,
}: {
  revisionId: string;
  approved: boolean;
  /** Named when the banner stands above another revision than the one flagged. */
  revisionLabel?: string;
}) {
  const query = useCriteriaReview(revisionId, approved);
  if (!approved || !query.data) return null;
  const { open, cleared, canDispose } = query.data;
  const disposed = cleared.filter((c) => c.clearedHow === 'disposition');
  if (!open && disposed.length === 0) return null;
  return (
    <Stack gap="xs" mb="md">
      {open ? (
        <OpenReview
          review={open}
          revisionId={revisionId}
          canDispose={canDispose}
          revisionLabel={revisionLabel}
        />
      ) : null}
      {disposed.map((c) => (
        <Alert
          key={c.id}
          color="steel"
          variant="light"
          icon={<IconNotes size={18} />}
          title={`Reviewed against criteria ${c.criteriaSetName} v${c.criteriaSetVersion}: stands`}
          data-review-disposition
        >
          <Text size="sm">{c.disposition}</Text>
          <Text size="xs" c="dimmed" mt={4}>
            {c.clearedBy?.displayName ?? 'A checker'}, {c.clearedAt ? isoDay(c.clearedAt) : ''}
          </Text>
        </Alert>
      ))}
    </Stack>
  );
}
