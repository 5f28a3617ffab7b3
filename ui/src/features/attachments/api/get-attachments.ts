import { apiPath, apiRoutes } from '@holdfast/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { attachmentListSchema, type AttachmentList } from '@holdfast/shared';
import { api } from '../../../lib/api-client';
import { revisionKeys } from '../../../lib/query-keys';

export function getAttachments(revisionId: string, signal?: AbortSignal): Promise<AttachmentList> {
  return api.get(apiPath(apiRoutes.attachments.list, { id: revisionId }), {
    schema: attachmentListSchema,
    signal,
  });
}

export function attachmentsQueryOptions(revisionId: string) {
  return queryOptions({
    queryKey: revisionKeys.attachments(revisionId),
    queryFn: ({ signal }) => getAttachments(revisionId, signal),
  });
}

export function useAttachments(revisionId: string) {
  return useQuery(attachmentsQueryOptions(revisionId));
}
