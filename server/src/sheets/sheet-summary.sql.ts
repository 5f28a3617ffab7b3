import { sql } from 'kysely';

/** A timestamp as `Date.prototype.toISOString` writes it (milliseconds, truncated, UTC). */
const isoText = (column: string) =>
  sql`to_char(${sql.ref(column)} at time zone 'UTC', 'YYYY-MM-DD"T"HH24:MI:SS.MS"Z"')`;

/**
 * The columns of one `SheetSummary` for the sheet `s`, in the order of its keys; nested objects
 * are one-row look-ups. `approved` is null unless the approved revision has a label and a date,
 * as in `toSheetSummary`.
 */
export const summaryColumns = sql`
  select s.id, s.document_number as "documentNumber", s.title, s.sheet_type as "sheetType",
    (select row_to_json(x) from (select si.id, si.code, si.name
      from sites si where si.id = s.site_id) x) as site,
    (select row_to_json(x) from (select m.id, m.tag, m.name
      from machines m where m.id = s.machine_id) x) as machine,
    (select row_to_json(x) from (select bp.id, bp.tag, bp.description
      from brake_positions bp where bp.id = s.position_id) x) as position,
    (select row_to_json(x) from (select u.id, u.display_name as "displayName", u.initials
      from users u where u.id = s.owner_id) x) as owner,
    (select row_to_json(x) from (select lr.id, lr.label, lr.state
      from revisions lr where lr.id = s.latest_revision_id) x) as latest,
    (select row_to_json(x) from (select ar.id, ar.label, ${isoText('ar.approvedAt')} as "approvedAt"
      from revisions ar where ar.id = s.approved_revision_id
        and ar.label <> '' and ar.approved_at is not null) x) as approved,
    ${isoText('s.updatedAt')} as "updatedAt"`;
