import { Suspense, useEffect } from 'react';
import { ActionIcon, AppShell, Burger, Group, Text } from '@mantine/core';
import { IconLayoutSidebarLeftCollapse, IconLayoutSidebarLeftExpand } from '@tabler/icons-react';
import { useDisclosure, useMediaQuery } from '@mantine/hooks';
import { Link, Navigate, Outlet, useLocation } from 'react-router-dom';
import { Wordmark } from '../components/brand/wordmark';
import { PageLoader } from '../components/page-loader';
import { SafetyCaution } from '../components/safety-caution';
import { paths } from '../config/paths';
import { UserMenu } from '../features/auth/components/user-menu';
import { DeviceOutboxNotice } from '../features/field-records/components/device-outbox-notice';
import { useRouteHandle } from '../lib/route-handle';
import { useSession } from '../lib/session';
import { FrameNav } from './frame-nav';
import { useNavCollapsed } from './use-nav-collapsed';
import classes from './app-frame.module.css';

/** The signed-in frame: header, navigation, page, and the safety caution on calculation pages. */
export function AppFrame() {
  const session = useSession();
  const location = useLocation();
  const handle = useRouteHandle();
  const [navOpen, { toggle, close }] = useDisclosure(false);
  const wideScreen = useMediaQuery('(min-width: 48em)') ?? false;
  const [navCollapsed, toggleNavCollapsed] = useNavCollapsed(
    session.user?.id ?? '',
    handle.compactNav === true,
  );

  useEffect(() => {
    document.title = handle.title ? `${handle.title} · Holdfast` : 'Holdfast';
  }, [handle.title]);
  // Close the mobile navigation after following a link.
  useEffect(close, [location.pathname, close]);

  if (session.status !== 'signed-in' || !session.user) {
    return <Navigate to={paths.signIn.build(location.pathname + location.search)} replace />;
  }

  return (
    <AppShell
      header={{ height: 56 }}
      navbar={{
        width: 232,
        breakpoint: 'sm',
        collapsed: { mobile: !navOpen, desktop: navCollapsed },
      }}
      footer={handle.caution ? { height: { base: 76, md: 48 } } : undefined}
      padding="lg"
      className={classes.shell}
    >
      <a
        href="#main-content"
        className={classes.skip}
        onClick={(e) => {
          // Move focus, not only the scroll position, so the next Tab continues in the page.
          e.preventDefault();
          document.getElementById('main-content')?.focus();
        }}
      >
        Skip to main content
      </a>
      <AppShell.Header className={classes.header}>
        <Group h="100%" px="md" justify="space-between" wrap="nowrap">
          <Group gap="sm" wrap="nowrap">
            <Burger
              opened={navOpen}
              onClick={toggle}
              hiddenFrom="sm"
              size="sm"
              color="white"
              aria-label={navOpen ? 'Close navigation' : 'Open navigation'}
            />
            <ActionIcon
              visibleFrom="sm"
              variant="subtle"
              color="white"
              size="lg"
              onClick={toggleNavCollapsed}
              aria-label={navCollapsed ? 'Show navigation' : 'Hide navigation'}
              aria-expanded={!navCollapsed}
              aria-controls="frame-nav"
              data-testid="nav-toggle"
            >
              {navCollapsed ? (
                <IconLayoutSidebarLeftExpand size={20} aria-hidden />
              ) : (
                <IconLayoutSidebarLeftCollapse size={20} aria-hidden />
              )}
            </ActionIcon>
            <Link
              to={paths.home.build()}
              className={classes.brand}
              aria-label="Holdfast, work queue"
            >
              <Wordmark />
            </Link>
            <Text size="xs" className={classes.tagline} visibleFrom="md">
              brake calculation sheets
            </Text>
          </Group>
          <UserMenu />
        </Group>
      </AppShell.Header>
      {/* A collapsed navigation is only moved off screen: inert keeps Tab out of it. */}
      <AppShell.Navbar className={classes.navbar} id="frame-nav" inert={wideScreen && navCollapsed}>
        <FrameNav user={session.user} />
      </AppShell.Navbar>
      <AppShell.Main className={classes.main} id="main-content" tabIndex={-1}>
        <div className={handle.wide ? classes.wide : classes.content}>
          <DeviceOutboxNotice key={session.user.id} user={session.user} />
          <Suspense fallback={<PageLoader />}>
            <Outlet />
          </Suspense>
        </div>
      </AppShell.Main>
      {handle.caution ? (
        <AppShell.Footer className={classes.footer}>
          <SafetyCaution variant="footer" />
        </AppShell.Footer>
      ) : null}
    </AppShell>
  );
}
