import { apiPath, apiRoutes } from '@holdfast/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { attachmentSchema, type Attachment } from '@holdfast/shared';
import { apiUpload, type UploadProgress } from '../../../lib/api-client';
import { attachmentsQueryOptions } from './get-attachments';

export function uploadAttachment(
  revisionId: string,
  file: File,
  onProgress?: (p: UploadProgress) => void,
): Promise<Attachment> {
  const form = new FormData();
  form.append('file', file, file.name);
  return apiUpload(apiPath(apiRoutes.attachments.upload, { id: revisionId }), form, {
    schema: attachmentSchema,
    onProgress,
  });
}

export function useUploadAttachment(revisionId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ file, onProgress }: { file: File; onProgress?: (p: UploadProgress) => void }) =>
      uploadAttachment(revisionId, file, onProgress),
    onSettled: () =>
      queryClient.invalidateQueries({ queryKey: attachmentsQueryOptions(revisionId).queryKey }),
  });
}
