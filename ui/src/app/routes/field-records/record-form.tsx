import { useState } from 'react';
import { useParams } from 'react-router-dom';
import {
  Alert,
  Button,
  Group,
  NativeSelect,
  Skeleton,
  Stack,
  Text,
  TextInput,
  Textarea,
  Title,
} from '@mantine/core';
import {
  fieldRecordKindLabels,
  fieldRecordKinds,
  type CreateFieldRecordInput,
  type FieldCheckInput,
  type FieldRecordKind,
  type FieldForm,
} from '@holdfast/shared';
import type { InputValue } from '@holdfast/calc';
import { Page } from '../../../components/layouts/page';
import { NumberField } from '../../../components/calc/components/unit-field';
import { ErrorPanel } from '../../../components/errors/error-panel';
import type { RouteHandle } from '../../../lib/route-handle';
import { errorMessage } from '../../../lib/api-client';
import { useFieldForm } from '../../../features/field-records/api/get-field-form';
import { useSignFieldRecord } from '../../../features/field-records/api/sign-field-record';
import { useOutbox } from '../../../features/field-records/offline/use-outbox';
import { OutboxStatus } from '../../../features/field-records/components/outbox-status';
import { MeasurementRow } from '../../../features/field-records/components/measurement-row';
import {
  CheckItems,
  type CheckDraft,
} from '../../../features/field-records/components/check-items';
import { refusedFieldErrors } from '../../../features/field-records/components/refused-fields';
import {
  buildMeasurements,
  readSI,
  type MeasurementDraft,
} from '../../../features/field-records/components/measurement-entry';
import classes from './record-form.module.css';

export const handle: RouteHandle = { title: 'Field record', caution: true };

function localNow(): string {
  const d = new Date();
  d.setSeconds(0, 0);
  return new Date(d.getTime() - d.getTimezoneOffset() * 60000).toISOString().slice(0, 16);
}

/** The hour meter as typed: null when left empty, undefined when it is not a number ≥ 0. */
function readHours(value: InputValue | undefined): number | null | undefined {
  if (value === undefined || value === '') return null;
  return typeof value === 'number' && Number.isFinite(value) && value >= 0 ? value : undefined;
}

/** A count as typed: null when left empty, undefined when it is not a whole number 0-1000. */
function readCount(value: InputValue | undefined): number | null | undefined {
  if (value === undefined || value === '') return null;
  return typeof value === 'number' && Number.isInteger(value) && value >= 0 && value <= 1000
    ? value
    : undefined;
}

function buildChecks(form: FieldForm, drafts: Record<string, CheckDraft>) {
  const checks: FieldCheckInput[] = [];
  const errors: Record<string, string> = {};
  for (const c of form.checks) {
    const d = drafts[c.key];
    if (!d?.result) {
      errors[`checks.${c.key}`] = 'Answer this check';
      continue;
    }
    const v = c.hasValue ? readSI(d.value, 'length') : { kind: 'empty' as const };
    if (v.kind === 'invalid') errors[`checks.${c.key}.value`] = 'Enter a number';
    const cycles = readCount(d.cycles);
    if (cycles === undefined) errors[`checks.${c.key}.cycles`] = 'Enter a whole number, 0 to 1000';
    checks.push({
      key: c.key,
      result: d.result,
      value: v.kind === 'value' ? v.si : null,
      cycles: cycles ?? null,
      note: '',
    });
  }
  return { checks, errors };
}

function RecordForm({ form }: { form: FieldForm }) {
  const outbox = useOutbox();
  const sign = useSignFieldRecord();
  const [id, setId] = useState(() => crypto.randomUUID());
  const [kind, setKind] = useState<FieldRecordKind>('periodic-inspection');
  const [performedAt, setPerformedAt] = useState(localNow);
  const [drafts, setDrafts] = useState<Record<string, MeasurementDraft>>({});
  const [checks, setChecks] = useState<Record<string, CheckDraft>>({});
  const [findings, setFindings] = useState('');
  const [meterHours, setMeterHours] = useState<InputValue | undefined>(undefined);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const entry = outbox.entries.find((e) => e.id === id);
  // A record the server refused shows its reasons under the boxes, beside the form's own checks.
  const shown =
    entry?.state === 'refused'
      ? { ...refusedFieldErrors(entry.payload, entry.fields ?? []), ...errors }
      : errors;
  const measured = form.targets.filter((t) => t.tolerance !== null);
  const withAsFound = kind !== 'commissioning';

  async function save() {
    const m = buildMeasurements(measured, drafts);
    const c = buildChecks(form, checks);
    const all = { ...m.errors, ...c.errors };
    const when = new Date(performedAt);
    if (Number.isNaN(when.getTime())) all.performedAt = 'Enter the date and time of the work';
    const hours = readHours(meterHours);
    if (hours === undefined) all.meterHours = 'Enter the hours as a number, 0 or more';
    setErrors(all);
    if (Object.keys(all).length > 0 || !form.positionId) return;
    const payload: CreateFieldRecordInput = {
      id,
      positionId: form.positionId,
      revisionId: form.revisionId,
      kind,
      performedAt: when.toISOString(),
      meterHours: hours ?? null,
      measurements: m.measurements,
      checks: c.checks,
      findings: findings.trim(),
    };
    await outbox.save(payload);
  }

  function startAnother() {
    setId(crypto.randomUUID());
    setDrafts({});
    setChecks({});
    setFindings('');
    setMeterHours(undefined);
    setErrors({});
  }

  return (
    <Stack className={classes.form} gap="md">
      <Text>
        {form.documentNumber} rev. {form.revisionLabel}
      </Text>
      {!form.positionId && (
        <Alert color="red" title="No brake position">
          This revision is not set to a brake position in the register, so no record can be made
          against it.
        </Alert>
      )}
      <NativeSelect
        label="Work done"
        data={fieldRecordKinds.map((k) => ({ value: k, label: fieldRecordKindLabels[k] }))}
        value={kind}
        onChange={(e) => setKind(e.currentTarget.value as FieldRecordKind)}
      />
      <TextInput
        type="datetime-local"
        label="Done at"
        value={performedAt}
        error={shown.performedAt}
        onChange={(e) => setPerformedAt(e.currentTarget.value)}
      />
      <NumberField
        id="meter-hours"
        label="Hour meter"
        description="The machine's hour meter reading, where it has one (hour-based intervals count from it)"
        value={meterHours}
        error={shown.meterHours}
        onChange={setMeterHours}
      />
      <Title order={3}>Settings measured</Title>
      {measured.map((t) => (
        <MeasurementRow
          key={t.settingKey}
          target={t}
          withAsFound={withAsFound}
          draft={drafts[t.settingKey] ?? { reason: '' }}
          errors={shown}
          onChange={(next) => setDrafts((d) => ({ ...d, [t.settingKey]: next }))}
        />
      ))}
      <Title order={3}>Checks</Title>
      <CheckItems
        checks={form.checks}
        drafts={checks}
        errors={shown}
        onChange={(key, next) => setChecks((c) => ({ ...c, [key]: next }))}
      />
      <Textarea
        label="Findings"
        autosize
        minRows={3}
        value={findings}
        error={shown.findings}
        onChange={(e) => setFindings(e.currentTarget.value)}
      />
      {Object.keys(errors).length > 0 && (
        <Text c="fail.8" role="alert">
          Some entries need attention before the record can be saved.
        </Text>
      )}
      {entry && <OutboxStatus entry={entry} online={outbox.online} />}
      <Group grow>
        {entry?.state !== 'sent' && (
          <Button size="lg" onClick={() => void save()}>
            Save record
          </Button>
        )}
        {entry?.state === 'sent' && (
          <Button
            size="lg"
            loading={sign.isPending}
            disabled={!outbox.online || sign.isSuccess}
            onClick={() => sign.mutate({ id })}
          >
            {sign.isSuccess ? 'Signed' : 'Sign the record'}
          </Button>
        )}
        {entry?.state === 'sent' && (
          <Button size="lg" variant="default" onClick={startAnother}>
            Start another record
          </Button>
        )}
      </Group>
      {sign.isError && <Text c="fail.8">{errorMessage(sign.error)}</Text>}
    </Stack>
  );
}

export function Component() {
  const { revisionId = '' } = useParams();
  const query = useFieldForm(revisionId);
  return (
    <Page title="Field record">
      {query.isPending && <Skeleton h={320} />}
      {query.isError && <ErrorPanel error={query.error} />}
      {query.data && <RecordForm form={query.data} />}
    </Page>
  );
}
