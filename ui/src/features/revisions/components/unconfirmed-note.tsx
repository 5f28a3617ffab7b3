import { memo, useState } from 'react';
import {
  Alert,
  Button,
  Checkbox,
  Group,
  List,
  Modal,
  ScrollArea,
  Stack,
  Text,
} from '@mantine/core';
import { IconFlask } from '@tabler/icons-react';
import { DialogActions } from '../../../components/dialog-actions';

/**
 * Values that came from the example duty or a copied sheet and were never changed or confirmed.
 * They are marked beside each field; Send for check refuses until none is left. Confirming them
 * all at once asks first: the marks exist so that no example value reaches a signed sheet unread.
 */
export const UnconfirmedNote = memo(function UnconfirmedNote({
  fields,
  onConfirmAll,
}: {
  fields: { key: string; label: string }[];
  onConfirmAll: (keys: string[]) => void;
}) {
  const [asking, setAsking] = useState(false);
  const [checked, setChecked] = useState(false);
  const n = fields.length;
  const close = () => {
    setAsking(false);
    setChecked(false);
  };
  return (
    <Alert
      color="amber"
      variant="light"
      icon={<IconFlask size={18} />}
      title={`${n} value${n === 1 ? '' : 's'} not yet confirmed`}
      data-testid="unconfirmed-note"
    >
      <Text size="sm">
        These values came with the sheet (example duty or a copy) and are marked “not confirmed”
        beside the field. Enter this brake’s own value, or confirm that the value is right for it.
        The sheet cannot go to check while any is left.
      </Text>
      <Group gap="xs" mt="xs">
        <Button size="xs" variant="default" onClick={() => setAsking(true)}>
          I have checked all {n} against this brake
        </Button>
      </Group>
      <Modal opened={asking} onClose={close} title={`Confirm ${n} value${n === 1 ? '' : 's'}`}>
        <Stack gap="sm">
          <Text size="sm">
            Each of these came with the sheet, not from this brake. Confirm them only when you have
            compared every one with this brake’s data (nameplates, the maker’s data sheets, the
            duty); otherwise enter the brake’s own value in the field.
          </Text>
          <ScrollArea.Autosize mah={220} type="auto">
            <List size="sm" data-testid="unconfirmed-list">
              {fields.map((f) => (
                <List.Item key={f.key}>{f.label}</List.Item>
              ))}
            </List>
          </ScrollArea.Autosize>
          <Checkbox
            checked={checked}
            onChange={(e) => setChecked(e.currentTarget.checked)}
            label={`I have compared all ${n} with this brake’s data`}
          />
          <DialogActions
            onCancel={close}
            confirmLabel={`Confirm all ${n}`}
            confirmDisabled={!checked}
            onConfirm={() => {
              onConfirmAll(fields.map((f) => f.key));
              close();
            }}
          />
        </Stack>
      </Modal>
    </Alert>
  );
});
