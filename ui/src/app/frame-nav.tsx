import { NavLink as MantineNavLink, ScrollArea, Stack, Text } from '@mantine/core';
import { Link, useMatch } from 'react-router-dom';
import type { User } from '@holdfast/shared';
import type { NavItem } from '../lib/nav-item';
import { adminNav } from './admin-nav';
import { workbenchNav } from './workbench-routes';
import classes from './app-frame.module.css';

function visible(items: NavItem[], user: User): NavItem[] {
  return items.filter((item) => !item.roles || item.roles.includes(user.role));
}

function NavEntry({ item }: { item: NavItem }) {
  const active = useMatch({ path: item.to, end: item.end ?? false }) !== null;
  return (
    <MantineNavLink
      component={Link}
      to={item.to}
      active={active}
      aria-current={active ? 'page' : undefined}
      label={item.label}
      leftSection={<item.icon size={18} stroke={1.7} aria-hidden />}
      className={classes.navLink}
    />
  );
}

function NavGroup({ label, items }: { label: string; items: NavItem[] }) {
  if (items.length === 0) return null;
  return (
    <Stack gap={2} component="section" aria-label={label}>
      <Text className={classes.navGroup}>{label}</Text>
      {items.map((item) => (
        <NavEntry key={item.to} item={item} />
      ))}
    </Stack>
  );
}

export function FrameNav({ user }: { user: User }) {
  return (
    <ScrollArea component="nav" aria-label="Main" className={classes.nav}>
      <Stack gap="lg" p="sm">
        <NavGroup label="Workbench" items={visible(workbenchNav, user)} />
        <NavGroup label="Administration" items={visible(adminNav, user)} />
      </Stack>
    </ScrollArea>
  );
}
