import { apiPath, apiRoutes } from '@holdfast/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import {
  registerSchema,
  type Machine,
  type Position,
  type Register,
  type Site,
} from '@holdfast/shared';
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
  return findPositionPlace(register, positionId)?.position;
}

/** A brake position with its machine and site, or undefined: tags repeat across machines. */
export function findPositionPlace(
  register: Register,
  positionId: string,
): { site: Site; machine: Machine; position: Position } | undefined {
  for (const site of register.sites)
    for (const machine of site.machines)
      for (const position of machine.positions)
        if (position.id === positionId) return { site, machine, position };
  return undefined;
}
