import type { SheetSummary } from '@holdfast/shared';
import type { SheetSummaryRow } from './sheets.repository.js';

/**
 * A sheet's summary for the detail route. The register list writes the same JSON in SQL
 * (`sheet-summary.sql.ts`): change both together (list.test.ts compares them).
 */
export function toSheetSummary(r: SheetSummaryRow): SheetSummary {
  return {
    id: r.id,
    documentNumber: r.documentNumber,
    title: r.title,
    sheetType: r.sheetType as SheetSummary['sheetType'],
    site: { id: r.siteId, code: r.siteCode, name: r.siteName },
    machine: { id: r.machineId, tag: r.machineTag, name: r.machineName },
    position: { id: r.positionId, tag: r.positionTag, description: r.positionDescription },
    owner: { id: r.ownerId, displayName: r.ownerName, initials: r.ownerInitials },
    latest: {
      id: r.latestId,
      label: r.latestLabel,
      state: r.latestState as SheetSummary['latest']['state'],
    },
    approved:
      r.approvedId && r.approvedLabel && r.approvedAt
        ? { id: r.approvedId, label: r.approvedLabel, approvedAt: r.approvedAt.toISOString() }
        : null,
    updatedAt: r.updatedAt.toISOString(),
  };
}
