import { SegmentedControl, Stack, Text } from '@mantine/core';

/** Only those who own sheets (engineers and checkers) have any of their own to pick out. */
export function OwnerFilter({
  mine,
  onChange,
}: {
  mine: boolean;
  onChange: (mine: boolean) => void;
}) {
  return (
    <Stack gap={2}>
      <Text size="sm" fw={500} id="owner-filter">
        Owner
      </Text>
      <SegmentedControl
        aria-labelledby="owner-filter"
        size="sm"
        value={mine ? 'me' : 'any'}
        onChange={(v) => onChange(v === 'me')}
        data={[
          { value: 'any', label: 'Anyone' },
          { value: 'me', label: 'Me' },
        ]}
      />
    </Stack>
  );
}
