import { useMutation } from '@tanstack/react-query';
import { apiPath, apiRoutes } from '@holdfast/shared';
import { apiDownload, saveBlob } from '../../../lib/api-client';

export type PrintKind = 'pdf' | 'field-card';

/**
 * Fetches a revision's PDF (the sheet or the field setting card) with the access token and saves
 * it under the server's file name (document number, revision, kind), so the file in the safety
 * folder says what it is.
 */
export async function downloadPrint(
  revisionId: string,
  kind: PrintKind,
  paper: 'A4' | 'LETTER' = 'A4',
): Promise<string> {
  const route = kind === 'pdf' ? apiRoutes.revisions.pdf : apiRoutes.revisions.fieldCard;
  const file = await apiDownload(apiPath(route, { id: revisionId }), { query: { paper } });
  const name = file.fileName ?? `revision-${revisionId}-${kind}.pdf`;
  saveBlob(file.blob, name);
  return name;
}

export function usePrintRevision(revisionId: string) {
  return useMutation({
    mutationFn: ({ kind, paper }: { kind: PrintKind; paper?: 'A4' | 'LETTER' }) =>
      downloadPrint(revisionId, kind, paper),
  });
}
