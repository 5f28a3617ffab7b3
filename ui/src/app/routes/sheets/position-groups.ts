import type { Site } from '@holdfast/shared';
import type { PositionGroup } from '../../../features/sheets/components/create-sheet-dialog';

/** Register positions for a picker: one group per machine, labelled with its site. */
export function positionGroups(sites: Site[]): PositionGroup[] {
  return sites.flatMap((site) =>
    site.machines
      .filter((m) => m.positions.length > 0)
      .map((m) => ({
        group: `${site.code} › ${m.tag} ${m.name}`,
        items: m.positions.map((p) => ({ value: p.id, label: `${p.tag} — ${p.description}` })),
      })),
  );
}
