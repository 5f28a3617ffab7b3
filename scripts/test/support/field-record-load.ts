// Fitters sending field records while PostgreSQL crashes, as the device's queue does: each
// record is created under the id the device gave it, again and again until acknowledged (a
// retried create returns the stored record), then corrected (the fitter's findings and the
// as-left value, as "Save changes" sends them) until acknowledged, then signed until acknowledged.
import { randomUUID } from 'node:crypto';
import { fieldCheckKeys } from '@holdfast/shared';
import { call } from './fault-cluster.js';

export interface FieldRecordAcks {
  created: string[];
  /** Corrected after creation and acknowledged: the stored record must hold the correction. */
  corrected: string[];
  signed: string[];
  /** A sign whose answer was a failure though it had committed: the record was found signed. */
  inDoubt: string[];
  failures: { status: number; code?: string; retryAfter: string | null }[];
  okAt: number[];
}

export function emptyFieldRecordAcks(): FieldRecordAcks {
  return { created: [], corrected: [], signed: [], inDoubt: [], failures: [], okAt: [] };
}

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

export async function fieldRecordWorker(
  base: string,
  token: string,
  record: { positionId: string; revisionId: string; springLength: number },
  running: () => boolean,
  acks: FieldRecordAcks,
): Promise<void> {
  /** `settled`: a status that ends the retries without being a failure (a sign already done). */
  const send = async (
    p: string,
    body: unknown,
    ok: number[],
    settled?: number,
    method: 'POST' | 'PATCH' = 'POST',
  ) => {
    try {
      const res = await call(base, method, p, { token, body, timeoutMs: 10000 });
      if (ok.includes(res.status)) {
        acks.okAt.push(Date.now());
        return res;
      }
      if (res.status !== settled) {
        acks.failures.push({
          status: res.status,
          code: res.body?.error?.code,
          retryAfter: res.headers.get('retry-after'),
        });
      }
      return res;
    } catch {
      acks.failures.push({ status: 0, retryAfter: null });
      return undefined;
    }
  };
  while (running()) {
    const id = randomUUID();
    const body = {
      id,
      positionId: record.positionId,
      revisionId: record.revisionId,
      kind: 'periodic-inspection',
      performedAt: new Date().toISOString(),
      measurements: [{ settingKey: 'springLength', asFound: null, asLeft: record.springLength }],
      // Every item answered: the server signs nothing less.
      checks: fieldCheckKeys.map((key) => ({ key, result: 'ok' })),
    };
    let created = false;
    while (running() && !created) {
      const res = await send('/api/field-records', body, [200, 201]);
      created = res?.status === 200 || res?.status === 201;
      if (!created) await sleep(25);
    }
    if (!created) return;
    acks.created.push(id);
    // A PATCH is idempotent: sent again after a failed answer it leaves the same record.
    let corrected = false;
    while (running() && !corrected) {
      const res = await send(
        `/api/field-records/${id}`,
        correctionOf(id, record),
        [200],
        undefined,
        'PATCH',
      );
      corrected = res?.status === 200;
      if (!corrected) await sleep(25);
    }
    if (!corrected) return;
    acks.corrected.push(id);
    while (running()) {
      const res = await send(`/api/field-records/${id}/sign`, {}, [200], 409);
      if (res?.status === 200) {
        acks.signed.push(id);
        break;
      }
      if (res?.status === 409) {
        // Signed already: an earlier try committed but its answer was a failure.
        acks.inDoubt.push(id);
        break;
      }
      await sleep(25);
    }
  }
}

/** The correction each record gets after creation: its as-left value and findings name it. */
export function correctionOf(id: string, record: { springLength: number }) {
  return {
    measurements: [{ settingKey: 'springLength', asFound: null, asLeft: correctedLength(record) }],
    findings: `Corrected after sending (${id})`,
  };
}

/** The corrected as-left spring length: 0.2 mm longer than the target, within any tolerance. */
export const correctedLength = (record: { springLength: number }) => record.springLength + 0.0002;

/** Queries that must come back empty: each names a field record written only in part. */
export const fieldRecordHalfQueries: Record<string, string> = {
  'a field record without its measurement and checks': `
    select f.id from field_records f
    where (select count(*) from field_record_measurements m where m.record_id = f.id) <> 1
       or (select count(*) from field_record_checks c where c.record_id = f.id) <> ${fieldCheckKeys.length}`,
  'a field record without exactly one creation event': `
    select f.id from field_records f
    where (select count(*) from audit_events a
           where a.entity_id = f.id::text and a.action = 'field-record.created') <> 1`,
  'a signed field record without its code, signature or signing event': `
    select f.id from field_records f
    where f.status = 'signed'
      and (f.verification_code is null
           or (select count(*) from field_record_signatures s
               where s.record_id = f.id and s.kind = 'technician') <> 1
           or (select count(*) from audit_events a
               where a.entity_id = f.id::text and a.action = 'field-record.signed') <> 1)`,
  'a signature or signing event on a record that is still a draft': `
    select f.id from field_records f
    where f.status = 'draft'
      and (exists (select 1 from field_record_signatures s where s.record_id = f.id)
           or exists (select 1 from audit_events a
                      where a.entity_id = f.id::text and a.action = 'field-record.signed'))`,
};
