import { Button, Group, List, Modal, Stack, Text, UnstyledButton } from '@mantine/core';
import { focusField } from '../../../components/calc/components/check-drivers-button';

/**
 * Send for check, refused: these values came with the sheet and nobody has entered or confirmed
 * them for this brake. Each name leads to its field.
 */
export function UnconfirmedDialog({
  fields,
  opened,
  onClose,
}: {
  fields: { key: string; label: string }[];
  opened: boolean;
  onClose: () => void;
}) {
  return (
    <Modal opened={opened} onClose={onClose} title="Not sent: values not yet confirmed" size="lg">
      <Stack gap="sm">
        <Text size="sm">
          {fields.length === 1 ? 'One value' : `${fields.length} values`} still hold what the sheet
          started with (the example duty or a copied sheet). Enter this brake’s own value or confirm
          each one, then send the sheet for check.
        </Text>
        <List size="sm" spacing={2} style={{ maxHeight: 320, overflowY: 'auto' }}>
          {fields.map((f) => (
            <List.Item key={f.key}>
              <UnstyledButton
                td="underline"
                fz="sm"
                onClick={() => {
                  onClose();
                  setTimeout(() => focusField(f.key), 50);
                }}
              >
                {f.label}
              </UnstyledButton>
            </List.Item>
          ))}
        </List>
        <Group justify="flex-end">
          <Button onClick={onClose}>Back to the inputs</Button>
        </Group>
      </Stack>
    </Modal>
  );
}
