import { Anchor, Breadcrumbs, Group, Paper, Stack, Text, Title } from '@mantine/core';
import { Link } from 'react-router-dom';
import type { RevisionSummary, SheetDetail } from '@holdfast/shared';
import { sheetTypeTitle } from '../../../components/calc/utils/sheet-types';
import { StateBadge } from '../../../features/sheets/components/state-badge';
import type { ReactNode } from 'react';
import { isoDay } from '../../../lib/dates';

/** Number, title, where the brake sits, and the state of the revision on screen. */
export function SheetHeader({
  sheet,
  revision,
  actions,
}: {
  sheet: SheetDetail;
  revision?: RevisionSummary;
  actions?: ReactNode;
}) {
  return (
    <Paper p="md">
      <Stack gap={6}>
        <Breadcrumbs separator="›" fz="xs">
          <Anchor component={Link} to="/sheets" size="xs">
            Sheets
          </Anchor>
          <Text size="xs" c="dimmed">
            {sheet.site.code} · {sheet.machine.tag} · {sheet.position.tag}
          </Text>
        </Breadcrumbs>
        <Group justify="space-between" align="flex-start" wrap="wrap" gap="sm">
          <div>
            <Group gap="sm" align="baseline">
              <Text ff="monospace" fw={600} size="lg" data-testid="document-number">
                {sheet.documentNumber}
              </Text>
              {revision ? (
                <Text fw={600} size="lg">
                  Rev. {revision.label}
                </Text>
              ) : null}
              {revision ? <StateBadge state={revision.state} size="md" /> : null}
            </Group>
            <Title order={1} size="h3" mt={2}>
              {sheet.title}
            </Title>
            <Text size="sm" c="dimmed">
              {sheetTypeTitle(sheet.sheetType)} · {sheet.site.name} › {sheet.machine.name} (
              {sheet.machine.tag}) › {sheet.position.description} ({sheet.position.tag}) · owner{' '}
              {sheet.owner.displayName}
            </Text>
            {sheet.approved ? (
              <Text size="xs" c="dimmed">
                In force: revision {sheet.approved.label}, approved{' '}
                {isoDay(sheet.approved.approvedAt)}
              </Text>
            ) : (
              <Text size="xs" c="dimmed">
                No approved revision yet.
              </Text>
            )}
          </div>
          {actions ? <Group gap="xs">{actions}</Group> : null}
        </Group>
      </Stack>
    </Paper>
  );
}
