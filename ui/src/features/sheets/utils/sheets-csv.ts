import type { SheetSummary } from '@holdfast/shared';
import { toCsv } from '../../../lib/csv';
import { stateLabel } from '../../../lib/state-label';

/** The sheet list as CSV: one row per sheet, what a register of calculations needs. */
export function sheetsCsv(items: SheetSummary[], typeTitle: (id: string) => string): string {
  return toCsv([
    [
      'Document number',
      'Title',
      'Site',
      'Machine',
      'Brake position',
      'Sheet type',
      'Latest revision',
      'Latest state',
      'In force',
      'Approved on',
      'Owner',
      'Changed',
    ],
    ...items.map((s) => [
      s.documentNumber,
      s.title,
      s.site.code,
      s.machine.tag,
      s.position.tag,
      typeTitle(s.sheetType),
      s.latest.label,
      stateLabel(s.latest.state),
      s.approved ? s.approved.label : '',
      s.approved ? s.approved.approvedAt.slice(0, 10) : '',
      s.owner.displayName,
      s.updatedAt.slice(0, 10),
    ]),
  ]);
}
