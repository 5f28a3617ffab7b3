import { queryOptions, useQuery } from '@tanstack/react-query';
import { attachmentListSchema, type AttachmentList } from '@holdfast/shared';
import { api } from '../../../lib/api-client';

export const attachmentsKey = (revisionId: string) =>
  ['revisions', 'detail', revisionId, 'attachments'] as const;

export function getAttachments(revisionId: string, signal?: AbortSignal): Promise<AttachmentList> {
  return api.get(`/revisions/${revisionId}/attachments`, { schema: attachmentListSchema, signal });
}

export function attachmentsQueryOptions(revisionId: string) {
  return queryOptions({
    queryKey: attachmentsKey(revisionId),
    queryFn: ({ signal }) => getAttachments(revisionId, signal),
  });
}

export function useAttachments(revisionId: string) {
  return useQuery(attachmentsQueryOptions(revisionId));
}
