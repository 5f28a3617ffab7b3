import { memo } from 'react';
import { Alert, Button, Group, Text } from '@mantine/core';
import { IconFlask } from '@tabler/icons-react';

/**
 * Values that came from the example duty or a copied sheet and were never changed or confirmed.
 * They are marked beside each field; Send for check refuses until none is left.
 */
export const UnconfirmedNote = memo(function UnconfirmedNote({
  fields,
  onConfirmAll,
}: {
  fields: { key: string; label: string }[];
  onConfirmAll: (keys: string[]) => void;
}) {
  return (
    <Alert
      color="amber"
      variant="light"
      icon={<IconFlask size={18} />}
      title={`${fields.length} value${fields.length === 1 ? '' : 's'} not yet confirmed`}
      data-testid="unconfirmed-note"
    >
      <Text size="sm">
        These values came with the sheet (example duty or a copy) and are marked “not confirmed”
        beside the field. Enter this brake’s own value, or confirm that the value is right for it.
        The sheet cannot go to check while any is left.
      </Text>
      <Group gap="xs" mt="xs">
        <Button
          size="xs"
          variant="default"
          onClick={() => onConfirmAll(fields.map((f) => f.key))}
          title="Only when you have checked every marked value against this brake"
        >
          I have checked all {fields.length} against this brake
        </Button>
      </Group>
    </Alert>
  );
});
