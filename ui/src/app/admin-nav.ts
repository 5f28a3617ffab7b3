import { IconMailExclamation, IconUsers } from '@tabler/icons-react';
import type { NavItem } from '../lib/nav-item';

/** Links in the frame's "Administration" navigation group. */
export const adminNav: NavItem[] = [
  { label: 'Users', to: '/admin/users', icon: IconUsers, roles: ['admin'] },
  { label: 'Undelivered mail', to: '/admin/mail', icon: IconMailExclamation, roles: ['admin'] },
];
