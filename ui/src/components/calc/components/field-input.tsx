import { memo, useCallback, type ReactNode } from 'react';
import { Checkbox, Group, NativeSelect, Radio, Stack, Text } from '@mantine/core';
import type { FieldDefinition, InputValue } from '@holdfast/calc';
import { NumberField, UnitField } from './unit-field';
import { SymbolText } from './symbol-text';
import { examplePlaceholder } from '../utils/field-start';
import { defaultUnit, type UnitSystem } from '../utils/units';

export interface FieldInputProps {
  field: FieldDefinition;
  value: InputValue | undefined;
  onChange: (key: string, value: InputValue) => void;
  unitSystem: UnitSystem;
  error?: string;
  readOnly?: boolean;
}

/** Up to this many choices are shown as radio buttons, more as a select box. */
const RADIO_CHOICES = 3;

export function fieldDomId(key: string): string {
  return `field-${key}`;
}

function FieldLabel({ field }: { field: FieldDefinition }) {
  return (
    <Group gap={6} wrap="nowrap" component="span">
      <span>{field.label}</span>
      {field.symbol ? (
        <Text span ff="monospace" size="xs" c="dimmed">
          <SymbolText symbol={field.symbol} />
        </Text>
      ) : null}
    </Group>
  );
}

/**
 * One input of a sheet type, drawn by its kind: quantity, number, choice or flag. Memoised: a
 * keystroke in one field renders that field alone (its props stay equal for the others).
 */
export const FieldInput = memo(function FieldInput({
  field,
  value,
  onChange,
  unitSystem,
  error,
  readOnly,
}: FieldInputProps) {
  const id = fieldDomId(field.key);
  const label: ReactNode = <FieldLabel field={field} />;
  const key = field.key;
  const set = useCallback((v: InputValue) => onChange(key, v), [onChange, key]);

  if (field.kind === 'quantity' && field.dimension) {
    const fallback =
      (unitSystem === 'US' ? field.unitUS : field.unitSI) ??
      defaultUnit(field.dimension, unitSystem);
    return (
      <UnitField
        id={id}
        label={label}
        name={field.label}
        dimension={field.dimension}
        value={value}
        onChange={set}
        fallbackUnit={fallback}
        error={error}
        description={field.help}
        readOnly={readOnly}
        placeholder={readOnly ? undefined : examplePlaceholder(field)}
      />
    );
  }
  if (field.kind === 'choice' && (field.choices?.length ?? 0) <= RADIO_CHOICES) {
    // A few choices written out in words: all in view, each label wrapping as it needs (a select
    // box cuts its chosen text to the box's width).
    const chosen = typeof value === 'string' ? value : String(value ?? '');
    const focusable = field.choices!.some((c) => c.value === chosen)
      ? chosen
      : field.choices![0]!.value;
    return (
      <Radio.Group
        label={label}
        description={field.help}
        error={error}
        value={chosen}
        onChange={set}
        data-choice={field.key}
      >
        <Stack gap={6} mt={6}>
          {field.choices!.map((c) => (
            <Radio
              key={c.value}
              id={c.value === focusable ? id : undefined}
              value={c.value}
              label={c.label}
              disabled={readOnly}
            />
          ))}
        </Stack>
      </Radio.Group>
    );
  }
  if (field.kind === 'choice') {
    return (
      <NativeSelect
        id={id}
        label={label}
        description={field.help}
        error={error}
        disabled={readOnly}
        data={field.choices ?? []}
        value={typeof value === 'string' ? value : String(value ?? '')}
        onChange={(e) => set(e.currentTarget.value)}
      />
    );
  }
  if (field.kind === 'boolean') {
    return (
      <Checkbox
        id={id}
        mt="lg"
        label={label}
        description={field.help}
        error={error}
        disabled={readOnly}
        checked={value === true}
        onChange={(e) => set(e.currentTarget.checked)}
      />
    );
  }
  return (
    <NumberField
      id={id}
      label={label}
      description={field.help}
      error={error}
      readOnly={readOnly}
      integer={field.kind === 'integer'}
      value={value}
      onChange={set}
      placeholder={readOnly ? undefined : examplePlaceholder(field)}
    />
  );
});
