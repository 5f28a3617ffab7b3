import { Badge, Group, Paper, Stack, Text, Textarea } from '@mantine/core';
import type { FieldTarget } from '@holdfast/shared';
import {
  acceptedRange,
  formatWithPrecision,
  readingPrecision,
  settingPrecision,
  toDisplay,
  toleranceText,
  withUnit,
  type Dimension,
  type InputValue,
  type ToleranceVerdict,
} from '@holdfast/calc';
import { UnitField } from '../../../components/calc/components/unit-field';
import { defaultUnit } from '../../../components/calc/utils/units';
import { asFoundVerdictFor, readSI, verdictFor, type MeasurementDraft } from './measurement-entry';

/** A field setting in its display unit, to the step a fitter can measure (calc's precision table). */
function settingText(target: FieldTarget, valueSI: number): string {
  const dim = target.dimension as Dimension;
  return toDisplay(valueSI, dim, 'SI', undefined, settingPrecision(target.settingKey, dim)).text;
}

/**
 * The values the tolerance accepts, where it has two sides: a fitter reads "1120 to 1170 N" more
 * surely than "± 5 %" of a target. Rounded inward to the reading's precision, as the card prints
 * them, so every value between the printed ends is judged in.
 */
function acceptedText(target: FieldTarget): string {
  const dim = target.dimension as Dimension;
  const range = acceptedRange(target.value, target.tolerance, target.settingKey, dim);
  return range ? `; accepted ${range.text}` : '';
}

/**
 * How far a reading lies from its target, to a tenth of the step the setting is set by (as the
 * reading itself prints): to the setting's own step, 0.3 mm off a 0.5 mm step would read +0.5 mm.
 * A deviation is a difference, so it is read from the verdict's offset-free display deviation
 * (°C and K differ by an offset).
 */
function deviationText(target: FieldTarget, verdict: ToleranceVerdict): string {
  const dim = target.dimension as Dimension;
  const { deviation, label } = verdict.display;
  const perSI = toDisplay(1, dim, 'SI').value - toDisplay(0, dim, 'SI').value;
  const p = readingPrecision(target.settingKey, dim);
  const size = formatWithPrecision(Math.abs(deviation), 1 / perSI, label, p);
  // A deviation too small to print reads ±0, never −0.
  const shownZero = !/[1-9]/.test(size);
  const sign = shownZero ? '±' : deviation > 0 ? '+' : '−';
  return withUnit(`${sign}${size}`, label);
}

function VerdictBadge({ target, value }: { target: FieldTarget; value: InputValue | undefined }) {
  const read = readSI(value, target.dimension);
  const verdict = verdictFor(target, read);
  if (!verdict) return null;
  return (
    <Badge color={verdict.status === 'in' ? 'pass' : 'fail'} size="lg">
      {verdict.status === 'in' ? 'In tolerance' : 'Out of tolerance'} (
      {deviationText(target, verdict)})
    </Badge>
  );
}

/**
 * An as-found reading of a setting that wear moves: judged against its in-service limit, in the
 * fitter's words ("Serviceable: 11.0 mm above the 5.0 mm minimum", "Below the 5.0 mm minimum:
 * re-adjust"; for a clearance that grows, "… below the 1.80 mm in-service maximum").
 */
function AsFoundBadge({ target, value }: { target: FieldTarget; value: InputValue | undefined }) {
  if (!target.inService) return <VerdictBadge target={target} value={value} />;
  const verdict = asFoundVerdictFor(target, readSI(value, target.dimension));
  if (!verdict) return null;
  const dim = target.dimension as Dimension;
  const limit = settingText(target, target.inService.value);
  const margin = toDisplay(
    Math.abs(verdict.deviationSI),
    dim,
    'SI',
    undefined,
    readingPrecision(target.settingKey, dim),
  ).text;
  // A reserve stroke wears down to its minimum; with no lift stop the clearance grows to a maximum.
  const least = target.inService.tolerance.band.kind === 'atLeast';
  const bound = least ? `${limit} minimum` : `${limit} in-service maximum`;
  return (
    <Badge color={verdict.status === 'in' ? 'pass' : 'fail'} size="lg">
      {verdict.status === 'in'
        ? `Serviceable: ${margin} ${least ? 'above' : 'below'} the ${bound}`
        : `${least ? 'Below' : 'Above'} the ${bound}: re-adjust`}
    </Badge>
  );
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
  // What is wrong with a value shows as it is typed, as in the sheet editor; the save adds none.
  const live = (v: InputValue | undefined) => {
    const read = readSI(v, target.dimension);
    return read.kind === 'invalid' ? read.message : undefined;
  };
  return (
    <Paper withBorder p="sm" radius="md" data-setting={key}>
      <Stack gap="xs">
        <div>
          <Text fw={600}>{target.label}</Text>
          <Text size="sm" c="dimmed">
            Target {settingText(target, target.value)}, tolerance{' '}
            {target.tolerance
              ? `${toleranceText(target.tolerance, dim, 'SI', key)} (${target.tolerance.source})${acceptedText(target)}`
              : 'none declared'}
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
              error={errors[`${key}.asFound`] ?? live(draft.asFound)}
              onChange={(v) => onChange({ ...draft, asFound: v })}
            />
            <Group>
              <AsFoundBadge target={target} value={draft.asFound} />
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
            error={errors[`${key}.asLeft`] ?? live(draft.asLeft)}
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
