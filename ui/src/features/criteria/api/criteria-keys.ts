export const criteriaKeys = {
  all: ['criteria-sets'] as const,
  list: () => [...criteriaKeys.all, 'list'] as const,
  detail: (id: string, version?: number) =>
    [...criteriaKeys.all, 'detail', id, version ?? 'latest'] as const,
  impact: (id: string, version?: number) =>
    [...criteriaKeys.all, 'impact', id, version ?? 'latest'] as const,
};
