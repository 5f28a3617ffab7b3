import { Anchor, Badge, Group, Paper, Skeleton, Stack, Table, Text, Title } from '@mantine/core';
import type { QueryClient } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import { Page } from '../../../components/layouts/page';
import { ErrorPanel } from '../../../components/errors/error-panel';
import type { RouteHandle } from '../../../lib/route-handle';
import { registerQueryOptions, useRegister } from '../../../features/register/api/get-register';

export const handle: RouteHandle = { title: 'Equipment', wide: true };

export function clientLoader(queryClient: QueryClient) {
  return async () => {
    await queryClient.ensureQueryData(registerQueryOptions());
    return null;
  };
}

/** Sites, their machines, and each brake position with the approved sheet in force. */
export function Component() {
  const register = useRegister();
  return (
    <Page
      title="Equipment"
      description="Sites, machines and brake positions, with the approved sheet in force for each position."
    >
      {register.isPending ? (
        <Stack>
          <Skeleton h={140} />
          <Skeleton h={140} />
        </Stack>
      ) : register.isError ? (
        <ErrorPanel error={register.error} onRetry={() => void register.refetch()} />
      ) : register.data.sites.length === 0 ? (
        <Text c="dimmed">The register is empty.</Text>
      ) : (
        <Stack gap="lg">
          {register.data.sites.map((site) => (
            <Paper key={site.id} p="md" component="section" aria-labelledby={`site-${site.id}`}>
              <Group gap="xs" mb="sm">
                <Badge variant="outline" color="steel" ff="monospace">
                  {site.code}
                </Badge>
                <Title order={2} size="h4" id={`site-${site.id}`}>
                  {site.name}
                </Title>
              </Group>
              <Stack gap="md">
                {site.machines.map((m) => (
                  <div key={m.id}>
                    <Text fw={600} size="sm">
                      <Text span ff="monospace">
                        {m.tag}
                      </Text>{' '}
                      {m.name}{' '}
                      <Text span c="dimmed" size="xs">
                        ({m.kind.replace('-', ' ')})
                      </Text>
                    </Text>
                    {m.positions.length === 0 ? (
                      <Text size="sm" c="dimmed" pl="md">
                        No brake positions recorded.
                      </Text>
                    ) : (
                      <Table
                        fz="sm"
                        verticalSpacing={4}
                        withRowBorders={false}
                        aria-label={`Brake positions of ${m.tag}`}
                      >
                        <Table.Thead>
                          <Table.Tr>
                            <Table.Th w={140}>Position</Table.Th>
                            <Table.Th>Description</Table.Th>
                            <Table.Th w={130}>Motion</Table.Th>
                            <Table.Th w={220}>Approved sheet in force</Table.Th>
                          </Table.Tr>
                        </Table.Thead>
                        <Table.Tbody>
                          {m.positions.map((p) => (
                            <Table.Tr key={p.id}>
                              <Table.Td ff="monospace">{p.tag}</Table.Td>
                              <Table.Td>{p.description}</Table.Td>
                              <Table.Td>{p.motion.replace('-', ' ')}</Table.Td>
                              <Table.Td>
                                {p.currentApproved ? (
                                  <Anchor
                                    component={Link}
                                    to={`/sheets/${p.currentApproved.sheetId}/revisions/${p.currentApproved.revisionId}`}
                                    size="sm"
                                  >
                                    <Text span ff="monospace" size="sm">
                                      {p.currentApproved.documentNumber}
                                    </Text>{' '}
                                    rev. {p.currentApproved.revisionLabel}
                                  </Anchor>
                                ) : (
                                  <Text span size="sm" c="fail.8">
                                    None approved
                                  </Text>
                                )}
                              </Table.Td>
                            </Table.Tr>
                          ))}
                        </Table.Tbody>
                      </Table>
                    )}
                  </div>
                ))}
              </Stack>
            </Paper>
          ))}
        </Stack>
      )}
    </Page>
  );
}
