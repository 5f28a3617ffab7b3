import { randomUUID } from 'node:crypto';
import type { INestApplicationContext } from '@nestjs/common';
import { createFieldRecordSchema, inspectionIntervalSchema, type User } from '@holdfast/shared';
import { FieldRecordSigningService } from '../field-records/field-record-signing.service.js';
import { FieldRecordsService } from '../field-records/field-records.service.js';
import { InspectionScheduleService } from '../field-records/inspection-schedule.service.js';
import { demoHistory } from './demo-history.repository.js';
import { DAY, demoPeople, type MadeRevision } from './seed-demo-plant.js';

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
 * Invented field records for the demo plant, made through the field-record service by the demo
 * fitter and countersigned by a plant engineer: on MH-B1 a commissioning and five inspections
 * over four months with the reserve stroke and the lining wearing down (long enough to fit a
 * wear rate), all against revision A, which later revisions have since superseded; on TR-B1 a
 * commissioning and a 30-day interval now overdue; on DB-1 an inspection whose air gap was
 * left out of tolerance with its reason, signed and waiting for the plant engineer. Runs with
 * the plant it belongs to (`made`: the revisions seedDemoPlant made).
 */
export async function seedDemoFieldRecords(
  app: INestApplicationContext,
  made: MadeRevision[],
): Promise<void> {
  if (made.length === 0) return;
  const person = await demoPeople(app);
  const tech = person('technician@holdfast.test');
  const plantEngineer = person('checker@holdfast.test');
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
    // Shoe clearance set to the card's 1.2 mm; found a little wider, as the reserve shrinks (no
    // lift stop), well inside its in-service maximum.
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

  await addVisits(app, made, 'MH-B1', 'hoist-shoe-brake', 'superseded', wear, tech, plantEngineer);
  await addVisits(
    app,
    made,
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
    app,
    made,
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
  const schedule = app.get(InspectionScheduleService);
  for (const [tag, every] of intervals) {
    const pos = made.find((r) => r.positionTag === tag);
    if (!pos) continue;
    await schedule.setInterval(
      plantEngineer,
      pos.positionId,
      inspectionIntervalSchema.parse({ basis: 'days', every, remindDaysAhead: 7 }),
    );
  }
}

/** The visits to one brake, each made, signed and (where the story says) countersigned. */
async function addVisits(
  app: INestApplicationContext,
  made: MadeRevision[],
  tag: string,
  sheetType: string,
  state: MadeRevision['state'],
  visits: Visit[],
  tech: User,
  engineer: User,
): Promise<void> {
  const rev = made.find(
    (r) => r.positionTag === tag && r.sheetType === sheetType && r.state === state,
  );
  if (!rev) throw new Error(`the demo has no ${state} ${sheetType} revision on ${tag}`);
  const records = app.get(FieldRecordsService);
  const signatures = app.get(FieldRecordSigningService);
  const history = demoHistory(app);
  const onCard = new Set((await records.form(tech, rev.id)).targets.map((t) => t.settingKey));
  for (const v of visits) {
    const at = new Date(Math.max(Date.now() - v.daysAgo * DAY, rev.at.getTime() + DAY));
    const keys = [...new Set([...Object.keys(v.found), ...Object.keys(v.left)])].filter((k) =>
      onCard.has(k),
    );
    const checks = [
      { key: 'no-drag-shoe-a', result: 'ok' },
      { key: 'no-drag-shoe-b', result: 'ok' },
      { key: 'set-release-cycles', result: 'ok', cycles: 5 },
      { key: 'thruster-condition', result: 'ok' },
      { key: 'linkage-condition', result: 'ok' },
      // Signed, so every item is answered (the service signs nothing less).
      ...(['lining-thickness-shoe-a', 'lining-thickness-shoe-b'] as const).map((key, i) =>
        v.lining
          ? { key, result: 'ok' as const, value: v.lining[i]! } // [a, b]: two entries
          : {
              key,
              result: 'not-ok' as const,
              note: 'At the wear limit, judged by eye; see findings.',
            },
      ),
    ];
    const since = await history.mark();
    const { record } = await records.create(
      tech,
      createFieldRecordSchema.parse({
        id: randomUUID(),
        positionId: rev.positionId,
        revisionId: rev.id,
        kind: v.kind,
        performedAt: at.toISOString(),
        meterHours: v.meterHours ?? null,
        findings: v.findings,
        measurements: keys.map((k) => ({
          settingKey: k,
          asFound: v.found[k] ?? null,
          asLeft: v.left[k] ?? null,
          reason: v.reasons?.[k] ?? '',
        })),
        checks,
      }),
    );
    await signatures.sign(tech, record.id);
    if (v.countersign) await signatures.countersign(engineer, record.id, '');
    const countersigned = v.countersign ? new Date(at.getTime() + DAY) : null;
    await history.dateFieldRecord(record.id, since, at, countersigned);
  }
}
