import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPath, apiRoutes } from '@holdfast/shared';
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

const routes = {
  sites: { add: apiRoutes.register.createSite, edit: apiRoutes.register.updateSite },
  machines: { add: apiRoutes.register.createMachine, edit: apiRoutes.register.updateMachine },
  positions: { add: apiRoutes.register.createPosition, edit: apiRoutes.register.updatePosition },
} as const;

/** Adds a register record, or edits the one with `id`. */
export function saveRegisterItem({ kind, id, body }: SaveRegisterItem): Promise<unknown> {
  return id
    ? api.patch(apiPath(routes[kind].edit, { id }), { body })
    : api.post(apiPath(routes[kind].add), { body });
}

export function useSaveRegisterItem() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveRegisterItem,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: registerKeys.all }),
  });
}
