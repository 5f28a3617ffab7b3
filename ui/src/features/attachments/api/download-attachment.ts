import { apiPath, apiRoutes } from '@holdfast/shared';
import { useMutation } from '@tanstack/react-query';
import { apiDownload, saveBlob } from '../../../lib/api-client';

export async function downloadAttachment(id: string, fallbackName: string): Promise<void> {
  const file = await apiDownload(apiPath(apiRoutes.attachments.download, { id }));
  saveBlob(file.blob, file.fileName ?? fallbackName);
}

export function useDownloadAttachment() {
  return useMutation({
    mutationFn: ({ id, fileName }: { id: string; fileName: string }) =>
      downloadAttachment(id, fileName),
  });
}
