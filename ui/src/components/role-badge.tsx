import { Badge, type BadgeProps } from '@mantine/core';
import type { Role } from '@holdfast/shared';

const roleColour: Record<Role, string> = {
  engineer: 'steel',
  checker: 'teal',
  viewer: 'gray',
  admin: 'amber',
  technician: 'grape',
};

export const roleLabel: Record<Role, string> = {
  engineer: 'Engineer',
  checker: 'Checker',
  viewer: 'Viewer',
  admin: 'Admin',
  technician: 'Technician',
};

export function RoleBadge({ role, ...rest }: { role: Role } & Omit<BadgeProps, 'color'>) {
  return (
    <Badge color={roleColour[role]} variant="light" {...rest}>
      {roleLabel[role]}
    </Badge>
  );
}
