import { Button, Checkbox, Group, Paper, Select, SimpleGrid, Stack, Text, TextInput } from '@mantine/core';
import { notifications } from '@mantine/notifications';
import { IconPrinter, IconTruckDelivery } from '@tabler/icons-react';
import { useEffect, useState } from 'react';
import { formatDate } from '../../../../lib/format';
import { newIdempotencyKey } from '../../../../lib/upload';
import { useDownloadPickList } from '../../api/download-pick-list';
import { useIssueMaterials } from '../../api/issue-materials';
import type { JobDetail, PickList, PickListLine } from '../../api/types';
import { formatQuantity, unitLabel } from '../../utils/format';
import { CautionsList } from '../estimate/CautionsList';
import { FlagBadges, lotLabel } from './FlagBadges';
import { UnreservedNeeds } from './UnreservedNeeds';

const QUANTITY = /^\d{1,9}(\.\d{1,3})?$/;

interface IssueRow {
  picked: boolean;
  quantity: string;
  locationId: string | null;
}

function lineKey(line: PickListLine): string {
  return `${line.lot.id}`;
}

function rowsFor(lines: PickListLine[]): Record<string, IssueRow> {
  return Object.fromEntries(
    lines.map((l) => [
      lineKey(l),
      { picked: false, quantity: l.quantity, locationId: l.places[0]?.locationId ?? null },
    ]),
  );
}

interface PickListPanelProps {
  job: JobDetail;
  pickList: PickList;
  canIssue: boolean;
  /** why the storeman cannot issue yet, if they cannot */
  issueNote?: string | null;
}

/** The storeman's pick list lot by lot, printable; ticking lines and issuing them sends them to site. */
export function PickListPanel({ job, pickList, canIssue, issueNote = null }: PickListPanelProps) {
  const print = useDownloadPickList();
  const issue = useIssueMaterials(job.id);
  const [rows, setRows] = useState<Record<string, IssueRow>>(() => rowsFor(pickList.lines));
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [note, setNote] = useState('');
  // One key per issue: a retry after a lost answer is not booked twice.
  const [key, setKey] = useState(newIdempotencyKey);

  // A fresh pick list (after an issue, or a new reservation) restarts the form.
  useEffect(() => {
    setRows(rowsFor(pickList.lines));
    setErrors({});
  }, [pickList]);

  const set = (key: string, change: Partial<IssueRow>) =>
    setRows((r) => ({ ...r, [key]: { ...(r[key] as IssueRow), ...change } }));
  const picked = pickList.lines.filter((l) => rows[lineKey(l)]?.picked);

  const submit = () => {
    const found: Record<string, string> = {};
    for (const line of picked) {
      const row = rows[lineKey(line)] as IssueRow;
      const q = row.quantity.trim();
      if (!QUANTITY.test(q) || Number(q) <= 0) {
        found[lineKey(line)] = `Enter how much goes out, more than 0, like ${line.quantity}`;
      }
    }
    setErrors(found);
    if (picked.length === 0) {
      notifications.show({
        color: 'red',
        title: 'Nothing was issued',
        message: 'Tick the lines that go out to the job.',
      });
      return;
    }
    if (Object.keys(found).length > 0) {
      return;
    }
    issue.mutate(
      {
        lines: picked.map((line) => {
          const row = rows[lineKey(line)] as IssueRow;
          return {
            lotId: line.lot.id,
            quantity: row.quantity.trim(),
            ...(row.locationId ? { fromLocationId: row.locationId } : {}),
          };
        }),
        note: note.trim() === '' ? null : note.trim(),
        key,
      },
      {
        onSuccess: (result) => {
          setNote('');
          setKey(newIdempotencyKey());
          notifications.show({
            color: 'green',
            title: `Issued to ${job.reference}`,
            message: result.lines
              .map((l) => `${formatQuantity(l.quantity, l.unit, 3)} ${l.material.name}`)
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
    <Paper withBorder p="md" radius="md" component="section" aria-label="Pick list">
      <Stack gap="sm">
        <Group justify="space-between" align="flex-start" wrap="wrap">
          <div>
            <Text fw={700}>Pick list</Text>
            <Text size="sm" c="dimmed">
              {pickList.jobDate ? `For ${formatDate(pickList.jobDate)}` : 'No date yet'}
              {pickList.crew ? ` · crew ${pickList.crew}` : ''} · {pickList.siteAddress}
            </Text>
          </div>
          <Button
            variant="default"
            leftSection={<IconPrinter size={16} />}
            loading={print.isPending}
            onClick={() => print.mutate({ jobId: job.id, reference: job.reference })}
          >
            Print pick list
          </Button>
        </Group>

        {issueNote && pickList.lines.length > 0 ? (
          <Text size="sm" c="orange.9">
            {issueNote}
          </Text>
        ) : null}
        {pickList.lines.length === 0 ? (
          <Text size="sm" c="dimmed">
            Nothing left to pick from reserved lots.
            {pickList.unreserved.length === 0
              ? ' Reserve the job’s materials first, or everything has gone out.'
              : ''}
          </Text>
        ) : (
          <Stack gap="xs">
            {pickList.lines.map((line, i) => {
              const key = lineKey(line);
              const row = rows[key] ?? { picked: false, quantity: line.quantity, locationId: null };
              return (
                <Paper key={key} withBorder radius="sm" p="sm" bg={row.picked ? 'resin.0' : undefined}>
                  <Stack gap={6}>
                    <Group justify="space-between" wrap="nowrap" align="flex-start">
                      <div>
                        <Text size="sm" fw={700}>
                          {line.material.name}
                        </Text>
                        <Text size="xs" c="dimmed">
                          {line.material.code} · {lotLabel(line.lot)}
                          {line.lot.expiresOn ? ` · expires ${formatDate(line.lot.expiresOn)}` : ''}
                        </Text>
                        <Text size="xs" c="dimmed">
                          {line.places
                            .map((p) => `${p.locationName}: ${formatQuantity(p.quantity, line.unit, 3)}`)
                            .join(' · ') || 'Location not known'}
                        </Text>
                      </div>
                      <Text size="sm" fw={700} ta="right" style={{ whiteSpace: 'nowrap' }}>
                        {formatQuantity(line.quantity, line.unit, 3)}
                      </Text>
                    </Group>
                    <FlagBadges flags={line.flags} />
                    {canIssue ? (
                      <SimpleGrid cols={{ base: 1, xs: 3 }} spacing="xs">
                        <Checkbox
                          label="Goes out"
                          aria-label={`Issue line ${i + 1}: ${line.material.name}`}
                          checked={row.picked}
                          onChange={(e) => set(key, { picked: e.currentTarget.checked })}
                          mt={6}
                        />
                        <TextInput
                          size="xs"
                          aria-label={`Quantity to issue of ${line.material.name}, ${lotLabel(line.lot)}`}
                          rightSection={<Text size="xs">{unitLabel(line.unit) || 'each'}</Text>}
                          rightSectionWidth={40}
                          inputMode="decimal"
                          value={row.quantity}
                          disabled={!row.picked}
                          error={errors[key]}
                          onChange={(e) => set(key, { quantity: e.currentTarget.value })}
                        />
                        {line.places.length > 1 ? (
                          <Select
                            size="xs"
                            aria-label={`Picked from, ${line.material.name}`}
                            data={line.places.map((p) => ({ value: p.locationId, label: p.locationName }))}
                            value={row.locationId}
                            allowDeselect={false}
                            disabled={!row.picked}
                            onChange={(v) => set(key, { locationId: v })}
                            comboboxProps={{ withinPortal: true }}
                          />
                        ) : null}
                      </SimpleGrid>
                    ) : null}
                  </Stack>
                </Paper>
              );
            })}
          </Stack>
        )}

        {!['complete', 'invoiced', 'lost', 'cancelled'].includes(job.status) ? (
          <UnreservedNeeds job={job} needs={pickList.unreserved} canIssue={canIssue} />
        ) : null}

        {canIssue && pickList.lines.length > 0 ? (
          <Group align="flex-end" gap="sm" wrap="wrap">
            <TextInput
              label="Note (van, driver)"
              maxLength={500}
              value={note}
              onChange={(e) => setNote(e.currentTarget.value)}
              w={{ base: '100%', sm: 300 }}
            />
            <Button leftSection={<IconTruckDelivery size={16} />} loading={issue.isPending} onClick={submit}>
              Issue{' '}
              {picked.length > 0
                ? `${picked.length} line${picked.length === 1 ? '' : 's'}`
                : 'the ticked lines'}
            </Button>
          </Group>
        ) : null}

        <CautionsList cautions={pickList.cautions} title="Cautions for what is on this pick list" />
      </Stack>
    </Paper>
  );
}
