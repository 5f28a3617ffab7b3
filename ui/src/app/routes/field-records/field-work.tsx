import { Anchor, SimpleGrid, Text } from '@mantine/core';
import { Link } from 'react-router-dom';
import { Page } from '../../../components/layouts/page';
import type { RouteHandle } from '../../../lib/route-handle';
import { DueInspectionsPanel } from '../../../features/field-records/components/due-inspections';
import { OpenRecords } from '../../../features/field-records/components/open-records';

export const handle: RouteHandle = { title: 'Field work' };

/** The fitters' starting point: inspections due, and records not yet signed or countersigned. */
export function Component() {
  return (
    <Page
      title="Field work"
      description="Brake inspections due and the field records still open. To record work on a brake, open its position (from the list below or in Equipment)."
    >
      <SimpleGrid cols={{ base: 1, md: 2 }} spacing="md">
        <DueInspectionsPanel />
        <OpenRecords status="draft" />
        <OpenRecords status="signed" />
      </SimpleGrid>
      <Text size="sm" mt="md">
        <Anchor component={Link} to="/equipment">
          Equipment: sites, machines and brake positions
        </Anchor>
      </Text>
    </Page>
  );
}
