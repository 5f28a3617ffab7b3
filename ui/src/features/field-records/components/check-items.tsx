import { Paper, SegmentedControl, Stack, Text } from '@mantine/core';
import type { FieldCheckKey, FieldCheckResult, FieldForm } from '@holdfast/shared';
import type { InputValue } from '@holdfast/calc';
import { NumberField, UnitField } from '../../../components/calc/components/unit-field';

export interface CheckDraft {
  result: FieldCheckResult | null;
  value?: InputValue;
  /** How many set/release cycles were run before re-measuring (that check only). */
  cycles?: InputValue;
}

/** The check that counts set/release cycles. */
export const CYCLES_CHECK = 'set-release-cycles' satisfies FieldCheckKey;

const RESULTS = [
  { value: 'ok', label: 'OK' },
  { value: 'not-ok', label: 'Not OK' },
  { value: 'not-applicable', label: 'N/A' },
];

/** The checks a fitter does on every visit, each answered explicitly. */
export function CheckItems(props: {
  checks: FieldForm['checks'];
  drafts: Record<string, CheckDraft>;
  errors: Record<string, string>;
  onChange: (key: string, next: CheckDraft) => void;
}) {
  return (
    <Stack gap="sm">
      {props.checks.map((c) => {
        const d = props.drafts[c.key] ?? { result: null };
        const error = props.errors[`checks.${c.key}`];
        return (
          <Paper withBorder p="sm" radius="md" key={c.key}>
            <Stack gap="xs">
              <Text fw={600} id={`check-${c.key}`}>
                {c.label}
              </Text>
              <SegmentedControl
                fullWidth
                size="md"
                aria-labelledby={`check-${c.key}`}
                data={RESULTS}
                value={d.result ?? ''}
                onChange={(v) => props.onChange(c.key, { ...d, result: v as FieldCheckResult })}
              />
              {error && (
                <Text size="sm" c="fail.8">
                  {error}
                </Text>
              )}
              {c.key === CYCLES_CHECK && (
                <NumberField
                  id={`check-${c.key}-cycles`}
                  label="Cycles run"
                  integer
                  value={d.cycles}
                  error={props.errors[`checks.${c.key}.cycles`]}
                  onChange={(v) => props.onChange(c.key, { ...d, cycles: v })}
                />
              )}
              {c.hasValue && (
                <UnitField
                  label="Thickness measured"
                  name={`${c.label} thickness`}
                  dimension="length"
                  value={d.value}
                  fallbackUnit="mm"
                  error={props.errors[`checks.${c.key}.value`]}
                  onChange={(v) => props.onChange(c.key, { ...d, value: v })}
                />
              )}
            </Stack>
          </Paper>
        );
      })}
    </Stack>
  );
}
