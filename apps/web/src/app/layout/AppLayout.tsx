import { AppShell, Box, Burger, Button, Group, NavLink, ScrollArea, Stack, Text } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { IconBuildingWarehouse, IconLogout } from '@tabler/icons-react';
import { useQueryClient } from '@tanstack/react-query';
import { Suspense } from 'react';
import { Link, Outlet, useLocation } from 'react-router-dom';
import { Brand } from '../../components/Brand';
import { ErrorBoundary } from '../../components/ErrorBoundary';
import { PageLoader } from '../../components/PageLoader';
import { RoleBadge } from '../../components/RoleBadge';
import { isActiveEntry, navigationFor } from '../../config/navigation';
import { paths } from '../../config/paths';
import { endSession, useSessionUser } from '../../lib/session';
import { brandColors } from '../../theme';

/** The frame of every signed-in screen: header, role-dependent navbar, the screen itself. */
export function AppLayout() {
  const user = useSessionUser();
  const queryClient = useQueryClient();
  const location = useLocation();
  const [navOpened, nav] = useDisclosure(false);
  const entries = navigationFor(user.role);

  return (
    <AppShell
      header={{ height: 60 }}
      navbar={{ width: 248, breakpoint: 'sm', collapsed: { mobile: !navOpened } }}
      padding={{ base: 'md', sm: 'lg' }}
    >
      <AppShell.Header bg={brandColors.chrome} c="white" withBorder={false}>
        <Group h="100%" px="md" justify="space-between" wrap="nowrap" gap="sm">
          <Group gap="sm" wrap="nowrap">
            <Burger
              opened={navOpened}
              onClick={nav.toggle}
              hiddenFrom="sm"
              size="sm"
              color="white"
              aria-label={navOpened ? 'Close the menu' : 'Open the menu'}
            />
            <Link to={paths.home} aria-label="Potlife home" style={{ textDecoration: 'none' }}>
              <Brand tone="dark" />
            </Link>
          </Group>
          <Group gap="md" wrap="nowrap">
            <Group gap={6} wrap="nowrap" visibleFrom="sm" data-testid="header-company">
              <IconBuildingWarehouse size={18} color={brandColors.laminate} aria-hidden />
              <Text size="sm" fw={600} c={brandColors.chromeText} lineClamp={1}>
                {user.companyName}
              </Text>
            </Group>
            <Group gap={8} wrap="nowrap" visibleFrom="sm" data-testid="header-user">
              <Text size="sm" c="white" lineClamp={1}>
                {user.name}
              </Text>
              <RoleBadge role={user.role} variant="filled" />
            </Group>
            <Button
              variant="subtle"
              color="gray.0"
              size="sm"
              px="xs"
              leftSection={<IconLogout size={18} />}
              aria-label="Sign out"
              onClick={() => endSession(queryClient)}
              styles={{ section: { marginInlineEnd: 'var(--button-section-gap, 6px)' } }}
            >
              <Box component="span" visibleFrom="xs">
                Sign out
              </Box>
            </Button>
          </Group>
        </Group>
      </AppShell.Header>

      <AppShell.Navbar p="sm" aria-label="Main navigation">
        <AppShell.Section hiddenFrom="sm" mb="sm" px="xs">
          <Stack gap={4}>
            <Text size="sm" fw={700}>
              {user.companyName}
            </Text>
            <Group gap={8}>
              <Text size="sm">{user.name}</Text>
              <RoleBadge role={user.role} />
            </Group>
          </Stack>
        </AppShell.Section>
        <AppShell.Section grow component={ScrollArea}>
          <Stack gap={4}>
            {entries.map((entry) => (
              <NavLink
                key={entry.key}
                component={Link}
                to={entry.to}
                label={entry.label}
                leftSection={<entry.icon size={20} stroke={1.7} />}
                active={isActiveEntry(entry, location.pathname)}
                variant="light"
                onClick={nav.close}
                styles={{ root: { borderRadius: 'var(--mantine-radius-md)' }, label: { fontWeight: 600 } }}
              />
            ))}
          </Stack>
        </AppShell.Section>
      </AppShell.Navbar>

      <AppShell.Main bg="topcoat.0">
        <ErrorBoundary resetKey={location.pathname}>
          <Suspense fallback={<PageLoader />}>
            <Outlet />
          </Suspense>
        </ErrorBoundary>
      </AppShell.Main>
    </AppShell>
  );
}
