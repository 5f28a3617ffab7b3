/** Where the API lives. The built UI is served from the same origin as the API. */
export const env = {
  apiBase: (import.meta.env.VITE_API_BASE as string | undefined) ?? '/api',
} as const;
