import type { Role } from '@holdfast/shared';

/** The seeded demo sign-ins (demo only; see the README). */
export const demoPassword = 'holdfast-demo';

export interface DemoUser {
  email: string;
  displayName: string;
  initials: string;
  role: Role;
}

export const demoUsers = {
  engineer: {
    email: 'engineer@holdfast.test',
    displayName: 'Erin Vale',
    initials: 'EV',
    role: 'engineer',
  },
  engineer2: {
    email: 'engineer2@holdfast.test',
    displayName: 'Tomas Reed',
    initials: 'TR',
    role: 'engineer',
  },
  checker: {
    email: 'checker@holdfast.test',
    displayName: 'Mara Lind',
    initials: 'ML',
    role: 'checker',
  },
  checker2: {
    email: 'checker2@holdfast.test',
    displayName: 'Idris Okafor',
    initials: 'IO',
    role: 'checker',
  },
  viewer: {
    email: 'viewer@holdfast.test',
    displayName: 'Pia Novak',
    initials: 'PN',
    role: 'viewer',
  },
  admin: { email: 'admin@holdfast.test', displayName: 'Sam Ortiz', initials: 'SO', role: 'admin' },
  technician: {
    email: 'technician@holdfast.test',
    displayName: 'Noor Halden',
    initials: 'NH',
    role: 'technician',
  },
} as const satisfies Record<string, DemoUser>;

export type DemoUserKey = keyof typeof demoUsers;
