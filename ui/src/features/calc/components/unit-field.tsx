import { useEffect, useId, useState, type ReactNode } from 'react';
import { NativeSelect, TextInput } from '@mantine/core';
import { parseQuantityText, type Dimension, type InputValue } from '@holdfast/calc';
import { convertQuantity, isQuantity, unitChoices } from '../utils/units';

export interface UnitFieldProps {
  label: ReactNode;
  /** Plain-text name for the unit picker's accessible label. */
  name: string;
  dimension: Dimension;
  value: InputValue | undefined;
  /** Emits a quantity when the text is a number (optionally with a unit), else the raw text. */
  onChange: (value: InputValue) => void;
  /** Unit used when the field has no value yet. */
  fallbackUnit: string;
  error?: ReactNode;
  description?: ReactNode;
  readOnly?: boolean;
  id?: string;
  rightLabel?: ReactNode;
}

const PLAIN_NUMBER = /^\s*[-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?\s*$/;

function textOf(value: InputValue | undefined): string {
  if (isQuantity(value)) return String(value.value);
  if (value === undefined || value === null) return '';
  return String(value);
}

/** Finds the offered unit that typed text names ('kn' does not match 'kN': units are case-sensitive). */
function matchUnit(dimension: Dimension, typed: string): string | undefined {
  const t = typed.trim().replace(/\s+/g, ' ');
  const choices = unitChoices(dimension);
  const hit = choices.find((c) => c.value === t || c.label === t);
  if (hit) return hit.value;
  // Accept the forms people type: 'Nm', 'N.m', 'N*m' for 'N m'.
  const squashed = t.replace(/[·.*\s-]/g, '');
  return choices.find(
    (c) => c.value.replace(/[\s^]/g, '') === squashed || c.label.replace(/[·\s]/g, '') === squashed,
  )?.value;
}

/**
 * A number with its unit: type a value (or a value and a unit, "12 kN"), or pick a unit from the
 * list. Picking a unit converts the value so the physical quantity stays the same. Text that is
 * not a number is kept as typed and handed on, so the calc core names the problem on this field.
 */
export function UnitField(props: UnitFieldProps) {
  const { dimension, value, onChange, fallbackUnit, readOnly } = props;
  const autoId = useId();
  const id = props.id ?? autoId;
  const [localUnit, setLocalUnit] = useState(fallbackUnit);
  const unit = isQuantity(value) ? value.unit : localUnit;
  const [text, setText] = useState(() => textOf(value));

  // Follow changes made outside this field (reload, unit-system switch) without fighting typing.
  useEffect(() => {
    const external = textOf(value);
    setText((current) => (sameNumber(current, external) ? current : external));
  }, [value]);

  const choices = unitChoices(dimension);
  const knownUnit = choices.some((c) => c.value === unit);
  const data = knownUnit ? choices : [{ value: unit, label: unit }, ...choices];

  function handleText(next: string) {
    setText(next);
    if (PLAIN_NUMBER.test(next)) {
      onChange({ value: Number(next), unit });
      return;
    }
    try {
      const typed = parseQuantityText(next);
      const matched = typed.unit ? matchUnit(dimension, typed.unit) : undefined;
      if (matched) {
        setText(String(typed.value));
        onChange({ value: typed.value, unit: matched });
        return;
      }
    } catch {
      // Not a number with a unit: keep the text so nothing typed is lost.
    }
    onChange(next.trim() === '' ? '' : next);
  }

  function handleUnit(nextUnit: string) {
    if (isQuantity(value)) {
      const converted = convertQuantity(value, nextUnit, dimension);
      onChange(converted ?? { value: value.value, unit: nextUnit });
    } else {
      setLocalUnit(nextUnit);
      if (PLAIN_NUMBER.test(text)) onChange({ value: Number(text), unit: nextUnit });
    }
  }

  const picker = (
    <NativeSelect
      aria-label={`${props.name} unit`}
      data={data}
      value={unit}
      disabled={readOnly}
      onChange={(e) => handleUnit(e.currentTarget.value)}
      variant="unstyled"
      size="xs"
      styles={{
        input: { fontWeight: 500, paddingInlineStart: 6, paddingInlineEnd: 18, textAlign: 'right' },
      }}
    />
  );

  return (
    <TextInput
      id={id}
      label={props.label}
      description={props.description}
      error={props.error}
      value={text}
      readOnly={readOnly}
      inputMode="decimal"
      autoComplete="off"
      spellCheck={false}
      onChange={(e) => handleText(e.currentTarget.value)}
      rightSection={picker}
      rightSectionWidth={96}
      rightSectionPointerEvents="all"
      styles={{ input: { fontVariantNumeric: 'tabular-nums' } }}
    />
  );
}

function sameNumber(a: string, b: string): boolean {
  if (a === b) return true;
  return PLAIN_NUMBER.test(a) && PLAIN_NUMBER.test(b) && Number(a) === Number(b);
}
