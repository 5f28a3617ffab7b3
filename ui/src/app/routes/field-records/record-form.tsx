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
import { PhotoPicker } from '../../../features/field-records/components/photo-picker';
import {
  waitingPhotos,
  type OutboxPhoto,
} from '../../../features/field-records/offline/outbox-store';
import { refusedFieldErrors } from '../../../features/field-records/components/refused-fields';
import {
  buildMeasurements,
  type MeasurementDraft,
} from '../../../features/field-records/components/measurement-entry';
import { buildChecks, readHours } from './record-entry';
import classes from './record-form.module.css';

export const handle: RouteHandle = { title: 'Field record', caution: true };

function localNow(): string {
  const d = new Date();
  d.setSeconds(0, 0);
  return new Date(d.getTime() - d.getTimezoneOffset() * 60000).toISOString().slice(0, 16);
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
  // Photos picked before the record is first saved; after that they go to the outbox at once.
  const [photos, setPhotos] = useState<OutboxPhoto[]>([]);
  const entry = outbox.entries.find((e) => e.id === id);
  const photosWaiting = waitingPhotos(entry).length;
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
    await outbox.save(payload, photos);
    setPhotos([]);
  }

  function addPhotos(picked: OutboxPhoto[]) {
    if (entry) void outbox.addPhotos(id, picked);
    else setPhotos((p) => [...p, ...picked]);
  }

  function startAnother() {
    setId(crypto.randomUUID());
    setDrafts({});
    setChecks({});
    setFindings('');
    setMeterHours(undefined);
    setErrors({});
    setPhotos([]);
    sign.reset();
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
      <PhotoPicker
        photos={[...(entry?.photos ?? []), ...photos]}
        unsaved={new Set(photos.map((p) => p.id))}
        onAdd={addPhotos}
        onRemove={(photoId) => setPhotos((p) => p.filter((x) => x.id !== photoId))}
        online={outbox.online}
        disabled={sign.isSuccess}
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
            disabled={!outbox.online || sign.isSuccess || photosWaiting > 0}
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
      {entry?.state === 'sent' && photosWaiting > 0 && !sign.isSuccess && (
        <Text size="sm">
          {photosWaiting === 1 ? '1 photo is' : `${photosWaiting} photos are`} still to be sent:
          sign once they are on the server, as a signed record takes no more photos.
        </Text>
      )}
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
