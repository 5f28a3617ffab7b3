import type { FieldSetting, SheetEvaluation } from '@holdfast/calc';

export interface DiscStackSetup {
  name: string;
  backOff: FieldSetting | null;
  preload: FieldSetting | null;
  others: FieldSetting[];
}

export interface FieldCardGroups {
  spring: FieldSetting[];
  thruster: FieldSetting[];
  clearance: FieldSetting[];
  discStacks: DiscStackSetup[];
  other: FieldSetting[];
  springTables: SheetEvaluation['tables'];
  otherTables: SheetEvaluation['tables'];
}

const text = (f: FieldSetting) => `${f.key} ${f.label}`;
const isDisc = (f: FieldSetting) => /disc|stack|back.?off|belleville|preload/i.test(text(f));
const isSpring = (f: FieldSetting) =>
  /spring|clamp|torque.?mark|scale/i.test(text(f)) && !isDisc(f);
const isThruster = (f: FieldSetting) =>
  /thruster|magnet|stroke|reserve|re-?adjust|wear/i.test(text(f));
const isClearance = (f: FieldSetting) => /clearance|gap|lift.?off/i.test(text(f));

/** The stack a disc-spring setting belongs to: key prefix before the first dot, else the label before ':' or '—'. */
function stackName(f: FieldSetting): string {
  const label = f.label.split(/[:—]/)[0].trim();
  if (label && label !== f.label) return label;
  const dot = f.key.indexOf('.');
  if (dot > 0) return f.key.slice(0, dot);
  return 'Disc-spring stack';
}

/** Sorts a revision's field settings into the field card's blocks. */
export function groupFieldSettings(ev: SheetEvaluation): FieldCardGroups {
  const g: FieldCardGroups = {
    spring: [],
    thruster: [],
    clearance: [],
    discStacks: [],
    other: [],
    springTables: ev.tables.filter((t) => /spring|setting/i.test(`${t.id} ${t.title}`)),
    otherTables: ev.tables.filter((t) => !/spring|setting/i.test(`${t.id} ${t.title}`)),
  };
  const stacks = new Map<string, DiscStackSetup>();
  for (const f of ev.fieldSettings) {
    if (isDisc(f)) {
      const name = stackName(f);
      const st = stacks.get(name) ?? { name, backOff: null, preload: null, others: [] };
      if (f.dimension === 'angle' && !st.backOff) st.backOff = f;
      else if (f.dimension === 'force' && !st.preload) st.preload = f;
      else st.others.push(f);
      stacks.set(name, st);
    } else if (isClearance(f)) g.clearance.push(f);
    else if (isThruster(f)) g.thruster.push(f);
    else if (isSpring(f)) g.spring.push(f);
    else g.other.push(f);
  }
  g.discStacks = [...stacks.values()];
  return g;
}
