import { useMutation } from '@tanstack/react-query';
import { apiPath, apiRoutes } from '@holdfast/shared';
import { apiDownload, saveBlob } from '../../../lib/api-client';

/** Fetches a field record's PDF with the access token and saves it under the server's name. */
export async function downloadFieldRecord(id: string): Promise<string> {
  const file = await apiDownload(apiPath(apiRoutes.fieldRecords.pdf, { id }));
  const name = file.fileName ?? `field-record-${id}.pdf`;
  saveBlob(file.blob, name);
  return name;
}

export function usePrintFieldRecord() {
  return useMutation({ mutationFn: (id: string) => downloadFieldRecord(id) });
}
