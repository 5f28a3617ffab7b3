import { Badge, Group, Paper, Stack, Text, Textarea } from '@mantine/core';
import type { FieldTarget } from '@holdfast/shared';
import type { Dimension, InputValue } from '@holdfast/calc';
import { UnitField } from '../../../components/calc/components/unit-field';
import { defaultUnit, presentSI } from '../../../components/calc/utils/units';
import { readSI, verdictFor, type MeasurementDraft } from './measurement-entry';

function VerdictBadge({ target, value }: { target: FieldTarget; value: InputValue | undefined }) {
  const read = readSI(value, target.dimension);
  const verdict = verdictFor(target, read);
  if (!verdict) return null;
  const dev = verdict.display.deviation;
  const sign = dev > 0 ? '+' : dev < 0 ? '−' : '±';
  const text = `${sign}${Math.abs(Number(dev.toPrecision(3)))} ${verdict.display.label}`;
  return (
    <Badge color={verdict.status === 'in' ? 'pass' : 'fail'} size="lg">
      {verdict.status === 'in' ? 'In tolerance' : 'Out of tolerance'} ({text})
    </Badge>
  );
}

function toleranceText(target: FieldTarget): string {
  const t = target.tolerance;
  if (!t) return 'no tolerance declared';
  const dim = target.dimension as Dimension;
  const show = (si: number) => presentSI(si, dim, 'SI').text;
  switch (t.band.kind) {
    case 'absolute':
      return `−${show(t.band.minus)} / +${show(t.band.plus)}`;
    case 'relative':
      return `−${(t.band.minus * 100).toFixed(1)} % / +${(t.band.plus * 100).toFixed(1)} %`;
    case 'atLeast':
      return 'at least the target';
    case 'atMost':
      return 'at most the target';
  }
}

export interface MeasurementRowProps {
  target: FieldTarget;
  draft: MeasurementDraft;
  /** Inspections record the value found before any adjustment. */
  withAsFound: boolean;
  errors: Record<string, string>;
  onChange: (next: MeasurementDraft) => void;
}

/** One field-card value: the target with its tolerance, the values measured, the verdict at once. */
export function MeasurementRow({
  target,
  draft,
  withAsFound,
  errors,
  onChange,
}: MeasurementRowProps) {
  const dim = target.dimension as Dimension;
  const unit = defaultUnit(dim, 'SI');
  const left = verdictFor(target, readSI(draft.asLeft, target.dimension));
  const key = target.settingKey;
  return (
    <Paper withBorder p="sm" radius="md" data-setting={key}>
      <Stack gap="xs">
        <div>
          <Text fw={600}>{target.label}</Text>
          <Text size="sm" c="dimmed">
            Target {presentSI(target.value, dim, 'SI').text}, tolerance {toleranceText(target)}
            {target.tolerance ? ` (${target.tolerance.source})` : ''}
          </Text>
          {target.tolerance?.rule && <Text size="sm">{target.tolerance.rule}</Text>}
        </div>
        {withAsFound && (
          <Stack gap={4}>
            <UnitField
              label="As found"
              name={`${target.label} as found`}
              dimension={dim}
              value={draft.asFound}
              fallbackUnit={unit}
              error={errors[`${key}.asFound`]}
              onChange={(v) => onChange({ ...draft, asFound: v })}
            />
            <Group>
              <VerdictBadge target={target} value={draft.asFound} />
            </Group>
          </Stack>
        )}
        <Stack gap={4}>
          <UnitField
            label={withAsFound ? 'As left' : 'Measured'}
            name={`${target.label} ${withAsFound ? 'as left' : 'measured'}`}
            dimension={dim}
            value={draft.asLeft}
            fallbackUnit={unit}
            error={errors[`${key}.asLeft`]}
            onChange={(v) => onChange({ ...draft, asLeft: v })}
          />
          <Group>
            <VerdictBadge target={target} value={draft.asLeft} />
          </Group>
        </Stack>
        {left?.status === 'out' && (
          <Textarea
            label="Why it is left out of tolerance"
            required
            autosize
            minRows={2}
            value={draft.reason}
            error={errors[`${key}.reason`]}
            onChange={(e) => onChange({ ...draft, reason: e.currentTarget.value })}
          />
        )}
      </Stack>
    </Paper>
  );
}
