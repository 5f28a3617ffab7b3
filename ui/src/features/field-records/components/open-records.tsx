import { Anchor, Badge, Paper, Stack, Text } from '@mantine/core';
import { Link } from 'react-router-dom';
import {
  positionFieldPath,
  positionPlaceText,
  fieldRecordKindLabels,
  type FieldRecordStatus,
} from '@holdfast/shared';
import { ErrorPanel } from '../../../components/errors/error-panel';
import { useFieldRecords } from '../api/get-field-records';
import { isoDay } from '../../../lib/dates';
import { CountedTitle } from '../../../components/counted-title';

const titles: Record<Exclude<FieldRecordStatus, 'countersigned'>, string> = {
  draft: 'Records not yet signed',
  signed: 'Signed, awaiting countersignature',
};

/** Field records still open in one status, each linked to its position's field page. */
export function OpenRecords({ status }: { status: 'draft' | 'signed' }) {
  const records = useFieldRecords(status);
  const titleId = `field-records-${status}-title`;
  return (
    <Paper p="md" component="section" aria-labelledby={titleId}>
      <CountedTitle
        id={titleId}
        title={titles[status]}
        count={records.data?.items.length ?? null}
      />
      {records.isError ? (
        <ErrorPanel error={records.error} onRetry={() => void records.refetch()} />
      ) : !records.data ? (
        <Text size="sm" c="dimmed">
          Loading…
        </Text>
      ) : records.data.items.length === 0 ? (
        <Text size="sm" c="dimmed">
          None.
        </Text>
      ) : (
        <Stack gap={4} component="ul" p={0} m={0} style={{ listStyle: 'none' }}>
          {records.data.items.map((r) => (
            <Text size="sm" component="li" key={r.id}>
              <Anchor component={Link} to={positionFieldPath(r.positionId)} underline="always">
                {positionPlaceText(r)}
              </Anchor>{' '}
              {isoDay(r.performedAt)} · {fieldRecordKindLabels[r.kind]} · {r.documentNumber} rev.{' '}
              {r.revisionLabel}
              {r.outOfTolerance ? (
                <Badge ml="xs" color="fail" size="sm">
                  out of tolerance
                </Badge>
              ) : null}
            </Text>
          ))}
        </Stack>
      )}
    </Paper>
  );
}
