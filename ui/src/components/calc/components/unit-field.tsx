import { memo, useEffect, useId, useState, type ReactNode } from 'react';
import { NativeSelect, TextInput } from '@mantine/core';
import type { Dimension, InputValue } from '@holdfast/calc';
import { useNumberFormat } from '../hooks/use-number-format';
import { readNumber, sameNumberText, writeNumber, type NumberFormat } from '../utils/number-entry';
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
  placeholder?: string;
}

function textOf(value: InputValue | undefined, format: NumberFormat): string {
  if (isQuantity(value)) return writeNumber(value.value, format);
  if (value === undefined || value === null) return '';
  if (typeof value === 'number') return writeNumber(value, format);
  return String(value);
}

/** Finds the offered unit that typed text names ('kn' does not match 'kN': units are case-sensitive). */
export function matchUnit(dimension: Dimension, typed: string): string | undefined {
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
 * The text a field shows: what the user typed, kept exactly while it means the same number as
 * the value, and replaced only when the value changes from outside (a reload, a unit switch).
 */
export function useTypedText(value: InputValue | undefined, format: NumberFormat) {
  const [text, setText] = useState(() => textOf(value, format));
  useEffect(() => {
    const external = textOf(value, format);
    setText((current) => (sameNumberText(current, external, format) ? current : external));
  }, [value, format]);
  return [text, setText] as const;
}

/**
 * A number with its unit: type a value (or a value and a unit, "12 kN"), or pick a unit from the
 * list. Picking a unit converts the value so the physical quantity stays the same. Text that is
 * not a number is kept as typed and handed on, so the field's message names the problem.
 */
export const UnitField = memo(function UnitField(props: UnitFieldProps) {
  const { dimension, value, onChange, fallbackUnit, readOnly } = props;
  const format = useNumberFormat();
  const autoId = useId();
  const id = props.id ?? autoId;
  const [localUnit, setLocalUnit] = useState(fallbackUnit);
  const unit = isQuantity(value) ? value.unit : localUnit;
  const [text, setText] = useTypedText(value, format);

  const choices = unitChoices(dimension);
  const knownUnit = choices.some((c) => c.value === unit);
  const data = knownUnit ? choices : [{ value: unit, label: unit }, ...choices];
  // Room for the longest unit this field offers, so a chosen unit is never cut off.
  const longestUnit = data.reduce((n, c) => Math.max(n, c.label.length), 0);
  const pickerWidth = `max(96px, calc(${longestUnit}ch + 30px))`;

  function handleText(next: string) {
    setText(next);
    const entry = readNumber(next, format);
    if (entry.kind === 'number' && entry.unitText === '') {
      onChange({ value: entry.value, unit });
      return;
    }
    if (entry.kind === 'number') {
      const matched = matchUnit(dimension, entry.unitText);
      if (matched) {
        setLocalUnit(matched);
        onChange({ value: entry.value, unit: matched });
        return;
      }
    }
    // Not (yet) a number with a unit: keep the text so nothing typed is lost.
    onChange(next.trim() === '' ? '' : next);
  }

  function handleUnit(nextUnit: string) {
    setLocalUnit(nextUnit);
    if (isQuantity(value)) {
      const converted = convertQuantity(value, nextUnit, dimension);
      onChange(converted ?? { value: value.value, unit: nextUnit });
    } else {
      const entry = readNumber(text, format);
      if (entry.kind === 'number' && entry.unitText === '')
        onChange({ value: entry.value, unit: nextUnit });
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
      // Its own chevron section, sized here: otherwise it inherits the text input's right-section
      // width (the whole picker) and centres the chevron over the unit's name.
      rightSectionWidth={18}
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
      rightSectionWidth={pickerWidth}
      rightSectionPointerEvents="all"
      styles={{ input: { fontVariantNumeric: 'tabular-nums' } }}
      placeholder={props.placeholder}
    />
  );
});

export interface NumberFieldProps {
  id: string;
  label: ReactNode;
  value: InputValue | undefined;
  onChange: (value: InputValue) => void;
  integer?: boolean;
  error?: ReactNode;
  description?: ReactNode;
  readOnly?: boolean;
  placeholder?: string;
}

/**
 * A plain number (ratio, efficiency, count). Its text is its own: typing "2." keeps the point,
 * so "2.5" typed key by key is 2.5 and never 25.
 */
export const NumberField = memo(function NumberField(props: NumberFieldProps) {
  const { value, onChange, readOnly } = props;
  const format = useNumberFormat();
  const [text, setText] = useTypedText(value, format);
  return (
    <TextInput
      id={props.id}
      label={props.label}
      description={props.description}
      error={props.error}
      readOnly={readOnly}
      inputMode={props.integer ? 'numeric' : 'decimal'}
      autoComplete="off"
      spellCheck={false}
      value={text}
      onChange={(e) => {
        const next = e.currentTarget.value;
        setText(next);
        const entry = readNumber(next, format);
        onChange(
          entry.kind === 'number' && entry.unitText === ''
            ? entry.value
            : next.trim() === ''
              ? ''
              : next,
        );
      }}
      styles={{ input: { fontVariantNumeric: 'tabular-nums' } }}
      placeholder={props.placeholder}
    />
  );
});
