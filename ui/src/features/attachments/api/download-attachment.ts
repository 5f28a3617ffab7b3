import { useMutation } from '@tanstack/react-query';
import { apiDownload, saveBlob } from '../../../lib/api-client';

export async function downloadAttachment(id: string, fallbackName: string): Promise<void> {
  const file = await apiDownload(`/attachments/${id}/download`);
  saveBlob(file.blob, file.fileName ?? fallbackName);
}

export function useDownloadAttachment() {
  return useMutation({
    mutationFn: ({ id, fileName }: { id: string; fileName: string }) =>
      downloadAttachment(id, fileName),
  });
}
