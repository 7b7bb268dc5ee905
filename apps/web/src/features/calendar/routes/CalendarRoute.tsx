import { Badge, Box, Button, Group, Paper, SegmentedControl, SimpleGrid, Stack, Text } from '@mantine/core';
import { useMediaQuery } from '@mantine/hooks';
import { IconChevronLeft, IconChevronRight } from '@tabler/icons-react';
import dayjs from 'dayjs';
import { useState } from 'react';
import { useSearchParams } from 'react-router-dom';
import { PageHeader } from '../../../components/PageHeader';
import { PageLoader } from '../../../components/PageLoader';
import { QueryError } from '../../../components/QueryError';
import { formatDate } from '../../../lib/format';
import { useCalendar, type CalendarEntry } from '../api/get-calendar';
import { CalendarJob } from '../components/CalendarJob';
import { isMonth, monthDays, monthTitle, shiftMonth, WEEKDAYS } from '../components/month';

/** The scheduled jobs of a month, each with whether its materials are all reserved or short. */
export function CalendarRoute() {
  const [params, setParams] = useSearchParams();
  const asked = params.get('month');
  const month = isMonth(asked) ? asked : dayjs().format('YYYY-MM');
  const wide = useMediaQuery('(min-width: 62em)');
  const [view, setView] = useState<'month' | 'list' | null>(null);
  const shown = view ?? (wide ? 'month' : 'list');
  const days = monthDays(month);
  const from = days[0]?.date ?? `${month}-01`;
  const to = days[days.length - 1]?.date ?? `${month}-28`;
  const calendar = useCalendar(from, to);
  const today = dayjs().format('YYYY-MM-DD');

  const byDay = new Map<string, CalendarEntry[]>();
  for (const entry of calendar.data ?? []) {
    byDay.set(entry.scheduledOn, [...(byDay.get(entry.scheduledOn) ?? []), entry]);
  }
  const inMonth = (calendar.data ?? []).filter((e) => e.scheduledOn.startsWith(month));
  const short = inMonth.filter((e) => e.materialState === 'short').length;
  const goTo = (m: string) => setParams({ month: m }, { replace: true });

  return (
    <>
      <PageHeader
        title="Calendar"
        description="Scheduled jobs day by day, with the state of their materials: all reserved, short, or not reserved yet."
      />
      <Stack gap="sm">
        <Group justify="space-between" wrap="wrap" gap="sm">
          <Group gap="xs">
            <Button
              variant="default"
              size="sm"
              px="xs"
              aria-label="Previous month"
              onClick={() => goTo(shiftMonth(month, -1))}
            >
              <IconChevronLeft size={18} />
            </Button>
            <Text fw={800} fz="lg" miw={170} ta="center" aria-live="polite">
              {monthTitle(month)}
            </Text>
            <Button
              variant="default"
              size="sm"
              px="xs"
              aria-label="Next month"
              onClick={() => goTo(shiftMonth(month, 1))}
            >
              <IconChevronRight size={18} />
            </Button>
            <Button variant="subtle" size="sm" onClick={() => goTo(dayjs().format('YYYY-MM'))}>
              This month
            </Button>
          </Group>
          <Group gap="sm">
            {calendar.data ? (
              <Group gap="xs">
                <Text size="sm" c="dimmed">
                  {inMonth.length} job{inMonth.length === 1 ? '' : 's'} scheduled
                </Text>
                {short > 0 ? (
                  <Badge color="red" variant="light">
                    {short} short
                  </Badge>
                ) : null}
              </Group>
            ) : null}
            <SegmentedControl
              size="xs"
              aria-label="View"
              value={shown}
              onChange={(v) => setView(v === 'list' ? 'list' : 'month')}
              data={[
                { value: 'month', label: 'Month' },
                { value: 'list', label: 'List' },
              ]}
            />
          </Group>
        </Group>

        {calendar.isPending ? (
          <PageLoader label="Loading the calendar…" />
        ) : calendar.isError ? (
          <QueryError
            what="the calendar"
            error={calendar.error}
            onRetry={() => void calendar.refetch()}
            retrying={calendar.isFetching}
          />
        ) : shown === 'month' ? (
          <Paper
            withBorder
            radius="md"
            style={{ overflow: 'hidden' }}
            aria-label={`Jobs in ${monthTitle(month)}`}
            role="region"
          >
            <SimpleGrid cols={7} spacing={0} aria-hidden>
              {WEEKDAYS.map((d) => (
                <Box key={d} p={6} bg="topcoat.1">
                  <Text size="xs" fw={700} ta="center">
                    {d}
                  </Text>
                </Box>
              ))}
            </SimpleGrid>
            <SimpleGrid cols={7} spacing={0}>
              {days.map((d) => {
                const entries = byDay.get(d.date) ?? [];
                return (
                  <Box
                    key={d.date}
                    role="group"
                    aria-label={`${formatDate(d.date)}: ${entries.length === 0 ? 'no jobs' : `${entries.length} job${entries.length === 1 ? '' : 's'}`}`}
                    p={4}
                    mih={104}
                    bg={!d.inMonth ? 'gray.0' : d.weekend ? 'topcoat.0' : 'white'}
                    style={{
                      borderTop: '1px solid var(--mantine-color-gray-3)',
                      borderRight: '1px solid var(--mantine-color-gray-2)',
                    }}
                  >
                    <Text
                      size="xs"
                      fw={d.date === today ? 800 : 600}
                      c={d.inMonth ? (d.date === today ? 'resin.8' : undefined) : 'dimmed'}
                      mb={4}
                    >
                      {d.day}
                      {d.date === today ? ' · today' : ''}
                    </Text>
                    <Stack gap={4}>
                      {entries.map((e) => (
                        <CalendarJob key={e.id} entry={e} />
                      ))}
                    </Stack>
                  </Box>
                );
              })}
            </SimpleGrid>
          </Paper>
        ) : inMonth.length === 0 ? (
          <Paper withBorder p="lg" radius="md">
            <Text size="sm" c="dimmed">
              No job is scheduled in {monthTitle(month)}. Give a job a date on its page and it appears here.
            </Text>
          </Paper>
        ) : (
          <Stack gap="xs" role="region" aria-label={`Jobs in ${monthTitle(month)}`}>
            {[...new Set(inMonth.map((e) => e.scheduledOn))].sort().map((date) => (
              <Paper key={date} withBorder p="sm" radius="md">
                <Text size="sm" fw={700} mb={6}>
                  {dayjs(date)
                    .toDate()
                    .toLocaleDateString('en-GB', { weekday: 'long', day: 'numeric', month: 'long' })}
                </Text>
                <Stack gap={6}>
                  {(byDay.get(date) ?? []).map((e) => (
                    <CalendarJob key={e.id} entry={e} />
                  ))}
                </Stack>
              </Paper>
            ))}
          </Stack>
        )}
        {shown === 'month' && calendar.data && inMonth.length === 0 ? (
          <Text size="sm" c="dimmed">
            No job is scheduled in {monthTitle(month)}. Give a job a date on its page and it appears here.
          </Text>
        ) : null}
      </Stack>
    </>
  );
}
