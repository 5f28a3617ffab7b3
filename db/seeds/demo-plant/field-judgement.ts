import {
  evaluateTolerance,
  getSheetType,
  settingTolerance,
  type Dimension,
  type FieldSetting,
  type FieldTolerance,
  type SheetEvaluation,
  type ToleranceVerdict,
} from '@holdfast/calc';

/** What a measurement was judged against, and the verdicts, as stored on its row. */
export interface StoredJudgement {
  target: number;
  unit: string;
  dimension: string;
  tolerance: FieldTolerance | null;
  asFoundVerdict: ToleranceVerdict | null;
  asLeftVerdict: ToleranceVerdict | null;
}

/**
 * A demo measurement judged against its revision's frozen evaluation, as the server judges and
 * stores it when a record is saved and signed (server/src/calc/field-targets.ts). The demo writes
 * its signed records straight into the tables, so it stores the judgement itself. Undefined when
 * the frozen evaluation has no such setting (nothing to judge against).
 */
export function judgeStoredMeasurement(
  sheetType: string,
  evaluation: unknown,
  m: { settingKey: string; asFound: number | null; asLeft: number | null },
): StoredJudgement | undefined {
  const settings = (evaluation as Partial<SheetEvaluation> | null)?.fieldSettings ?? [];
  const s = settings.find((x: FieldSetting) => x.key === m.settingKey);
  if (!s) return undefined;
  const tolerance = settingTolerance(s, getSheetType(sheetType)?.fieldCard);
  const judge = (v: number | null) =>
    v === null || !tolerance
      ? null
      : evaluateTolerance(s.value, v, tolerance, s.dimension as Dimension);
  return {
    target: s.value,
    unit: s.unit,
    dimension: s.dimension,
    tolerance,
    asFoundVerdict: judge(m.asFound),
    asLeftVerdict: judge(m.asLeft),
  };
}

/** A judgement as column values (jsonb as JSON text, as the repositories write it). */
export function judgementColumns(j: StoredJudgement | undefined) {
  const json = (v: unknown) => (v === null || v === undefined ? null : JSON.stringify(v));
  return {
    target: j?.target ?? null,
    unit: j?.unit ?? null,
    dimension: j?.dimension ?? null,
    tolerance: json(j?.tolerance),
    asFoundVerdict: json(j?.asFoundVerdict),
    asLeftVerdict: json(j?.asLeftVerdict),
  };
}
