import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { registerKeys } from '../../../lib/query-keys';

/** Which register record a form saves: a site, a machine or a brake position. */
export type RegisterKind = 'sites' | 'machines' | 'positions';

export interface SaveRegisterItem {
  kind: RegisterKind;
  /** Set to edit that record; absent to add one. */
  id?: string;
  body: Record<string, string>;
}

/** POST /api/register/:kind to add, PATCH /api/register/:kind/:id to edit. */
export function saveRegisterItem({ kind, id, body }: SaveRegisterItem): Promise<unknown> {
  return id
    ? api.patch(`/register/${kind}/${id}`, { body })
    : api.post(`/register/${kind}`, { body });
}

export function useSaveRegisterItem() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveRegisterItem,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: registerKeys.all }),
  });
}
