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

/**
 * "Inputs that drive this": the inputs that move a check, each a link to the field. Until it is
 * first opened it is a plain button: every failing check carries one, and a popover per row
 * (floating position, portal, transition) made a key that fails many checks render hundreds of
 * components. Once opened, the popover takes the focus into its list and gives it back on close.
 */
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
  const [opened, setOpened] = useState(false);
  const open = () => {
    setDrivers(find(checkId));
    setOpened(true);
  };
  const button = (
    <Button
      size="compact-xs"
      variant="subtle"
      color="steel"
      leftSection={<IconTargetArrow size={14} aria-hidden />}
      aria-label={`Inputs that drive ${label}`}
      aria-expanded={opened}
      style={{ flexShrink: 0 }}
      onClick={() => (opened ? setOpened(false) : open())}
    >
      Inputs
    </Button>
  );
  if (drivers === null) return button;
  return (
    <Popover
      width={320}
      position="bottom-end"
      shadow="md"
      opened={opened}
      onChange={setOpened}
      trapFocus
      returnFocus
      withinPortal
    >
      <Popover.Target>{button}</Popover.Target>
      <Popover.Dropdown>
        <Text size="xs" c="dimmed" mb={6}>
          Inputs that move this check most (found by changing each input by 1 %):
        </Text>
        {drivers.length === 0 ? (
          <Text size="sm">No single input moves it.</Text>
        ) : (
          <Stack gap={2} component="ul" p={0} m={0} style={{ listStyle: 'none' }}>
            {drivers.map((d) => {
              const Icon = d.effect > 0 ? IconArrowUpRight : IconArrowDownRight;
              return (
                <li key={d.key}>
                  <UnstyledButton
                    onClick={() => {
                      setOpened(false);
                      focusField(d.key);
                    }}
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
