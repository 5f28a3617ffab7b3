import { Badge, type BadgeProps } from '@mantine/core';
import type { Role } from '@holdfast/shared';

const roleColour: Record<Role, string> = {
  engineer: 'steel',
  checker: 'teal',
  viewer: 'gray',
  admin: 'amber',
  technician: 'grape',
};

/** The role names, with the trade's word where the role's own is not it (as in the README). */
export const roleLabel: Record<Role, string> = {
  engineer: 'Engineer',
  checker: 'Checker',
  viewer: 'Viewer (plant engineer)',
  admin: 'Admin',
  technician: 'Technician (fitter)',
};

export function RoleBadge({ role, ...rest }: { role: Role } & Omit<BadgeProps, 'color'>) {
  return (
    <Badge color={roleColour[role]} variant="light" {...rest}>
      {roleLabel[role]}
    </Badge>
  );
}
