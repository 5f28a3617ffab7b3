import { randomUUID } from 'node:crypto';
import type { Kysely } from 'kysely';
import type { SheetEvaluation } from '@holdfast/calc';
import type { DB } from '../src/database.js';
import { verificationCode } from './demo-plant/calc-access.js';
import { judgeStoredMeasurement, judgementColumns } from './demo-plant/field-judgement.js';

const DAY = 24 * 3600 * 1000;
// Field-card keys of what the fitters measured (the values are field readings, not sheet inputs).
const RESERVE = 'reserveStroke';
const CLEARANCE = 'shoeClearance';
const AIR_GAP = 'airGap';
const MM = 1e-3;

/** One invented visit to a brake. Values in SI; `found`/`left` by field-card key. */
interface Visit {
  daysAgo: number;
  kind: 'commissioning' | 'periodic-inspection' | 're-adjustment';
  found: Record<string, number>;
  left: Record<string, number>;
  reasons?: Record<string, string>;
  /** Lining thickness of shoe (pad) A and B; null when judged at the wear limit by eye. */
  lining: [number, number] | null;
  findings: string;
  meterHours?: number;
  countersign: boolean;
}

/**
 * Invented field records for the demo plant: on MH-B1 a commissioning and five inspections over
 * four months with the reserve stroke and the lining wearing down (long enough to fit a wear
 * rate), all against revision A, which revision B has since superseded; on TR-B1 a
 * commissioning and a 30-day interval now overdue; on DB-1 an inspection whose air gap was left
 * out of tolerance with its reason, signed and waiting for the plant engineer. Runs once.
 */
export async function seed(db: Kysely<DB>): Promise<void> {
  const any = await db.selectFrom('fieldRecords').select('id').limit(1).executeTakeFirst();
  if (any) return;
  const people = await db
    .selectFrom('users')
    .select(['id', 'email', 'displayName', 'initials'])
    .execute();
  const tech = people.find((p) => p.email === 'technician@holdfast.test');
  const plantEngineer = people.find((p) => p.email === 'checker@holdfast.test');
  if (!tech || !plantEngineer) return;

  const reserve = (mm: number) => ({ [RESERVE]: mm * MM });
  const wear: Visit[] = [
    [112, 20.0, 12.0, 11.9],
    [92, 18.6, 11.55, 11.5],
    [72, 17.1, 11.15, 11.05],
    [52, 15.5, 10.7, 10.65],
    [32, 14.1, 10.3, 10.2],
    [12, 12.6, 9.85, 9.8],
  ].map(([daysAgo, stroke, a, b], i) => ({
    daysAgo,
    kind: i === 0 ? 'commissioning' : 'periodic-inspection',
    // Inspections find the reserve stroke and leave it (no re-adjustment yet): as left empty.
    // Shoe clearance as set on the card's 1.2 mm and found within its −0.1/+0.2 mm band.
    found: i === 0 ? {} : { ...reserve(stroke), [CLEARANCE]: 1.25 * MM },
    left: i === 0 ? { ...reserve(stroke), [CLEARANCE]: 1.2 * MM } : {},
    lining: [a * MM, b * MM],
    findings:
      i === 0
        ? 'Set to the card. Five set/release cycles, re-measured, no change.'
        : `Reserve stroke ${stroke} mm; lining wearing evenly. No adjustment needed yet.`,
    meterHours: 1200 + i * 410,
    countersign: true,
  }));

  await addVisits(db, 'MH-B1', 'hoist-shoe-brake', 'superseded', wear, tech, plantEngineer);
  await addVisits(
    db,
    'TR-B1',
    'travel-shoe-brake',
    // Set 55 days ago to the first issue, approved then; revision B (core 1.1.0) came since, so
    // the record shows the flag and the brake is due to be set to B.
    'superseded',
    [
      {
        daysAgo: 55,
        kind: 'commissioning',
        found: {},
        left: { [RESERVE]: 20 * MM, [CLEARANCE]: 1.2 * MM },
        lining: [12 * MM, 12 * MM],
        findings: 'Set to the card; no drag on either shoe after ten cycles.',
        countersign: true,
      },
    ],
    tech,
    plantEngineer,
  );
  await addVisits(
    db,
    'DB-1',
    'caliper-disc-brake',
    'approved',
    [
      {
        daysAgo: 3,
        kind: 'periodic-inspection',
        found: { [AIR_GAP]: 1.7 * MM },
        left: { [AIR_GAP]: 1.5 * MM },
        reasons: {
          [AIR_GAP]:
            'Pads worn to the end of the adjuster range; the gap cannot be closed further. New pads ordered.',
        },
        lining: null,
        findings: 'Pad wear at the limit on the outer caliper. Replace pads at the next stop.',
        countersign: false,
      },
    ],
    tech,
    plantEngineer,
  );

  const intervals: [string, number][] = [
    ['MH-B1', 30],
    ['TR-B1', 30],
    ['DB-1', 90],
  ];
  for (const [tag, every] of intervals) {
    const pos = await position(db, tag);
    if (!pos) continue;
    await db
      .insertInto('inspectionIntervals')
      .values({
        positionId: pos,
        basis: 'days',
        every,
        remindDaysAhead: 7,
        updatedBy: plantEngineer.id,
      })
      .onConflict((oc) => oc.column('positionId').doNothing())
      .execute();
  }
}

async function position(db: Kysely<DB>, tag: string): Promise<string | undefined> {
  const row = await db
    .selectFrom('brakePositions as p')
    .innerJoin('machines as m', 'm.id', 'p.machineId')
    .innerJoin('sites as s', 's.id', 'm.siteId')
    .select('p.id')
    .where('p.tag', '=', tag)
    .where('s.code', '=', 'NRW')
    .executeTakeFirst();
  return row?.id;
}

type Person = { id: string; displayName: string; initials: string };

async function addVisits(
  db: Kysely<DB>,
  tag: string,
  sheetType: string,
  state: string,
  visits: Visit[],
  tech: Person,
  engineer: Person,
): Promise<void> {
  const pos = await position(db, tag);
  if (!pos) return;
  const rev = await db
    .selectFrom('revisions as r')
    .innerJoin('sheets as s', 's.id', 'r.sheetId')
    .select(['r.id', 'r.evaluation', 'r.hash', 'r.approvedAt'])
    .where('s.positionId', '=', pos)
    .where('s.sheetType', '=', sheetType)
    .where('r.state', '=', state)
    .orderBy('r.seq')
    .executeTakeFirst();
  if (!rev) return;
  const targets = new Map(
    ((rev.evaluation as SheetEvaluation | null)?.fieldSettings ?? []).map((f) => [f.key, f.value]),
  );
  const approved = rev.approvedAt?.getTime() ?? 0;
  for (const v of visits) {
    const at = new Date(Math.max(Date.now() - v.daysAgo * DAY, approved + DAY));
    const id = randomUUID();
    const keys = [...new Set([...Object.keys(v.found), ...Object.keys(v.left)])].filter((k) =>
      targets.has(k),
    );
    const outOfTolerance = Boolean(v.reasons && Object.keys(v.reasons).length > 0);
    await db.transaction().execute(async (trx) => {
      await trx
        .insertInto('fieldRecords')
        .values({
          id,
          positionId: pos,
          revisionId: rev.id,
          kind: v.kind,
          performedAt: at,
          meterHours: v.meterHours ?? null,
          findings: v.findings,
          outOfTolerance,
          createdBy: tech.id,
        })
        .execute();
      if (keys.length > 0) {
        await trx
          .insertInto('fieldRecordMeasurements')
          .values(
            keys.map((k, ordinal) => {
              const m = { settingKey: k, asFound: v.found[k] ?? null, asLeft: v.left[k] ?? null };
              // Signed, so stored with what it was judged against, as the server signs.
              const judged = judgementColumns(judgeStoredMeasurement(sheetType, rev.evaluation, m));
              return { recordId: id, ordinal, ...m, reason: v.reasons?.[k] ?? '', ...judged };
            }),
          )
          .execute();
      }
      const checks = [
        { key: 'no-drag-shoe-a', result: 'ok' },
        { key: 'no-drag-shoe-b', result: 'ok' },
        { key: 'set-release-cycles', result: 'ok', cycles: 5 },
        { key: 'thruster-condition', result: 'ok' },
        { key: 'linkage-condition', result: 'ok' },
        // Signed, so every item is answered (the server signs nothing less).
        ...(['lining-thickness-shoe-a', 'lining-thickness-shoe-b'] as const).map((key, i) =>
          v.lining
            ? { key, result: 'ok', value: v.lining[i] }
            : { key, result: 'not-ok', note: 'At the wear limit, judged by eye; see findings.' },
        ),
      ];
      await trx
        .insertInto('fieldRecordChecks')
        .values(checks.map((c) => ({ recordId: id, ...c })))
        .execute();
      await trx
        .updateTable('fieldRecords')
        .set({ status: 'signed', verificationCode: verificationCode(`${rev.hash}${id}`) })
        .where('id', '=', id)
        .execute();
      await trx
        .insertInto('fieldRecordSignatures')
        .values({
          recordId: id,
          kind: 'technician',
          userId: tech.id,
          displayName: tech.displayName,
          initials: tech.initials,
          signedAt: at,
        })
        .execute();
      if (v.countersign) {
        await trx
          .insertInto('fieldRecordSignatures')
          .values({
            recordId: id,
            kind: 'countersign',
            userId: engineer.id,
            displayName: engineer.displayName,
            initials: engineer.initials,
            signedAt: new Date(at.getTime() + DAY),
          })
          .execute();
        await trx
          .updateTable('fieldRecords')
          .set({ status: 'countersigned' })
          .where('id', '=', id)
          .execute();
      }
    });
  }
}
