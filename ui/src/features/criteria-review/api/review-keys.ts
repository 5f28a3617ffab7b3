import { criteriaKeys } from '../../criteria/api/criteria-keys';

/** Under the criteria keys, so publishing a criteria version refreshes every review flag. */
export const reviewKeys = {
  all: [...criteriaKeys.all, 'reviews'] as const,
  revision: (revisionId: string) => [...reviewKeys.all, 'revision', revisionId] as const,
  queue: () => [...reviewKeys.all, 'queue'] as const,
};
