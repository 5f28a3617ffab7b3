import type { Revision, SheetDetail } from '@holdfast/shared';
import type { RevisionLike, SheetLike } from './build-printable-sheet.js';

/*
 * Compile-time guard: the sheets API's Revision and SheetDetail can be handed to
 * buildPrintableSheet() as they are. If the API shapes drift, `tsc -b` fails here, not at print time.
 */
type Assert<T extends true> = T;
export type RevisionFitsPrint = Assert<Revision extends RevisionLike ? true : false>;
export type SheetFitsPrint = Assert<SheetDetail extends SheetLike ? true : false>;
