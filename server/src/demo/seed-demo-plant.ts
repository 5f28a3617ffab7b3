import type { INestApplicationContext } from '@nestjs/common';
import type { SheetInputs } from '@holdfast/calc';
import {
  createCommentSchema,
  createMachineSchema,
  createPositionSchema,
  createSheetSchema,
  createSiteSchema,
  type Revision,
  type User,
} from '@holdfast/shared';
import {
  demoInputsOf,
  evaluateSheet,
  sheetTypeDefinition,
  shippedCriteriaSets,
} from '../calc/calc-engine.js';
import { CommentsService } from '../comments/comments.service.js';
import { RegisterService } from '../register/register.service.js';
import { RevisionsService } from '../revisions/revisions.service.js';
import { WorkflowService } from '../revisions/workflow.service.js';
import { SheetsService } from '../sheets/sheets.service.js';
import { UsersService } from '../users/users.service.js';
import { demoHistory } from './demo-history.repository.js';
import {
  demoMachines,
  demoSheets,
  demoSite,
  type DemoRevision,
  type DemoSheet,
} from './demo-plant.js';

export const DAY = 24 * 3600 * 1000;

/** A demo revision as made, in its state at the end: where the field records find it. */
export interface MadeRevision {
  id: string;
  positionTag: string;
  positionId: string;
  sheetType: string;
  state: DemoRevision['state'];
  at: Date;
}

/** The demo people as the services know them (a signed-in user), by e-mail. */
export async function demoPeople(app: INestApplicationContext): Promise<(email: string) => User> {
  const users = new Map((await app.get(UsersService).list()).map((u) => [u.email, u]));
  return (email) => {
    const user = users.get(email);
    if (!user) throw new Error(`the demo needs the demo user ${email} (db seed runs first)`);
    return user;
  };
}

/**
 * The invented demo plant, made through the services as people would make it: the register,
 * nine sheets across every state and sheet type, each revision saved, submitted, approved or
 * returned by the demo engineers and checkers (never by its own author), and comments. Each
 * step is then dated in the demo's past (DemoHistoryRepository). Skipped when the site exists.
 */
export async function seedDemoPlant(app: INestApplicationContext): Promise<MadeRevision[]> {
  const history = demoHistory(app);
  if (await history.siteExists(demoSite.code)) return [];
  const person = await demoPeople(app);
  const since = await history.mark();
  const register = app.get(RegisterService);
  const planner = person('engineer@holdfast.test');
  const site = await register.createSite(planner, createSiteSchema.parse(demoSite));
  const positions = new Map<string, string>();
  for (const m of demoMachines) {
    const machine = await register.createMachine(
      planner,
      createMachineSchema.parse({ siteId: site.id, tag: m.tag, name: m.name, kind: m.kind }),
    );
    for (const p of m.positions) {
      const made = await register.createPosition(
        planner,
        createPositionSchema.parse({ machineId: machine.id, ...p }),
      );
      positions.set(`${m.tag}/${p.tag}`, made.id);
    }
  }
  // The plant was registered before its first sheet was begun.
  const firstSheet = Math.max(...demoSheets.flatMap((s) => s.revisions.map((r) => r.daysAgo)));
  await history.dateRegister(since, new Date(Date.now() - (firstSheet + 10) * DAY));
  const made: MadeRevision[] = [];
  for (const sheet of demoSheets) {
    const positionId = positions.get(`${sheet.machine}/${sheet.position}`);
    if (!positionId) throw new Error(`demo sheet on unknown position ${sheet.position}`);
    made.push(...(await seedSheet(app, sheet, positionId, person)));
  }
  return made;
}

async function seedSheet(
  app: INestApplicationContext,
  sheet: DemoSheet,
  positionId: string,
  person: (email: string) => User,
): Promise<MadeRevision[]> {
  const sheets = app.get(SheetsService);
  const history = demoHistory(app);
  const made: MadeRevision[] = [];
  let inputs = demoInputsOf(sheet.sheetType);
  let sheetId = '';
  for (const [i, r] of sheet.revisions.entries()) {
    const since = await history.mark();
    const author = person(r.author);
    let rev: Revision;
    if (i === 0) {
      const created = await sheets.create(
        person(sheet.owner),
        createSheetSchema.parse({
          title: sheet.title,
          positionId,
          sheetType: sheet.sheetType,
          start: { kind: 'example' },
        }),
      );
      sheetId = created.id;
      rev = await app.get(RevisionsService).get(author, created.revisions[0]!.id);
    } else {
      rev = await sheets.newRevision(author, sheetId, { changeNote: r.changeNote });
    }
    if (r.vary) inputs = vary(sheet.sheetType, inputs, r.vary[0], r.vary[1]);
    inputs = entered(sheet.sheetType, inputs, r);
    rev = await workRevision(app, rev, inputs, r, person);
    const at = new Date(Date.now() - r.daysAgo * DAY);
    await history.dateRevisionSteps(sheetId, rev.id, since, at, i === 0);
    made.push({
      id: rev.id,
      positionTag: sheet.position,
      positionId,
      sheetType: sheet.sheetType,
      state: r.state,
      at,
    });
  }
  // What the database now says: every approval but the last was superseded by a later one.
  const released = made.filter((m) => m.state === 'approved' || m.state === 'superseded');
  for (const m of released.slice(0, -1)) m.state = 'superseded';
  return made;
}

/** Saves the revision's inputs as its author, then takes it as far as the demo says. */
async function workRevision(
  app: INestApplicationContext,
  start: Revision,
  inputs: SheetInputs,
  r: DemoRevision,
  person: (email: string) => User,
): Promise<Revision> {
  const revisions = app.get(RevisionsService);
  const workflow = app.get(WorkflowService);
  const comments = app.get(CommentsService);
  const author = person(r.author);
  let rev = await revisions.save(author, start.id, {
    inputs,
    unitSystem: 'SI',
    changeNote: r.changeNote,
    // Every value is the engineer's own choice for this brake: all confirmed.
    unconfirmed: [],
    rowVersion: start.rowVersion,
  });
  if (r.state === 'draft') return rev;
  const justification =
    rev.evaluation?.pass === false
      ? (r.justification ??
        'Demo: the failing checks are accepted for a limited period pending new linings (invented scenario).')
      : undefined;
  rev = await workflow.submit(author, rev.id, { rowVersion: rev.rowVersion, justification });
  // Comments a checker writes while checking; the last one of a returned revision is its reason.
  const notes = r.comments ?? [];
  const written = r.state === 'returned' ? notes.slice(0, -1) : notes;
  const ids: string[] = [];
  for (const c of written) {
    const anchor = anchorOf(rev, c.anchor);
    const comment = await comments.create(
      person(c.by),
      rev.id,
      createCommentSchema.parse({ body: c.body, ...(anchor ? { anchor } : {}) }),
    );
    ids.push(comment.id);
  }
  if (r.state === 'in_check') return rev;
  const checker = person(r.checker ?? '');
  if (r.state === 'returned') {
    const reason = notes.at(-1)?.body ?? 'Returned in the demo.';
    rev = await workflow.return(checker, rev.id, { rowVersion: rev.rowVersion, comment: reason });
    const listed = await comments.list(author, rev.id);
    for (const [k, c] of notes.entries()) {
      const id = ids[k] ?? listed.at(-1)?.id;
      if (!id) continue;
      if (c.reply)
        await comments.create(
          person(c.reply.by),
          rev.id,
          createCommentSchema.parse({ body: c.reply.body, parentId: id }),
        );
      if (c.resolved) await comments.update(author, id, { resolved: true });
    }
    return revisions.get(author, rev.id);
  }
  // A revision approved with failing checks carries the checker's reason, as the server asks.
  const note =
    rev.evaluation?.pass === false
      ? 'Demo: approved with the failing checks for a limited period, as the justification says; new linings are ordered (invented scenario).'
      : undefined;
  return workflow.approve(checker, rev.id, { rowVersion: rev.rowVersion, note });
}

function anchorOf(rev: Revision, anchor: NonNullable<DemoRevision['comments']>[number]['anchor']) {
  if (!anchor) return undefined;
  const key =
    anchor.key === 'first-input'
      ? sheetTypeDefinition(rev.sheetType).fields[0]?.key
      : rev.evaluation?.checks[0]?.id;
  return key ? { kind: anchor.kind, key } : undefined;
}

/** The inputs of a revision: the previous ones with this revision's entries. */
function entered(sheetType: string, previous: SheetInputs, r: DemoRevision): SheetInputs {
  const inputs = structuredClone(previous);
  for (const [key, value] of r.set ?? []) inputs[key] = structuredClone(value);
  const demo = demoInputsOf(sheetType);
  for (const key of r.demoValues ?? []) if (key in demo) inputs[key] = structuredClone(demo[key]);
  for (const key of r.leaveOut ?? []) delete inputs[key];
  return inputs;
}

/**
 * Scale the n-th quantity input (kept only when the core still accepts it) so the demo sheets
 * differ from one another while staying valid.
 */
function vary(sheetType: string, inputs: SheetInputs, n: number, factor: number): SheetInputs {
  const fields = sheetTypeDefinition(sheetType).fields.filter((f) => f.kind === 'quantity');
  const f = fields[n % fields.length];
  const q = f ? inputs[f.key] : undefined;
  if (!f || typeof q !== 'object' || q === null) return inputs;
  const out = structuredClone(inputs);
  out[f.key] = { ...q, value: Math.round(q.value * factor * 1000) / 1000 };
  try {
    evaluateSheet(sheetType, out, shippedCriteriaSets()[0]!); // the core ships at least one set
    return out;
  } catch {
    return inputs;
  }
}
