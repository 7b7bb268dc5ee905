import { Anchor, Card, List, SimpleGrid, Stack, Text, ThemeIcon, Title } from '@mantine/core';
import { IconCheck } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { PageHeader } from '../../../components/PageHeader';
import { navigationFor } from '../../../config/navigation';
import { paths } from '../../../config/paths';
import { withArticle } from '../../../lib/roles';
import { useSessionUser } from '../../../lib/session';
import { EstimatorPanel } from '../components/EstimatorPanel';
import { OwnerStorePanel } from '../components/OwnerStorePanel';
import { roleIntros } from '../components/role-intros';

function greeting(now: Date): string {
  const hour = now.getHours();
  if (hour < 12) {
    return 'Good morning';
  }
  if (hour < 18) {
    return 'Good afternoon';
  }
  return 'Good evening';
}

export function HomeRoute() {
  const user = useSessionUser();
  const intro = roleIntros[user.role];
  const firstName = user.name.trim().split(/\s+/)[0] ?? user.name;
  // Only screens that exist today, from the same table as the navbar.
  const ready = navigationFor(user.role).filter((entry) => entry.to !== paths.home);

  return (
    <Stack gap="lg" maw={960}>
      <PageHeader
        title={`${greeting(new Date())}, ${firstName}`}
        description={
          <>
            You are signed in to {user.companyName} as {withArticle(user.role)}.
          </>
        }
      />
      <SimpleGrid cols={{ base: 1, md: 2 }} spacing="lg">
        <Card>
          <Title order={2} fz="lg" mb="xs">
            Your work in Potlife
          </Title>
          <Text size="sm" c="dimmed" mb="md">
            {intro.summary}
          </Text>
          <List
            spacing="xs"
            size="sm"
            icon={
              <ThemeIcon size={20} radius="xl" variant="light">
                <IconCheck size={12} />
              </ThemeIcon>
            }
          >
            {intro.duties.map((duty) => (
              <List.Item key={duty}>{duty}</List.Item>
            ))}
          </List>
        </Card>
        <Card>
          <Title order={2} fz="lg" mb="xs">
            Ready today
          </Title>
          {ready.length > 0 ? (
            <Stack gap="md">
              {ready.map((entry) => (
                <div key={entry.key}>
                  <Anchor component={Link} to={entry.to} fw={700} size="sm">
                    {entry.label}
                  </Anchor>
                  <Text size="sm" c="dimmed">
                    {entry.summary}
                  </Text>
                </div>
              ))}
              <Text size="sm" c="dimmed">
                The screens for the rest of your work join the menu as they are finished.
              </Text>
            </Stack>
          ) : (
            <Text size="sm" c="dimmed">
              Your company is set up and you are signed in. The screens for this work join the menu as they
              are finished; your company&apos;s owner manages who can sign in and with which role.
            </Text>
          )}
        </Card>
      </SimpleGrid>
      {user.role === 'owner' ? (
        <SimpleGrid cols={{ base: 1, md: 2 }} spacing="lg">
          <OwnerStorePanel />
          <EstimatorPanel />
        </SimpleGrid>
      ) : null}
      {user.role === 'estimator' ? <EstimatorPanel /> : null}
    </Stack>
  );
}
