// The whole life of a sheet under load, for the PostgreSQL crash test: create, save, submit,
// approve, again and again, each step going on from what the server really holds. Every answer
// is kept, so the test can check afterwards that each acknowledged step is in the database and
// that nothing was half written.
import { call } from './fault-cluster.js';

export interface WorkflowAcks {
  created: string[];
  saved: { revisionId: string; note: string }[];
  submitted: string[];
  approved: string[];
  /** Every answer that was not 2xx: status (0 = no answer), error code, Retry-After. */
  failures: { status: number; code?: string; retryAfter: string | null }[];
  /** When each acknowledged write came back. */
  okAt: number[];
}

export function emptyAcks(): WorkflowAcks {
  return { created: [], saved: [], submitted: [], approved: [], failures: [], okAt: [] };
}

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

/**
 * One engineer-and-checker pair working sheets through to approval until `running()` is false.
 * A failed step is not repeated blindly: the loop reads the revision again and goes on from its
 * real state (a step that committed but whose answer was lost is then simply done).
 */
export async function workflowWorker(
  base: string,
  tokens: { engineer: string; checker: string },
  positionId: string,
  label: string,
  running: () => boolean,
  acks: WorkflowAcks,
): Promise<void> {
  let revisionId: string | undefined;
  let n = 0;
  const note = (id: string) => `Saved under load ${label} ${id.slice(0, 8)}.`;
  const write = async (
    method: string,
    p: string,
    token: string,
    body: unknown,
    ok: number,
  ): Promise<Awaited<ReturnType<typeof call>> | undefined> => {
    try {
      const res = await call(base, method, p, { token, body, timeoutMs: 10000 });
      if (res.status === ok) {
        acks.okAt.push(Date.now());
        return res;
      }
      acks.failures.push({
        status: res.status,
        code: res.body?.error?.code,
        retryAfter: res.headers.get('retry-after'),
      });
    } catch {
      acks.failures.push({ status: 0, retryAfter: null });
    }
    await sleep(25);
    return undefined;
  };
  while (running()) {
    if (!revisionId) {
      const res = await write(
        'POST',
        '/api/sheets',
        tokens.engineer,
        {
          title: `Crash load ${label} ${n++}`,
          positionId,
          sheetType: 'hoist-shoe-brake',
          start: { kind: 'example' },
        },
        201,
      );
      if (res) {
        acks.created.push(res.body.id as string);
        revisionId = res.body.revisions[0].id as string;
      }
      continue;
    }
    let rev;
    try {
      rev = await call(base, 'GET', `/api/revisions/${revisionId}`, {
        token: tokens.checker,
        timeoutMs: 10000,
      });
    } catch {
      rev = undefined;
    }
    if (rev?.status !== 200) {
      await sleep(25);
      continue;
    }
    const { state, rowVersion, changeNote } = rev.body as {
      state: string;
      rowVersion: number;
      changeNote: string;
    };
    const id = revisionId;
    if (state === 'draft' && changeNote !== note(id)) {
      const res = await write(
        'PUT',
        `/api/revisions/${id}`,
        tokens.engineer,
        {
          inputs: rev.body.inputs,
          unitSystem: rev.body.unitSystem,
          changeNote: note(id),
          unconfirmed: [],
          rowVersion,
        },
        200,
      );
      if (res) acks.saved.push({ revisionId: id, note: note(id) });
    } else if (state === 'draft') {
      const res = await write(
        'POST',
        `/api/revisions/${id}/submit`,
        tokens.engineer,
        { rowVersion, justification: 'Submitted under load.' },
        200,
      );
      if (res) acks.submitted.push(id);
    } else if (state === 'in_check') {
      const res = await write(
        'POST',
        `/api/revisions/${id}/approve`,
        tokens.checker,
        // A note, as approving a revision with failing checks asks for one.
        { rowVersion, note: 'Approved under load.' },
        200,
      );
      if (res) acks.approved.push(id);
    } else {
      revisionId = undefined; // approved (or returned): on to the next sheet
    }
  }
}

/** Queries that must all come back empty: each names a record written only in part. */
export const halfRecordQueries: Record<string, string> = {
  'an approved revision without exactly one approval event': `
    select r.id from revisions r
    where r.state in ('approved', 'superseded')
      and (select count(*) from audit_events a
           where a.entity_id = r.id::text and a.action = 'revision.approved') <> 1`,
  'an approval event for a revision that is not approved': `
    select a.entity_id from audit_events a join revisions r on r.id::text = a.entity_id
    where a.action = 'revision.approved' and r.state not in ('approved', 'superseded')`,
  'a submitted or approved revision without its submission event': `
    select r.id from revisions r
    where r.state in ('in_check', 'approved', 'superseded')
      and not exists (select 1 from audit_events a
                      where a.entity_id = r.id::text and a.action = 'revision.submitted')`,
  'an approved sheet whose approved revision is not approved': `
    select s.id from sheets s join revisions r on r.id = s.approved_revision_id
    where r.state <> 'approved'`,
  'a sheet without its creation event': `
    select s.id from sheets s
    where not exists (select 1 from audit_events a
                      where a.entity_id = s.id::text and a.action = 'sheet.created')`,
};
