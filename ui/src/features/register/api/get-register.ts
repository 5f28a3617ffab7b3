import { apiPath, apiRoutes } from '@holdfast/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { registerSchema, type Position, type Register } from '@holdfast/shared';
import { api } from '../../../lib/api-client';
import { registerKeys } from '../../../lib/query-keys';

export function getRegister(signal?: AbortSignal): Promise<Register> {
  return api.get(apiPath(apiRoutes.register.tree), { schema: registerSchema, signal });
}

export function registerQueryOptions() {
  return queryOptions({ queryKey: registerKeys.all, queryFn: ({ signal }) => getRegister(signal) });
}

export function useRegister() {
  return useQuery(registerQueryOptions());
}

/** A brake position of the register by id, or undefined. */
export function findPosition(register: Register, positionId: string): Position | undefined {
  return register.sites
    .flatMap((s) => s.machines.flatMap((m) => m.positions))
    .find((p) => p.id === positionId);
}
