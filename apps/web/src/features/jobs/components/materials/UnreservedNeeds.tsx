import {
  Alert,
  Badge,
  Button,
  Group,
  Paper,
  Select,
  SimpleGrid,
  Stack,
  Text,
  TextInput,
} from '@mantine/core';
import { notifications } from '@mantine/notifications';
import { Decimal } from '@potlife/domain';
import { IconTruckDelivery } from '@tabler/icons-react';
import { useState } from 'react';
import { errorMessage, isApiError } from '../../../../lib/api-client';
import { formatDate } from '../../../../lib/format';
import { newIdempotencyKey } from '../../../../lib/upload';
import { useIssueMaterials } from '../../api/issue-materials';
import type { JobDetail, PickListCandidate, PickListUnreserved } from '../../api/types';
import { formatQuantity, unitLabel } from '../../utils/format';
import { FlagBadges, lotLabel } from './FlagBadges';

const QUANTITY = /^\d{1,9}(\.\d{1,3})?$/;

/** Titles for the API's refusals of an issue; the message is always the server's. */
const REFUSALS: Record<string, string> = {
  reserved_for_another_job: 'Reserved for another job',
  lot_not_usable: 'This lot cannot go to a job',
  negative_balance: 'Not that much at that location',
  job_cannot_issue: 'This job cannot take stock now',
  validation_failed: 'Check the line',
};

const expiry = (lot: PickListCandidate['lot']) =>
  lot.expiresOn ? `expires ${formatDate(lot.expiresOn)}` : 'no expiry';

/** The place to pick from at first: where the most of the lot is. */
function firstPlace(c: PickListCandidate | undefined): string | null {
  if (!c || c.places.length === 0) {
    return null;
  }
  return [...c.places].sort((a, b) => new Decimal(b.quantity).comparedTo(a.quantity))[0]!.locationId;
}

/** How much may come from the lot at that place: its free quantity, and what the place holds. */
function limitOf(c: PickListCandidate, locationId: string | null): Decimal {
  const place = c.places.find((p) => p.locationId === locationId);
  return place ? Decimal.min(c.free, place.quantity) : new Decimal(c.free);
}

/** The outstanding need, capped at what the lot may give from that place. */
function defaultQuantity(
  need: PickListUnreserved,
  c: PickListCandidate | undefined,
  locationId: string | null,
) {
  if (!c) {
    return '';
  }
  return Decimal.min(need.quantity, limitOf(c, locationId)).toString();
}

interface NeedCardProps {
  job: JobDetail;
  need: PickListUnreserved;
  canIssue: boolean;
}

/** One need that was not reserved: the lots that could go now, FEFO, and an issue from one of them. */
function NeedCard({ job, need, canIssue }: NeedCardProps) {
  const issue = useIssueMaterials(job.id);
  const suggested = need.candidates.find((c) => c.suggested !== null) ?? need.candidates[0];
  const [lotId, setLotId] = useState<string | null>(suggested?.lot.id ?? null);
  const lot = need.candidates.find((c) => c.lot.id === lotId);
  const [locationId, setLocationId] = useState<string | null>(firstPlace(suggested));
  const [quantity, setQuantity] = useState(() => defaultQuantity(need, suggested, firstPlace(suggested)));
  const [error, setError] = useState<string | null>(null);
  // One key per issue: a retry after a lost answer is not booked twice (a refusal frees the key).
  const [key, setKey] = useState(newIdempotencyKey);
  const unit = unitLabel(need.unit) || 'each';
  const material = need.material.name;

  const chooseLot = (id: string | null) => {
    const next = need.candidates.find((c) => c.lot.id === id);
    const place = firstPlace(next);
    setLotId(id);
    setLocationId(place);
    setQuantity(defaultQuantity(need, next, place));
    setError(null);
  };

  const submit = () => {
    if (!lot) {
      setError('Choose the lot it comes from.');
      return;
    }
    const q = quantity.trim();
    if (!QUANTITY.test(q) || new Decimal(q).lte(0)) {
      setError(`Enter how much goes out, more than 0, like ${defaultQuantity(need, lot, locationId) || '1'}`);
      return;
    }
    const limit = limitOf(lot, locationId);
    if (new Decimal(q).gt(limit)) {
      const place = lot.places.find((p) => p.locationId === locationId);
      setError(
        `At most ${formatQuantity(limit, need.unit, 3)} of ${lotLabel(lot.lot)} may go to this job${place ? ` from ${place.locationName}` : ''}.`,
      );
      return;
    }
    setError(null);
    issue.mutate(
      {
        lines: [{ lotId: lot.lot.id, quantity: q, ...(locationId ? { fromLocationId: locationId } : {}) }],
        note: null,
        key,
      },
      {
        onSuccess: (result) => {
          setKey(newIdempotencyKey());
          notifications.show({
            color: 'green',
            title: `Issued to ${job.reference}`,
            message: result.lines
              .map(
                (l) => `${formatQuantity(l.quantity, l.unit, 3)} ${l.material.name} from ${l.locationName}`,
              )
              .join(', '),
          });
          for (const w of result.warnings) {
            notifications.show({ color: 'orange', message: w });
          }
        },
      },
    );
  };

  const refusal = issue.isError ? issue.error : null;

  return (
    <Paper withBorder radius="sm" p="sm" component="article" aria-label={`Not reserved: ${material}`}>
      <Stack gap={6}>
        <Group justify="space-between" wrap="nowrap" align="flex-start">
          <div>
            <Text size="sm" fw={700}>
              {material}
            </Text>
            <Text size="xs" c="dimmed">
              {need.material.code} · not reserved
            </Text>
          </div>
          <Text size="sm" fw={700} ta="right" style={{ whiteSpace: 'nowrap' }}>
            {formatQuantity(need.quantity, need.unit, 3)} to send
          </Text>
        </Group>

        {need.candidates.length === 0 ? (
          <Text size="sm" c="orange.9">
            No lot in stock can go to this job: it has to be ordered (the reservations show the shortfall).
          </Text>
        ) : (
          <Stack
            gap={4}
            component="ul"
            m={0}
            p={0}
            style={{ listStyle: 'none' }}
            aria-label={`Lots for ${material}`}
          >
            {need.candidates.map((c) => (
              <li key={c.lot.id}>
                <Group gap={6} wrap="wrap">
                  <Text size="xs" fw={600}>
                    {lotLabel(c.lot)}
                  </Text>
                  <Text size="xs" c="dimmed">
                    {expiry(c.lot)} · {formatQuantity(c.free, need.unit, 3)} free ·{' '}
                    {c.places
                      .map((p) => `${p.locationName}: ${formatQuantity(p.quantity, need.unit, 3)}`)
                      .join(' · ') || 'location not known'}
                  </Text>
                  {c.suggested !== null ? (
                    <Badge size="sm" color="teal" variant="light">
                      Suggested: {formatQuantity(c.suggested, need.unit, 3)}
                    </Badge>
                  ) : null}
                </Group>
              </li>
            ))}
          </Stack>
        )}
        {need.candidates.length > 0 && new Decimal(need.short).gt(0) ? (
          <Text size="xs" c="orange.9">
            {formatQuantity(need.short, need.unit, 3)} more is not in usable stock: it has to be ordered.
          </Text>
        ) : null}
        {need.passedOver.map((p) => (
          <Group key={p.lot.id} gap={6} wrap="wrap">
            <Text size="xs" c="dimmed">
              Not offered: {lotLabel(p.lot)} ({formatQuantity(p.onHand, need.unit, 3)})
            </Text>
            <FlagBadges flags={p.flags} />
          </Group>
        ))}

        {canIssue && need.candidates.length > 0 ? (
          <>
            <SimpleGrid cols={{ base: 1, sm: lot && lot.places.length > 1 ? 3 : 2 }} spacing="xs">
              <Select
                size="xs"
                label="Lot"
                aria-label={`Lot for ${material}`}
                data={need.candidates.map((c) => ({
                  value: c.lot.id,
                  label: `${lotLabel(c.lot)} · ${expiry(c.lot)} · ${formatQuantity(c.free, need.unit, 3)} free${c.suggested !== null ? ' · suggested' : ''}`,
                }))}
                value={lotId}
                allowDeselect={false}
                onChange={chooseLot}
                comboboxProps={{ withinPortal: true }}
              />
              {lot && lot.places.length > 1 ? (
                <Select
                  size="xs"
                  label="Picked from"
                  aria-label={`Picked from, ${material}`}
                  data={lot.places.map((p) => ({
                    value: p.locationId,
                    label: `${p.locationName} (${formatQuantity(p.quantity, need.unit, 3)})`,
                  }))}
                  value={locationId}
                  allowDeselect={false}
                  onChange={(v) => {
                    setLocationId(v);
                    setQuantity(defaultQuantity(need, lot, v));
                    setError(null);
                  }}
                  comboboxProps={{ withinPortal: true }}
                />
              ) : null}
              <TextInput
                size="xs"
                label="Quantity"
                aria-label={`Quantity to issue of ${material}`}
                rightSection={<Text size="xs">{unit}</Text>}
                rightSectionWidth={40}
                inputMode="decimal"
                value={quantity}
                error={error}
                onChange={(e) => setQuantity(e.currentTarget.value)}
              />
            </SimpleGrid>
            {refusal ? (
              <Alert
                color="red"
                variant="light"
                title={(isApiError(refusal) && REFUSALS[refusal.code]) || 'Nothing was issued'}
              >
                {errorMessage(refusal).replace(/^Line 1: /, '')}
              </Alert>
            ) : null}
            <Group justify="flex-end">
              <Button
                size="sm"
                leftSection={<IconTruckDelivery size={16} />}
                loading={issue.isPending}
                onClick={submit}
                w={{ base: '100%', xs: 'auto' }}
              >
                Issue {material}
              </Button>
            </Group>
          </>
        ) : null}
      </Stack>
    </Paper>
  );
}

interface UnreservedNeedsProps {
  job: JobDetail;
  needs: PickListUnreserved[];
  canIssue: boolean;
}

/** Needs that were not reserved: the storeman picks from a lot that could go now, FEFO suggested. */
export function UnreservedNeeds({ job, needs, canIssue }: UnreservedNeedsProps) {
  if (needs.length === 0) {
    return null;
  }
  // What can go now first; what has to be ordered after it.
  const ordered = [
    ...needs.filter((n) => n.candidates.length > 0),
    ...needs.filter((n) => n.candidates.length === 0),
  ];
  return (
    <Stack gap="xs" component="section" aria-label="Needed but not reserved">
      <div>
        <Text fw={700} size="sm">
          Needed but not reserved
        </Text>
        <Text size="xs" c="dimmed">
          Lots offered are usable and still in date after the job date plus the owner&apos;s margin, less what
          other jobs hold; the first to expire is suggested.
        </Text>
      </div>
      {ordered.map((n) => (
        <NeedCard
          // A fresh pick list (after an issue) starts the need again from its new suggestion.
          key={`${n.material.id}:${n.quantity}:${n.candidates.map((c) => `${c.lot.id}=${c.free}`).join(',')}`}
          job={job}
          need={n}
          canIssue={canIssue}
        />
      ))}
    </Stack>
  );
}
