import { apiPath, apiRoutes } from '@holdfast/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { verifyResultSchema, type VerifyResult } from '@holdfast/shared';
import { api } from '../../../lib/api-client';
import { verifyKeys } from '../../../lib/query-keys';

export function getVerification(code: string, signal?: AbortSignal): Promise<VerifyResult> {
  // Public: anyone holding a printout may check it, signed in or not.
  return api.get(apiPath(apiRoutes.verify.byCode, { code }), {
    schema: verifyResultSchema,
    signal,
    auth: false,
  });
}

export function verificationQueryOptions(code: string) {
  return queryOptions({
    queryKey: verifyKeys.code(code),
    queryFn: ({ signal }) => getVerification(code, signal),
    staleTime: 0,
  });
}

export function useVerification(code: string) {
  return useQuery(verificationQueryOptions(code));
}
