import type { RoleValue } from './database.js';

/** Password of every demo user. For the demo only: change or deactivate these users in real use. */
export const DEMO_PASSWORD = 'holdfast-demo';

export interface DemoUser {
  email: string;
  displayName: string;
  initials: string;
  role: RoleValue;
}

/**
 * Invented people; a second engineer and checker let segregation of duties be shown; the
 * technician is the fitter who brings field records back.
 */
export const demoUsers: readonly DemoUser[] = [
  { email: 'engineer@holdfast.test', displayName: 'Erin Vale', initials: 'EV', role: 'engineer' },
  { email: 'engineer2@holdfast.test', displayName: 'Tomas Reed', initials: 'TR', role: 'engineer' },
  { email: 'checker@holdfast.test', displayName: 'Mara Lind', initials: 'ML', role: 'checker' },
  { email: 'checker2@holdfast.test', displayName: 'Idris Okafor', initials: 'IO', role: 'checker' },
  { email: 'viewer@holdfast.test', displayName: 'Pia Novak', initials: 'PN', role: 'viewer' },
  { email: 'admin@holdfast.test', displayName: 'Sam Ortiz', initials: 'SO', role: 'admin' },
  {
    email: 'technician@holdfast.test',
    displayName: 'Noor Halden',
    initials: 'NH',
    role: 'technician',
  },
];
