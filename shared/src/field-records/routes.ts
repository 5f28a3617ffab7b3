/**
 * The field-records API paths (under the server's /api prefix as written). `:name` parts are
 * path parameters; replace them with `fieldRecordPath`.
 */
export const FIELD_RECORD_ROUTES = {
  /** GET list (query positionId, status) / POST create (idempotent by client id). */
  records: '/api/field-records',
  /** GET one / PATCH a draft. */
  record: '/api/field-records/:id',
  /** POST: the technician signs. */
  sign: '/api/field-records/:id/sign',
  /** POST: a plant engineer countersigns; the record is immutable from then on. */
  countersign: '/api/field-records/:id/countersign',
  /** GET list / POST multipart upload (field `file`) of photos owned by the record. */
  attachments: '/api/field-records/:id/attachments',
  /** GET the printed field record (PDF). */
  pdf: '/api/field-records/:id/pdf',
  /** GET due and overdue inspections, and records awaiting countersignature. */
  due: '/api/field-records/due',
  /** GET the targets and tolerances a record form is generated from. */
  form: '/api/revisions/:revisionId/field-form',
  /** GET the full records of a position, oldest first. */
  positionHistory: '/api/register/positions/:positionId/field-records',
  /** GET the brake at a glance (set to, last inspected, next due, open findings). */
  positionState: '/api/register/positions/:positionId/field-state',
  /** GET / PUT the inspection interval of a position. */
  interval: '/api/register/positions/:positionId/inspection-interval',
} as const;
export type FieldRecordRoute = keyof typeof FIELD_RECORD_ROUTES;

/** A route with its parameters filled in, e.g. fieldRecordPath('sign', { id }). */
export function fieldRecordPath(route: FieldRecordRoute, params: Record<string, string> = {}) {
  return FIELD_RECORD_ROUTES[route].replace(/:([A-Za-z]+)/g, (_, name: string) => {
    const v = params[name];
    if (v === undefined) throw new Error(`missing path parameter ${name}`);
    return encodeURIComponent(v);
  });
}
