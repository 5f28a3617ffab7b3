/** Criteria set the CLI uses when --criteria is not given. */
export const DEFAULT_CRITERIA: Record<string, string> = {
  'hoist-shoe-brake': 'crane-hoist',
  'travel-shoe-brake': 'travel-drive',
  'drive-shoe-brake': 'general-industry',
  'caliper-disc-brake': 'general-industry',
  'disc-spring-stack': 'general-industry',
};
