import { getSheetType, type FieldSetting, type SheetEvaluation } from '@holdfast/calc';

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

/**
 * Sorts a revision's field settings into the field card's blocks by the placement its sheet type
 * declares for each setting key (calc's `fieldCard`); a key the sheet type does not place, as in
 * a record from an older core, prints under 'other'.
 */
export function groupFieldSettings(ev: SheetEvaluation): FieldCardGroups {
  const layout = getSheetType(ev.sheetType)?.fieldCard;
  const springTables = new Set(layout?.springTables ?? []);
  const g: FieldCardGroups = {
    spring: [],
    thruster: [],
    clearance: [],
    discStacks: [],
    other: [],
    springTables: ev.tables.filter((t) => springTables.has(t.id)),
    otherTables: ev.tables.filter((t) => !springTables.has(t.id)),
  };
  const stacks = new Map<string, DiscStackSetup>();
  for (const f of ev.fieldSettings) {
    const place = layout?.settings[f.key];
    if (!place) {
      g.other.push(f);
      continue;
    }
    if (place.group === 'discStack') {
      const name = place.stack ?? 'Disc-spring stack';
      const st = stacks.get(name) ?? { name, backOff: null, preload: null, others: [] };
      if (place.role === 'backOff' && !st.backOff) st.backOff = f;
      else if (place.role === 'preload' && !st.preload) st.preload = f;
      else st.others.push(f);
      stacks.set(name, st);
    } else g[place.group].push(f);
  }
  g.discStacks = [...stacks.values()];
  return g;
}
