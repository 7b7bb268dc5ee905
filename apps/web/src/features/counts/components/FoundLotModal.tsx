import { Alert, Button, Group, Modal, Select, Stack, Text, TextInput } from '@mantine/core';
import { useDebouncedValue } from '@mantine/hooks';
import { notifications } from '@mantine/notifications';
import { useState } from 'react';
import { errorMessage } from '../../../lib/api-client';
import { unitLabel } from '../../../lib/material-words';
import { saveEntries } from '../api/count-actions';
import { useCountLocations, useFoundLotSearch } from '../api/get-choices';
import { countsKeys, type Count } from '../api/types';
import { useMutation, useQueryClient } from '@tanstack/react-query';

/** A lot on the shelf that the ledger did not put there: pick it and say how much is there. */
export function FoundLotModal({
  count,
  opened,
  onClose,
}: {
  count: Count;
  opened: boolean;
  onClose: () => void;
}) {
  return (
    <Modal opened={opened} onClose={onClose} title="A lot found on the shelf">
      {opened ? <FoundLotForm count={count} onClose={onClose} /> : null}
    </Modal>
  );
}

function FoundLotForm({ count, onClose }: { count: Count; onClose: () => void }) {
  const queryClient = useQueryClient();
  const [search, setSearch] = useState('');
  const [debounced] = useDebouncedValue(search, 300);
  const lots = useFoundLotSearch(debounced);
  const locations = useCountLocations();
  const [lotId, setLotId] = useState<string | null>(null);
  const [locationId, setLocationId] = useState<string | null>(null);
  const [quantity, setQuantity] = useState('');
  const [tried, setTried] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const add = useMutation({
    mutationFn: () =>
      saveEntries(count.id, [
        { lotId: lotId ?? '', locationId: locationId ?? '', countedQuantity: quantity.trim() },
      ]),
    meta: { notifyOnError: false },
    onSuccess: (updated) => queryClient.setQueryData(countsKeys.detail(updated.id), updated),
  });
  const inScope = (locations.data ?? []).filter((l) => count.locationNames.includes(l.name));
  const lot = lots.data?.find((l) => l.id === lotId);
  const quantityError =
    tried && !/^\d{1,11}(\.\d{1,3})?$/.test(quantity.trim()) ? 'Enter how much is there, like 25' : undefined;

  return (
    <Stack gap="md">
      <Text size="sm" c="dimmed">
        Find the lot by its batch number or material. It joins the count with the quantity you enter.
      </Text>
      <TextInput
        label="Search lots"
        placeholder="Batch number, material code or name"
        value={search}
        onChange={(e) => setSearch(e.currentTarget.value)}
        data-autofocus
      />
      <Select
        size="md"
        label="Lot"
        placeholder={
          debounced.trim().length < 2
            ? 'Type two letters or more above'
            : lots.isFetching
              ? 'Looking…'
              : 'Choose the lot'
        }
        data={(lots.data ?? []).map((l) => ({
          value: l.id,
          label: `${l.materialCode} ${l.materialName}${l.batchNumber ? ` · ${l.batchNumber}` : ''}`,
        }))}
        value={lotId}
        onChange={setLotId}
        error={tried && !lotId ? 'Choose the lot' : undefined}
        nothingFoundMessage="No lot matches"
      />
      <Select
        size="md"
        label="Where it is"
        data={inScope.map((l) => ({ value: l.id, label: l.path }))}
        value={locationId}
        onChange={setLocationId}
        error={tried && !locationId ? 'Choose where you found it' : undefined}
      />
      <TextInput
        label={`Quantity on the shelf${lot ? ` (${unitLabel(lot.stockUnit)})` : ''}`}
        inputMode="decimal"
        value={quantity}
        onChange={(e) => setQuantity(e.currentTarget.value)}
        error={quantityError}
      />
      {error ? (
        <Alert color="red" variant="light" role="alert">
          {error}
        </Alert>
      ) : null}
      <Group justify="flex-end">
        <Button variant="default" onClick={onClose}>
          Cancel
        </Button>
        <Button
          loading={add.isPending}
          onClick={() => {
            setTried(true);
            setError(null);
            if (!lotId || !locationId || !/^\d{1,11}(\.\d{1,3})?$/.test(quantity.trim())) {
              return;
            }
            add.mutate(undefined, {
              onSuccess: () => {
                notifications.show({ color: 'green', message: 'The lot is added to the count.' });
                onClose();
              },
              onError: (failure) => setError(errorMessage(failure)),
            });
          }}
        >
          Add to the count
        </Button>
      </Group>
    </Stack>
  );
}
