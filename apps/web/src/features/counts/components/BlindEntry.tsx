import { Alert, Badge, Button, Card, Group, Progress, Stack, Text, TextInput, Title } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { modals } from '@mantine/modals';
import { notifications } from '@mantine/notifications';
import { IconCheck, IconDeviceFloppy, IconPlus, IconSend } from '@tabler/icons-react';
import { useMemo, useState } from 'react';
import { formatQuantity } from '../../../lib/amounts';
import { unitLabel } from '../../../lib/material-words';
import { newIdempotencyKey } from '../../../lib/upload';
import { useSaveEntries, useSubmitCount } from '../api/count-actions';
import type { Count, CountEntry, CountLine } from '../api/types';
import { FoundLotModal } from './FoundLotModal';

const QUANTITY = /^\d{1,11}(\.\d{1,3})?$/;

function groupByLocation(lines: CountLine[]): [string, CountLine[]][] {
  const groups = new Map<string, CountLine[]>();
  for (const line of lines) {
    const list = groups.get(line.locationName) ?? [];
    list.push(line);
    groups.set(line.locationName, list);
  }
  return [...groups.entries()];
}

/**
 * Counting on a phone: each lot at each location, with a box for what is on the shelf. The
 * expected figures are not shown (blind entry) unless the API sends them (to an owner).
 */
export function BlindEntry({ count }: { count: Count }) {
  const save = useSaveEntries(count.id);
  const submit = useSubmitCount(count.id);
  const [foundOpened, found] = useDisclosure(false);
  const [submitKey] = useState(newIdempotencyKey);
  const [typed, setTyped] = useState<Record<string, string>>({});
  const valueOf = (line: CountLine) =>
    typed[line.id] ?? (line.countedQuantity === null ? '' : String(Number(line.countedQuantity)));

  const problems = useMemo(() => {
    const out: Record<string, string> = {};
    for (const [id, value] of Object.entries(typed)) {
      if (value.trim() !== '' && !QUANTITY.test(value.trim())) {
        out[id] = 'A number, 0 or more, at most 3 decimal places';
      }
    }
    return out;
  }, [typed]);

  const changed: CountEntry[] = count.lines
    .filter((line) => typed[line.id] !== undefined && typed[line.id]?.trim() !== '' && !problems[line.id])
    .filter(
      (line) => line.countedQuantity === null || Number(line.countedQuantity) !== Number(typed[line.id]),
    )
    .map((line) => ({
      lotId: line.lotId,
      locationId: line.locationId,
      countedQuantity: (typed[line.id] ?? '').trim(),
    }));
  const filled = count.lines.filter((line) => valueOf(line).trim() !== '' && !problems[line.id]).length;
  const missing = count.lines.filter((line) => valueOf(line).trim() === '');

  /** Forget what was typed for the lines just saved (the count now holds them); keep the rest. */
  const forgetSaved = (saved: CountEntry[]) =>
    setTyped((current) => {
      const next = { ...current };
      for (const line of count.lines) {
        if (saved.some((entry) => entry.lotId === line.lotId && entry.locationId === line.locationId)) {
          delete next[line.id];
        }
      }
      return next;
    });

  const saveNow = () =>
    save.mutate(changed, {
      onSuccess: () => {
        forgetSaved(changed);
        notifications.show({
          color: 'green',
          message: `${changed.length} line${changed.length === 1 ? '' : 's'} saved.`,
        });
      },
    });

  const askSubmit = () => {
    if (Object.keys(problems).length > 0) {
      notifications.show({
        color: 'red',
        message: 'Some boxes do not hold a number: see the ones marked in red.',
      });
      return;
    }
    if (missing.length > 0) {
      notifications.show({
        color: 'red',
        title: `${missing.length} line${missing.length === 1 ? ' is' : 's are'} not counted yet`,
        message: 'Enter 0 for anything that is not on the shelf.',
      });
      return;
    }
    modals.openConfirmModal({
      title: `Submit count ${count.number}?`,
      children: (
        <Text size="sm">
          Every line is counted. Once submitted, the counts can no longer be changed and the differences from
          the ledger show. The owner then approves them, and each difference is posted as an adjustment.
        </Text>
      ),
      labels: { confirm: 'Submit', cancel: 'Keep counting' },
      onConfirm: () =>
        submit.mutate(
          { lines: changed, key: submitKey },
          {
            onSuccess: () => {
              setTyped({});
              notifications.show({
                color: 'green',
                message: `Count ${count.number} is submitted for the owner's approval.`,
              });
            },
          },
        ),
    });
  };

  return (
    <Stack gap="md">
      <Card p="md">
        <Group justify="space-between" wrap="wrap" gap="sm">
          <Stack gap={4} style={{ flex: 1, minWidth: 200 }}>
            <Text size="sm" fw={600}>
              {filled} of {count.lines.length} lines counted
            </Text>
            <Progress
              value={count.lines.length === 0 ? 0 : (filled / count.lines.length) * 100}
              aria-label="Lines counted"
            />
          </Stack>
          <Group gap="xs">
            <Button variant="default" leftSection={<IconPlus size={16} />} onClick={found.open}>
              Found a lot not listed
            </Button>
            <Button
              variant="light"
              leftSection={<IconDeviceFloppy size={16} />}
              disabled={changed.length === 0}
              loading={save.isPending}
              onClick={saveNow}
            >
              Save {changed.length > 0 ? `(${changed.length})` : ''}
            </Button>
            <Button leftSection={<IconSend size={16} />} loading={submit.isPending} onClick={askSubmit}>
              Submit
            </Button>
          </Group>
        </Group>
      </Card>
      {count.expectedVisible ? (
        <Alert color="blue" variant="light" title="You see the expected figures">
          As the owner you see what the ledger expects; whoever counts does not, until the count is submitted.
        </Alert>
      ) : (
        <Text size="sm" c="dimmed">
          Count what is on the shelf and type it in{' '}
          {count.lines[0] ? unitLabel(count.lines[0].stockUnit) : 'the stock unit'} as shown beside each box.
          Enter 0 for what is not there. Save as you go; nothing is final until you submit.
        </Text>
      )}
      {count.lines.length === 0 ? (
        <Alert color="gray" variant="light">
          The ledger has nothing at these locations. If you find stock there, add it with &quot;Found a lot
          not listed&quot;.
        </Alert>
      ) : null}
      {groupByLocation(count.lines).map(([location, lines]) => (
        <Card key={location} p="md">
          <Title order={2} fz="md" mb="sm">
            {location}
          </Title>
          <Stack gap="sm">
            {lines.map((line) => {
              const value = valueOf(line);
              const done = value.trim() !== '' && !problems[line.id];
              return (
                <Group key={line.id} justify="space-between" align="flex-start" wrap="wrap" gap="xs">
                  <Stack gap={0} style={{ flex: 1, minWidth: 180 }}>
                    <Group gap={6}>
                      <Text size="sm" fw={600}>
                        {line.materialName}
                      </Text>
                      {done ? (
                        <IconCheck size={14} color="var(--mantine-color-green-7)" aria-label="counted" />
                      ) : null}
                      {line.foundDuringCount ? (
                        <Badge
                          size="xs"
                          variant="outline"
                          styles={{ label: { textTransform: 'none', overflow: 'visible' } }}
                        >
                          Found during the count
                        </Badge>
                      ) : null}
                    </Group>
                    <Text size="xs" c="dimmed">
                      {line.materialCode}
                      {line.batchNumber ? ` · batch ${line.batchNumber}` : ' · no batch'}
                      {line.expectedQuantity !== null
                        ? ` · ledger ${formatQuantity(line.expectedQuantity, line.stockUnit)}`
                        : ''}
                    </Text>
                  </Stack>
                  <TextInput
                    aria-label={`Counted ${line.materialName}${line.batchNumber ? ` ${line.batchNumber}` : ''} at ${line.locationName}`}
                    inputMode="decimal"
                    w={150}
                    size="md"
                    value={value}
                    error={problems[line.id]}
                    rightSection={
                      <Text size="xs" c="dimmed" pr={6}>
                        {unitLabel(line.stockUnit)}
                      </Text>
                    }
                    rightSectionWidth={42}
                    onChange={(event) => {
                      const next = event.currentTarget.value;
                      setTyped((current) => ({ ...current, [line.id]: next }));
                    }}
                  />
                </Group>
              );
            })}
          </Stack>
        </Card>
      ))}
      <FoundLotModal count={count} opened={foundOpened} onClose={found.close} />
    </Stack>
  );
}
