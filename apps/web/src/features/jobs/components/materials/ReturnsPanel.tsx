import { Button, Group, Paper, SimpleGrid, Stack, Table, Text, TextInput } from '@mantine/core';
import { notifications } from '@mantine/notifications';
import { IconArrowBackUp } from '@tabler/icons-react';
import { useState } from 'react';
import { formatDate } from '../../../../lib/format';
import { newIdempotencyKey } from '../../../../lib/upload';
import { useReturnMaterials } from '../../api/return-materials';
import type { JobDetail, PickList, Reservations } from '../../api/types';
import { formatQuantity, unitLabel } from '../../utils/format';
import { lotLabel } from './FlagBadges';

const WHOLE = /^\d{1,5}$/;
const PART = /^\d{1,9}(\.\d{1,3})?$/;

interface ReturnRow {
  fullPacks: string;
  partQuantity: string;
}

interface ReturnsPanelProps {
  job: JobDetail;
  reservations: Reservations;
  pickList: PickList | undefined;
  canReturn: boolean;
}

/** What went out and came back; for the storeman, the return form lot by lot. */
export function ReturnsPanel({ job, reservations, pickList, canReturn }: ReturnsPanelProps) {
  const back = useReturnMaterials(job.id);
  const [rows, setRows] = useState<Record<string, ReturnRow>>({});
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [note, setNote] = useState('');
  const [key, setKey] = useState(newIdempotencyKey);

  // Lots that went out to this job: they come back into the same lot.
  const issuedLots = reservations.materials.flatMap((m) =>
    m.reservations
      .filter((r) => Number(r.issuedQuantity) > 0)
      .map((r) => ({ lot: r.lot, material: m.material, unit: m.unit, issued: r.issuedQuantity })),
  );
  const row = (lotId: string): ReturnRow => rows[lotId] ?? { fullPacks: '', partQuantity: '' };
  const set = (lotId: string, change: Partial<ReturnRow>) =>
    setRows((r) => ({ ...r, [lotId]: { ...row(lotId), ...change } }));

  const submit = () => {
    const found: Record<string, string> = {};
    const lines: { lotId: string; fullPacks?: number; partQuantity?: string }[] = [];
    for (const item of issuedLots) {
      const r = row(item.lot.id);
      const full = r.fullPacks.trim();
      const part = r.partQuantity.trim();
      if (full === '' && part === '') {
        continue;
      }
      if (full !== '' && !WHOLE.test(full)) {
        found[`${item.lot.id}:full`] = 'A whole number of unopened packs';
      }
      if (part !== '' && !PART.test(part)) {
        found[`${item.lot.id}:part`] = 'What the part-pack weighs or measures, like 7.4';
      }
      lines.push({
        lotId: item.lot.id,
        ...(full !== '' ? { fullPacks: Number(full) } : {}),
        ...(part !== '' ? { partQuantity: part } : {}),
      });
    }
    setErrors(found);
    if (Object.keys(found).length > 0) {
      return;
    }
    if (lines.length === 0) {
      notifications.show({
        color: 'red',
        title: 'Nothing was returned',
        message: 'Enter the full packs or the part-pack of at least one lot.',
      });
      return;
    }
    back.mutate(
      { lines, note: note.trim() === '' ? null : note.trim(), key },
      {
        onSuccess: (result) => {
          setRows({});
          setKey(newIdempotencyKey());
          setNote('');
          notifications.show({
            color: 'green',
            title: `Return booked for ${job.reference}`,
            message: result.lines
              .map((l) => `${formatQuantity(l.quantity, l.unit, 3)} ${l.material.name} to ${l.locationName}`)
              .join(', '),
          });
          for (const w of result.warnings) {
            notifications.show({ color: 'orange', message: w });
          }
        },
      },
    );
  };

  return (
    <Paper withBorder p="md" radius="md" component="section" aria-label="Issued and returned">
      <Stack gap="sm">
        <Text fw={700}>Issued and returned</Text>
        {pickList && pickList.issued.length > 0 ? (
          <Table verticalSpacing={4} fz="sm">
            <Table.Thead>
              <Table.Tr>
                <Table.Th>Material</Table.Th>
                <Table.Th ta="right">Issued</Table.Th>
                <Table.Th ta="right">Returned</Table.Th>
              </Table.Tr>
            </Table.Thead>
            <Table.Tbody>
              {pickList.issued.map((i) => (
                <Table.Tr key={i.material.id}>
                  <Table.Td>{i.material.name}</Table.Td>
                  <Table.Td ta="right">{formatQuantity(i.issued, i.unit, 3)}</Table.Td>
                  <Table.Td ta="right">{formatQuantity(i.returned, i.unit, 3)}</Table.Td>
                </Table.Tr>
              ))}
            </Table.Tbody>
          </Table>
        ) : (
          <Text size="sm" c="dimmed">
            Nothing has gone out to this job yet.
          </Text>
        )}

        {canReturn && issuedLots.length > 0 ? (
          <Stack gap="xs">
            <Text size="sm" fw={600}>
              Book a return
            </Text>
            <Text size="xs" c="dimmed">
              Unopened packs go back as they are; weigh or measure a part-used pack and enter what is left in
              it.
            </Text>
            {issuedLots.map((item) => (
              <Paper key={item.lot.id} withBorder radius="sm" p="sm">
                <Stack gap={6}>
                  <div>
                    <Text size="sm" fw={700}>
                      {item.material.name}
                    </Text>
                    <Text size="xs" c="dimmed">
                      {lotLabel(item.lot)}
                      {item.lot.expiresOn ? ` · expires ${formatDate(item.lot.expiresOn)}` : ''} · issued{' '}
                      {formatQuantity(item.issued, item.unit, 3)}
                    </Text>
                  </div>
                  <SimpleGrid cols={{ base: 2 }} spacing="xs" maw={420}>
                    <TextInput
                      size="xs"
                      label="Full packs"
                      aria-label={`Full packs back of ${item.material.name}, ${lotLabel(item.lot)}`}
                      inputMode="numeric"
                      value={row(item.lot.id).fullPacks}
                      error={errors[`${item.lot.id}:full`]}
                      onChange={(e) => set(item.lot.id, { fullPacks: e.currentTarget.value })}
                    />
                    <TextInput
                      size="xs"
                      label={`Part-pack (${unitLabel(item.unit) || 'each'})`}
                      aria-label={`Part-pack back of ${item.material.name}, ${lotLabel(item.lot)}`}
                      inputMode="decimal"
                      value={row(item.lot.id).partQuantity}
                      error={errors[`${item.lot.id}:part`]}
                      onChange={(e) => set(item.lot.id, { partQuantity: e.currentTarget.value })}
                    />
                  </SimpleGrid>
                </Stack>
              </Paper>
            ))}
            <Group align="flex-end" gap="sm" wrap="wrap">
              <TextInput
                label="Note"
                maxLength={500}
                value={note}
                onChange={(e) => setNote(e.currentTarget.value)}
                w={{ base: '100%', sm: 300 }}
              />
              <Button leftSection={<IconArrowBackUp size={16} />} loading={back.isPending} onClick={submit}>
                Book the return
              </Button>
            </Group>
          </Stack>
        ) : null}
      </Stack>
    </Paper>
  );
}
