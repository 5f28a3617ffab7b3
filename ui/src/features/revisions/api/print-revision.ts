import { useMutation } from '@tanstack/react-query';
import { apiDownload } from '../../../lib/api-client';

export type PrintKind = 'pdf' | 'field-card';

/**
 * Fetches a revision's PDF (the sheet or the field setting card) with the access token and opens
 * it in a new tab. The tab is opened before the fetch so the browser counts it as the user's click.
 */
export async function openPrint(
  revisionId: string,
  kind: PrintKind,
  paper: 'A4' | 'LETTER' = 'A4',
): Promise<void> {
  const tab = window.open('', '_blank');
  try {
    const file = await apiDownload(`/revisions/${revisionId}/${kind}`, { query: { paper } });
    const url = URL.createObjectURL(file.blob);
    if (tab) tab.location.href = url;
    else window.location.assign(url);
    setTimeout(() => URL.revokeObjectURL(url), 120_000);
  } catch (error) {
    tab?.close();
    throw error;
  }
}

export function usePrintRevision(revisionId: string) {
  return useMutation({
    mutationFn: ({ kind, paper }: { kind: PrintKind; paper?: 'A4' | 'LETTER' }) =>
      openPrint(revisionId, kind, paper),
  });
}
