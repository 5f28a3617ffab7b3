import { memo, type ReactNode } from 'react';
import { Group, Paper, SegmentedControl, Text, TextInput } from '@mantine/core';
import type { UnitSystem } from '../../../components/calc/utils/units';
import type { SaveStatus } from '../hooks/use-draft-autosave';
import { SaveStatusText } from './save-status';

export interface WorkbenchBarProps {
  unitSystem: UnitSystem;
  onUnitSystem: (system: UnitSystem) => void;
  /** Save state; omitted on a revision that cannot be edited. */
  save?: { status: SaveStatus; lastSavedAt: Date | null; heldBack: number };
  errorMessage: string | null;
  actions: ReactNode;
}

/** Units, save state and the revision's actions. Memoised: typing does not render it again. */
export const WorkbenchBar = memo(function WorkbenchBar(props: WorkbenchBarProps) {
  const { save } = props;
  return (
    <Paper p="sm">
      <Group justify="space-between" gap="sm" wrap="wrap">
        <Group gap="md" wrap="wrap">
          <SegmentedControl
            size="xs"
            aria-label="Units for this sheet"
            value={props.unitSystem}
            onChange={(v) => props.onUnitSystem(v as UnitSystem)}
            data={[
              { value: 'SI', label: 'SI units' },
              { value: 'US', label: 'US customary' },
            ]}
          />
          {save ? (
            <SaveStatusText
              status={save.status}
              lastSavedAt={save.lastSavedAt}
              heldBack={save.heldBack}
            />
          ) : null}
        </Group>
        {props.actions}
      </Group>
      {save?.status === 'error' && props.errorMessage ? (
        <Text size="xs" c="fail.8" mt={6} role="alert">
          {props.errorMessage}
        </Text>
      ) : null}
    </Paper>
  );
});

/** The change note of the revision, memoised apart from the inputs. */
export const ChangeNoteField = memo(function ChangeNoteField({
  value,
  readOnly,
  onChange,
}: {
  value: string;
  readOnly: boolean;
  onChange: (note: string) => void;
}) {
  return (
    <Paper p="md">
      <TextInput
        label="Change note"
        description="What this revision changes and why; printed in the revision history."
        value={value}
        readOnly={readOnly}
        onChange={(e) => onChange(e.currentTarget.value)}
        maxLength={2000}
      />
    </Paper>
  );
});
