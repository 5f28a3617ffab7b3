import { mayRecordFieldWork } from '@holdfast/shared';
import { useState } from 'react';
import { Badge, Button, Group, Paper, Skeleton, Stack, Table, Text, Title } from '@mantine/core';
import { IconPencil, IconPlus } from '@tabler/icons-react';
import type { QueryClient } from '@tanstack/react-query';
import { Page } from '../../../components/layouts/page';
import { ErrorPanel } from '../../../components/errors/error-panel';
import type { RouteHandle } from '../../../lib/route-handle';
import { hasRole, useCurrentUser } from '../../../lib/session';
import { registerQueryOptions, useRegister } from '../../../features/register/api/get-register';
import { PositionRow } from '../../../features/register/components/position-row';
import {
  machineFields,
  positionFields,
  siteAddFields,
  siteEditFields,
} from '../../../features/register/components/register-fields';
import {
  RegisterFormDialog,
  type RegisterFormDialogProps,
} from '../../../features/register/components/register-form-dialog';
import { RegisterExport } from './register-export';

export const handle: RouteHandle = { title: 'Equipment', wide: true };

export function clientLoader(queryClient: QueryClient) {
  return async () => {
    await queryClient.ensureQueryData(registerQueryOptions());
    return null;
  };
}

type Form = Omit<RegisterFormDialogProps, 'opened' | 'onClose'>;

/** Sites, their machines, and each brake position with the approved sheets in force. */
export function Component() {
  const register = useRegister();
  const user = useCurrentUser();
  // Who the server lets change the register (register.controller.ts): not viewers, not fitters.
  const canEdit = hasRole(user, 'engineer', 'checker', 'admin');
  const canRecord = mayRecordFieldWork(user.role);
  // Who may author a sheet (sheets.controller.ts): engineers and checkers.
  const canStart = hasRole(user, 'engineer', 'checker');
  const [form, setForm] = useState<Form | null>(null);
  const small = { size: 'compact-sm', variant: 'subtle' } as const;

  return (
    <Page
      title="Equipment"
      description="Sites, machines and brake positions, with the approved sheet in force for each position and sheet type."
      actions={
        <Group gap="xs">
          <RegisterExport />
          {canEdit ? (
            <Button
              leftSection={<IconPlus size={16} aria-hidden />}
              onClick={() =>
                setForm({
                  title: 'Add a site',
                  kind: 'sites',
                  fields: siteAddFields,
                  initial: {},
                  confirmLabel: 'Add site',
                })
              }
            >
              Add site
            </Button>
          ) : null}
        </Group>
      }
    >
      {register.isPending ? (
        <Stack>
          <Skeleton h={140} />
          <Skeleton h={140} />
        </Stack>
      ) : register.isError ? (
        <ErrorPanel error={register.error} onRetry={() => void register.refetch()} />
      ) : register.data.sites.length === 0 ? (
        <Text>The register is empty.</Text>
      ) : (
        <Stack gap="lg">
          {register.data.sites.map((site) => (
            <Paper key={site.id} p="md" component="section" aria-labelledby={`site-${site.id}`}>
              <Group gap="xs" mb="sm" justify="space-between">
                <Group gap="xs">
                  <Badge variant="outline" color="steel" ff="monospace">
                    {site.code}
                  </Badge>
                  <Title order={2} size="h4" id={`site-${site.id}`}>
                    {site.name}
                  </Title>
                </Group>
                {canEdit ? (
                  <Group gap={4}>
                    <Button
                      {...small}
                      leftSection={<IconPencil size={14} aria-hidden />}
                      aria-label={`Edit site ${site.code}`}
                      onClick={() =>
                        setForm({
                          title: `Edit site ${site.code}`,
                          kind: 'sites',
                          id: site.id,
                          fields: siteEditFields,
                          initial: { name: site.name },
                          confirmLabel: 'Save',
                        })
                      }
                    >
                      Edit
                    </Button>
                    <Button
                      {...small}
                      leftSection={<IconPlus size={14} aria-hidden />}
                      onClick={() =>
                        setForm({
                          title: `Add a machine at ${site.code}`,
                          kind: 'machines',
                          fields: machineFields,
                          initial: {},
                          fixed: { siteId: site.id },
                          confirmLabel: 'Add machine',
                        })
                      }
                    >
                      Add machine
                    </Button>
                  </Group>
                ) : null}
              </Group>
              <Stack gap="md">
                {site.machines.map((m) => (
                  <div key={m.id} data-machine={m.tag}>
                    <Group justify="space-between" gap="xs">
                      <Text fw={600} size="sm">
                        <Text span ff="monospace">
                          {m.tag}
                        </Text>{' '}
                        {m.name}{' '}
                        <Text span c="dimmed" size="xs">
                          ({m.kind.replace('-', ' ')})
                        </Text>
                      </Text>
                      {canEdit ? (
                        <Group gap={4}>
                          <Button
                            {...small}
                            aria-label={`Edit machine ${m.tag}`}
                            onClick={() =>
                              setForm({
                                title: `Edit machine ${m.tag}`,
                                kind: 'machines',
                                id: m.id,
                                fields: machineFields,
                                initial: { tag: m.tag, name: m.name, kind: m.kind },
                                confirmLabel: 'Save',
                              })
                            }
                          >
                            Edit
                          </Button>
                          <Button
                            {...small}
                            leftSection={<IconPlus size={14} aria-hidden />}
                            aria-label={`Add position to ${m.tag}`}
                            onClick={() =>
                              setForm({
                                title: `Add a brake position to ${m.tag}`,
                                kind: 'positions',
                                fields: positionFields,
                                initial: {},
                                fixed: { machineId: m.id },
                                confirmLabel: 'Add position',
                              })
                            }
                          >
                            Add position
                          </Button>
                        </Group>
                      ) : null}
                    </Group>
                    {m.positions.length === 0 ? (
                      <Text size="sm" pl="md">
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
                            <Table.Th w={120}>Position</Table.Th>
                            <Table.Th>Description</Table.Th>
                            <Table.Th w={120}>Motion</Table.Th>
                            <Table.Th w={300}>Approved sheets in force</Table.Th>
                            {canEdit ? <Table.Th w={60} aria-label="Actions" /> : null}
                          </Table.Tr>
                        </Table.Thead>
                        <Table.Tbody>
                          {m.positions.map((p) => (
                            <PositionRow
                              key={p.id}
                              position={p}
                              canRecord={canRecord}
                              canStart={canStart}
                              onEdit={
                                canEdit
                                  ? () =>
                                      setForm({
                                        title: `Edit brake position ${p.tag}`,
                                        kind: 'positions',
                                        id: p.id,
                                        fields: positionFields,
                                        initial: {
                                          tag: p.tag,
                                          description: p.description,
                                          motion: p.motion,
                                          brakeKind: p.brakeKind,
                                          thruster: p.thruster,
                                          lining: p.lining,
                                        },
                                        confirmLabel: 'Save',
                                      })
                                  : undefined
                              }
                            />
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
      {form ? <RegisterFormDialog opened onClose={() => setForm(null)} {...form} /> : null}
    </Page>
  );
}
