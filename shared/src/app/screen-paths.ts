/**
 * Screens a link from outside the app opens (an e-mail, a printout): the UI's route patterns and
 * the links the server writes come from here, so a mail never points at a screen that does not
 * exist.
 */
export const screenRoutes = {
  positionField: 'positions/:positionId/field',
  revision: 'sheets/:sheetId/revisions/:revisionId',
} as const;

/** The path of a position's field records and wear (from the app's root). */
export const positionFieldPath = (positionId: string) =>
  `/${screenRoutes.positionField.replace(':positionId', encodeURIComponent(positionId))}`;

/** The path of one revision of a sheet. */
export const revisionPath = (sheetId: string, revisionId: string) =>
  `/${screenRoutes.revision
    .replace(':sheetId', encodeURIComponent(sheetId))
    .replace(':revisionId', encodeURIComponent(revisionId))}`;

/** A screen's address under the app's public URL (no doubled slash). */
export const screenUrl = (base: string, path: string) => `${base.replace(/\/$/, '')}${path}`;
