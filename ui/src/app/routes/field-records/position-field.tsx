import { Link, useParams } from 'react-router-dom';
import { Alert, Button, Group, SimpleGrid, Skeleton, Stack, Text, Title } from '@mantine/core';
import { IconClipboardPlus } from '@tabler/icons-react';
import { length, liningSeries, strokeSeries } from '@holdfast/calc';
import {
  mayCountersign,
  mayRecordFieldWork,
  type Position,
  type PositionFieldState,
} from '@holdfast/shared';
import { Page } from '../../../components/layouts/page';
import { ErrorPanel } from '../../../components/errors/error-panel';
import type { RouteHandle } from '../../../lib/route-handle';
import { useCurrentUser } from '../../../lib/session';
import { usePositionHistory } from '../../../features/field-records/api/get-position-history';
import { usePositionState } from '../../../features/field-records/api/get-position-state';
import { RecordTimeline } from '../../../features/field-records/components/record-timeline';
import { WearChart } from '../../../features/field-records/components/wear-chart';
import {
  LINING_KEYS,
  liningChartTitle,
  MIN_RESERVE_KEY,
  RESERVE_KEY,
  hasStrokeSeries,
} from '../../../features/field-records/components/wear-series';
import { useFieldForm } from '../../../features/field-records/api/get-field-form';
import { isoDay } from '../../../lib/dates';
import { newFieldRecordPath } from '../../../lib/field-work';
import { findPositionPlace, useRegister } from '../../../features/register/api/get-register';
import { sheetTypeTitle } from '../../../components/calc/utils/sheet-types';

export const handle: RouteHandle = { title: 'Field records' };

function AtAGlance({ state }: { state: PositionFieldState }) {
  const due = state.nextDue;
  return (
    <SimpleGrid cols={{ base: 1, sm: 2 }} spacing="sm">
      <Text>
        Set to:{' '}
        {state.setTo
          ? `${state.setTo.documentNumber} rev. ${state.setTo.revisionLabel} (${isoDay(state.setTo.performedAt)})${state.setTo.superseded ? ', since superseded' : ''}`
          : 'not recorded'}
      </Text>
      <Text>
        Last inspected: {state.lastInspected ? isoDay(state.lastInspected.performedAt) : 'never'}
      </Text>
      <Text c={due?.overdue ? 'fail.8' : undefined} fw={due?.overdue ? 700 : undefined}>
        Next due:{' '}
        {due?.date
          ? isoDay(due.date)
          : due?.meterHours != null
            ? `at ${Math.floor(due.meterHours)} h`
            : 'no interval set'}
        {due?.overdue ? ' (overdue)' : ''}
      </Text>
      <Text>Open findings: {state.openFindings.length}</Text>
    </SimpleGrid>
  );
}

/** Start a record against each approved sheet in force at the position (brake, disc springs). */
function RecordWork({ position }: { position: Position | undefined }) {
  if (!position) return null;
  if (position.inForce.length === 0)
    return (
      <Text size="sm" c="dimmed">
        No approved sheet is in force here, so there is nothing to set the brake to yet.
      </Text>
    );
  return (
    <Group gap="sm">
      {position.inForce.map((f) => (
        <Button
          key={f.revisionId}
          component={Link}
          to={newFieldRecordPath(f.revisionId)}
          leftSection={<IconClipboardPlus size={18} aria-hidden />}
          // Two lines on a phone rather than a label cut off at the screen's edge.
          h="auto"
          py={6}
          styles={{ label: { whiteSpace: 'normal', textAlign: 'left', lineHeight: 1.3 } }}
        >
          Record field work: {f.documentNumber} rev. {f.revisionLabel}
          {position.inForce.length > 1 ? ` (${sheetTypeTitle(f.sheetType).toLowerCase()})` : ''}
        </Button>
      ))}
    </Group>
  );
}

export function Component() {
  const { positionId = '' } = useParams();
  const user = useCurrentUser();
  const history = usePositionHistory(positionId);
  const state = usePositionState(positionId);
  const register = useRegister();
  const place = register.data ? findPositionPlace(register.data, positionId) : undefined;
  const position = place?.position;
  const records = history.data?.items ?? [];
  const tag = position?.tag ?? records[0]?.positionTag;
  // The minimum reserve stroke is a printed target of the revision the brake was last set to
  // (the server's setTo; an inspection may have been recorded against another revision since).
  const setTo = state.data?.setTo?.revisionId ?? records[records.length - 1]?.revisionId ?? '';
  const form = useFieldForm(setTo);
  const minimum = form.data?.targets.find((t) => t.settingKey === MIN_RESERVE_KEY)?.value ?? null;
  const hasStroke = hasStrokeSeries(form.data?.targets, records);
  const canCountersign = mayCountersign(user.role);
  return (
    <Page
      title={tag ? `Field records · ${tag}` : 'Field records'}
      // The tag alone is not enough on site: every crane has its MH-B1.
      eyebrow={place && `${place.site.code} · ${place.machine.tag} ${place.machine.name}`}
      description={place?.position.description}
    >
      <Stack gap="lg">
        {state.isPending && <Skeleton h={60} />}
        {state.isError && <ErrorPanel error={state.error} />}
        {state.data && <AtAGlance state={state.data} />}
        {mayRecordFieldWork(user.role) && <RecordWork position={position} />}
        {history.isPending && <Skeleton h={240} />}
        {history.isError && <ErrorPanel error={history.error} />}
        {history.data && (
          <>
            <Title order={2} size="h3">
              Wear and the next re-adjustment
            </Title>
            <Alert color="gray">
              The prediction is a statistical estimate from the readings so far; inspect at the
              interval set for the position and follow the makers&apos; data for the brake and its
              release unit.
            </Alert>
            <SimpleGrid cols={{ base: 1, md: 2 }} spacing="md">
              {hasStroke && (
                <WearChart
                  title="Reserve stroke"
                  series={strokeSeries(
                    records,
                    RESERVE_KEY,
                    minimum === null ? null : length(minimum),
                  )}
                />
              )}
              {LINING_KEYS.map((key) => {
                // The sheet's minimum lining thickness, so the trend says when it is reached.
                const min = form.data?.checks.find((c) => c.key === key)?.minimum ?? null;
                return (
                  <WearChart
                    key={key}
                    title={liningChartTitle(form.data?.checks, key)}
                    series={liningSeries(records, key, min === null ? null : length(min))}
                    work="lining change"
                  />
                );
              })}
            </SimpleGrid>
            <Title order={2} size="h3">
              Timeline
            </Title>
            <RecordTimeline records={records} canCountersign={canCountersign} userId={user.id} />
          </>
        )}
      </Stack>
    </Page>
  );
}
