import type { ReactNode } from 'react';
import { Checkbox, Group, NativeSelect, Text, TextInput } from '@mantine/core';
import type { FieldDefinition, InputValue } from '@holdfast/calc';
import { UnitField } from './unit-field';
import { SymbolText } from './symbol-text';
import { defaultUnit, type UnitSystem } from '../utils/units';

export interface FieldInputProps {
  field: FieldDefinition;
  value: InputValue | undefined;
  onChange: (key: string, value: InputValue) => void;
  unitSystem: UnitSystem;
  error?: string;
  readOnly?: boolean;
}

const PLAIN_NUMBER = /^\s*[-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?\s*$/;

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

/** One input of a sheet type, drawn by its kind: quantity, number, choice or flag. */
export function FieldInput({
  field,
  value,
  onChange,
  unitSystem,
  error,
  readOnly,
}: FieldInputProps) {
  const id = fieldDomId(field.key);
  const label: ReactNode = <FieldLabel field={field} />;
  const set = (v: InputValue) => onChange(field.key, v);

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
      />
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
    <TextInput
      id={id}
      label={label}
      description={field.help}
      error={error}
      readOnly={readOnly}
      inputMode={field.kind === 'integer' ? 'numeric' : 'decimal'}
      autoComplete="off"
      value={value === undefined || value === null ? '' : String(value)}
      onChange={(e) => {
        const t = e.currentTarget.value;
        set(PLAIN_NUMBER.test(t) ? Number(t) : t);
      }}
      styles={{ input: { fontVariantNumeric: 'tabular-nums' } }}
    />
  );
}
