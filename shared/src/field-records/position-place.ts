/** Where a brake position is: its site, machine and own tag. */
export interface PositionPlace {
  siteCode: string;
  machineTag: string;
  positionTag: string;
}

/**
 * A brake position named so it cannot be mistaken for another, e.g. "NRW · LC-2 · DB-1": tags
 * like MH-B1 repeat on every crane of a plant, so a list or a mail that spans machines names the
 * machine and site too.
 */
export function positionPlaceText(p: PositionPlace): string {
  return `${p.siteCode} · ${p.machineTag} · ${p.positionTag}`;
}
