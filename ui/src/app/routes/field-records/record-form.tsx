import { useEffect, useState } from 'react';
import { useParams } from 'react-router-dom';
import {
  Alert,
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
import { findPositionPlace, useRegister } from '../../../features/register/api/get-register';
import { NumberField } from '../../../components/calc/components/unit-field';
import type { RouteHandle } from '../../../lib/route-handle';
import { useFieldForm } from '../../../features/field-records/api/get-field-form';
import { useSignFieldRecord } from '../../../features/field-records/api/sign-field-record';
import { useUpdateFieldRecord } from '../../../features/field-records/api/update-field-record';
import { useOutbox } from '../../../features/field-records/offline/use-outbox';
import { MeasurementRow } from '../../../features/field-records/components/measurement-row';
import {
  CheckItems,
  type CheckDraft,
} from '../../../features/field-records/components/check-items';
import { PhotoPicker } from '../../../features/field-records/components/photo-picker';
import type { OutboxPhoto } from '../../../features/field-records/offline/outbox-store';
import {
  clearFormDraft,
  hasEntries,
  loadFormDraft,
  storeFormDraft,
} from '../../../features/field-records/offline/form-draft';
import { useCurrentUser } from '../../../lib/session';
import { isoDayTime, parseIsoDayTime } from '../../../lib/dates';
import { refusedFieldErrors } from '../../../features/field-records/components/refused-fields';
import { isApiRequestError } from '../../../lib/api-client';
import {
  buildMeasurements,
  type MeasurementDraft,
} from '../../../features/field-records/components/measurement-entry';
import { buildChecks, readHours } from './record-entry';
import { RecordActions } from './record-actions';
import { FormUnavailable } from './form-unavailable';
import classes from './record-form.module.css';

export const handle: RouteHandle = { title: 'Field record', caution: true };

const localNow = () => isoDayTime(new Date());

function RecordForm({ form }: { form: FieldForm }) {
  const user = useCurrentUser();
  const outbox = useOutbox(user);
  const sign = useSignFieldRecord();
  const update = useUpdateFieldRecord();
  // What was typed here before a reload or a lost session, kept on this device.
  const [kept] = useState(() => loadFormDraft(user.id, form.revisionId));
  const [id, setId] = useState(() => kept?.id ?? crypto.randomUUID());
  const [kind, setKind] = useState<FieldRecordKind>(kept?.kind ?? 'periodic-inspection');
  const [performedAt, setPerformedAt] = useState(
    () => kept?.performedAt.replace('T', ' ') || localNow(),
  );
  const [drafts, setDrafts] = useState<Record<string, MeasurementDraft>>(kept?.drafts ?? {});
  const [checks, setChecks] = useState<Record<string, CheckDraft>>(kept?.checks ?? {});
  const [findings, setFindings] = useState(kept?.findings ?? '');
  const [meterHours, setMeterHours] = useState<InputValue | undefined>(kept?.meterHours);
  const [errors, setErrors] = useState<Record<string, string>>({});
  // Photos picked before the record is first saved; after that they go to the outbox at once.
  const [photos, setPhotos] = useState<OutboxPhoto[]>([]);
  const entry = outbox.entries.find((e) => e.id === id);
  // A record the server refused shows its reasons under the boxes, beside the form's own checks.
  const shown =
    entry?.state === 'refused'
      ? { ...refusedFieldErrors(entry.payload, entry.fields ?? []), ...errors }
      : errors;
  const measured = form.targets.filter((t) => t.tolerance !== null);
  const signed = sign.isSuccess;
  useEffect(() => {
    // A signed record is the server's now; until then every change is kept on the device.
    if (signed) clearFormDraft(user.id, form.revisionId);
    else
      storeFormDraft(user.id, form.revisionId, {
        id,
        kind,
        performedAt,
        drafts,
        checks,
        findings,
        meterHours,
      });
  }, [
    signed,
    user.id,
    form.revisionId,
    id,
    kind,
    performedAt,
    drafts,
    checks,
    findings,
    meterHours,
  ]);
  const withAsFound = kind !== 'commissioning';

  /** The record as the form now reads, or the entries that keep it from being one. */
  function entered(): { payload?: CreateFieldRecordInput; errors: Record<string, string> } {
    const m = buildMeasurements(measured, drafts);
    const c = buildChecks(form, checks);
    const all = { ...m.errors, ...c.errors };
    const when = parseIsoDayTime(performedAt);
    if (!when) all.performedAt = 'Enter the date and time of the work as YYYY-MM-DD HH:mm';
    const hours = readHours(meterHours);
    if (hours === undefined) all.meterHours = 'Enter the hours as a number, 0 or more';
    if (!when || Object.keys(all).length > 0 || !form.positionId) return { errors: all };
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
    return { payload, errors: all };
  }

  async function save() {
    const { payload, errors: all } = entered();
    setErrors(all);
    if (!payload) return;
    await outbox.save(payload, photos);
    setPhotos([]);
  }

  // Once the server has the record, what is signed is what it stores: a change made on the form
  // afterwards must be saved (PATCH) before the record can be signed.
  const now = entry?.state === 'sent' && !signed ? entered().payload : undefined;
  const changed = entry?.state === 'sent' && !signed && (!now || !sameRecord(now, entry.payload));

  async function saveChanges() {
    const { payload, errors: all } = entered();
    setErrors(all);
    if (!payload) return;
    const { id: _id, positionId: _p, revisionId: _r, ...body } = payload;
    try {
      await update.mutateAsync({ id, body });
    } catch (error) {
      // The server's reasons go under the boxes they are about, as for a refused first save.
      if (isApiRequestError(error) && error.fields.length > 0)
        setErrors({ ...refusedFieldErrors(payload, error.fields), ...all });
    }
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
    update.reset();
  }

  return (
    <Stack className={classes.form} gap="md">
      <Text>
        {form.documentNumber} rev. {form.revisionLabel}
      </Text>
      {kept && hasEntries(kept) && (
        <Text size="sm" data-testid="draft-restored">
          What you entered on this form before was kept on this device and is shown again.
        </Text>
      )}
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
      {/* Typed as ISO, not the browser's date-time box, which writes 12/04/2026, 09:59 PM in
          one browser and 04.12.2026 in the next, where the app writes every date year first. */}
      <TextInput
        label="Done at"
        description="Date and time by your clock, as YYYY-MM-DD HH:mm"
        value={performedAt}
        error={shown.performedAt}
        onChange={(e) => setPerformedAt(e.currentTarget.value)}
        classNames={{ input: 'hf-num' }}
        autoComplete="off"
        spellCheck={false}
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
      <RecordActions
        entry={entry}
        online={outbox.online}
        sign={sign}
        onSave={() => void save()}
        onStartAnother={startAnother}
        changes={{
          pending: changed,
          saving: update.isPending,
          error: update.isError ? update.error : null,
          onSave: () => void saveChanges(),
        }}
      />
    </Stack>
  );
}

export function Component() {
  const { revisionId = '' } = useParams();
  const query = useFieldForm(revisionId);
  const register = useRegister();
  const positionId = query.data?.positionId;
  const place =
    register.data && positionId ? findPositionPlace(register.data, positionId) : undefined;
  return (
    <Page
      title={place ? `Field record · ${place.position.tag}` : 'Field record'}
      // The fitter at the brake confirms it is this one: every crane has its MH-B1.
      eyebrow={place && `${place.site.code} · ${place.machine.tag} ${place.machine.name}`}
      description={place?.position.description}
    >
      {query.isPending && <Skeleton h={320} />}
      {query.isError && <FormUnavailable error={query.error} />}
      {query.data && <RecordForm form={query.data} />}
    </Page>
  );
}

/** The same record: what a later save would send equals what the server stores. */
function sameRecord(a: CreateFieldRecordInput, b: CreateFieldRecordInput): boolean {
  const pick = (r: CreateFieldRecordInput) =>
    JSON.stringify([r.kind, r.performedAt, r.meterHours, r.measurements, r.checks, r.findings]);
  return pick(a) === pick(b);
}
