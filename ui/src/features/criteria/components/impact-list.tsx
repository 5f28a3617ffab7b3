import { Alert, Anchor, List, Paper, Skeleton, Text, Title } from '@mantine/core';
import { IconAlertTriangle, IconCircleCheck } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { ErrorPanel } from '../../../components/errors/error-panel';
import { useCurrentUser } from '../../../lib/session';
import { formatSI } from '../../../components/calc/utils/format-si';
import { useCriteriaImpact } from '../api/get-criteria-impact';

/** Approved sheets that no longer pass under a criteria version. */
export function ImpactList({ setId, version }: { setId: string; version: number }) {
  const impact = useCriteriaImpact(setId, version);
  const system = useCurrentUser().unitSystem;
  return (
    <Paper p="md" component="section" aria-labelledby="impact-title">
      <Title order={2} size="h5" id="impact-title" mb="sm">
        Impact of version {version} on approved sheets
      </Title>
      {impact.isPending ? (
        <Skeleton h={80} />
      ) : impact.isError ? (
        <ErrorPanel error={impact.error} onRetry={() => void impact.refetch()} />
      ) : impact.data.items.length === 0 ? (
        <Alert color="pass" variant="light" icon={<IconCircleCheck size={18} />}>
          All {impact.data.checked} approved revision{impact.data.checked === 1 ? '' : 's'} still
          pass.
        </Alert>
      ) : (
        <>
          <Alert color="fail" variant="light" icon={<IconAlertTriangle size={18} />} mb="sm">
            {impact.data.items.length} of {impact.data.checked} approved revisions no longer pass.
            Each needs a new revision.
          </Alert>
          <List spacing="sm">
            {impact.data.items.map((item) => (
              <List.Item key={item.revisionId}>
                <Anchor
                  component={Link}
                  to={`/sheets/${item.sheetId}/revisions/${item.revisionId}`}
                  ff="monospace"
                  size="sm"
                >
                  {item.documentNumber} rev. {item.revisionLabel}
                </Anchor>{' '}
                <Text span size="sm">
                  {item.title}
                </Text>
                <List size="xs" withPadding>
                  {item.failing.map((f) => (
                    <List.Item key={f.id}>
                      Fail: {f.label} — {formatSI(f.value, f.dimension, system, f.unit)} against{' '}
                      {formatSI(f.limit, f.dimension, system, f.unit)}
                    </List.Item>
                  ))}
                </List>
              </List.Item>
            ))}
          </List>
        </>
      )}
    </Paper>
  );
}
