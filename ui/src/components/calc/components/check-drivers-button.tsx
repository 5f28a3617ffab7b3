import { memo, useState } from 'react';
import { Button, Popover, Stack, Text, UnstyledButton } from '@mantine/core';
import { IconArrowDownRight, IconArrowUpRight, IconTargetArrow } from '@tabler/icons-react';
import type { CheckDriver } from '@holdfast/calc';
import { fieldDomId } from './field-input';

/** Scrolls an input into view and puts the cursor in it. */
export function focusField(key: string): void {
  const el = document.getElementById(fieldDomId(key));
  if (!el) return;
  el.scrollIntoView({ block: 'center', behavior: 'smooth' });
  el.focus({ preventScroll: true });
}

/** "Inputs that drive this": the inputs that move a check, each a link to the field. */
export const CheckDriversButton = memo(function CheckDriversButton({
  label,
  checkId,
  find,
}: {
  label: string;
  checkId: string;
  /** Ranks the drivers of a check; called when the list is opened, never per key. */
  find: (checkId: string) => CheckDriver[];
}) {
  const [drivers, setDrivers] = useState<CheckDriver[] | null>(null);
  return (
    <Popover
      width={320}
      position="bottom-end"
      shadow="md"
      onOpen={() => setDrivers(find(checkId))}
      withinPortal
    >
      <Popover.Target>
        <Button
          size="compact-xs"
          variant="subtle"
          color="steel"
          leftSection={<IconTargetArrow size={14} aria-hidden />}
          aria-label={`Inputs that drive ${label}`}
          style={{ flexShrink: 0 }}
        >
          Inputs
        </Button>
      </Popover.Target>
      <Popover.Dropdown>
        <Text size="xs" c="dimmed" mb={6}>
          Inputs that move this check most (found by changing each input by 1 %):
        </Text>
        {drivers && drivers.length === 0 ? (
          <Text size="sm">No single input moves it.</Text>
        ) : (
          <Stack gap={2} component="ul" p={0} m={0} style={{ listStyle: 'none' }}>
            {(drivers ?? []).map((d) => {
              const Icon = d.effect > 0 ? IconArrowUpRight : IconArrowDownRight;
              return (
                <li key={d.key}>
                  <UnstyledButton
                    onClick={() => focusField(d.key)}
                    data-driver={d.key}
                    style={{ display: 'flex', gap: 6, alignItems: 'center', width: '100%' }}
                  >
                    <Icon size={14} aria-hidden />
                    <Text size="sm" td="underline" style={{ flex: 1 }}>
                      {d.label}
                    </Text>
                    <Text size="xs" c="dimmed" ff="monospace">
                      {d.effect > 0 ? 'raises' : 'lowers'} use
                    </Text>
                  </UnstyledButton>
                </li>
              );
            })}
          </Stack>
        )}
      </Popover.Dropdown>
    </Popover>
  );
});
