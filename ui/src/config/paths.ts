/**
 * Every URL the app links to, in one place. `build` helpers fill in route params.
 * Features may define more paths of their own beside their routes.
 */
export const paths = {
  home: { path: '/', build: () => '/' },
  signIn: {
    path: '/sign-in',
    build: (next?: string) =>
      next && next !== '/' ? `/sign-in?next=${encodeURIComponent(next)}` : '/sign-in',
  },
  sheets: { path: '/sheets', build: () => '/sheets' },
  sheet: { path: '/sheets/:sheetId', build: (sheetId: string) => `/sheets/${sheetId}` },
  equipment: { path: '/equipment', build: () => '/equipment' },
  criteria: { path: '/criteria', build: () => '/criteria' },
  adminUsers: { path: '/admin/users', build: () => '/admin/users' },
} as const;
