import {
  Alert,
  Button,
  Group,
  Modal,
  MultiSelect,
  Select,
  SimpleGrid,
  Stack,
  Text,
  Textarea,
  TextInput,
} from '@mantine/core';
import { useForm } from '@mantine/form';
import { notifications } from '@mantine/notifications';
import { HAZARD_CLASSES, type HazardClass } from '@potlife/domain';
import { zod4Resolver } from 'mantine-form-zod-resolver';
import { useState } from 'react';
import { z } from 'zod';
import { splitFieldErrors } from '../../../lib/field-errors';
import { hazardClassLabels, locationKindLabels } from '../../../lib/material-words';
import { useSaveLocation } from '../api/save-location';
import { LOCATION_KINDS, type Location, type LocationKind } from '../api/types';

const kindOptions = LOCATION_KINDS.map((kind) => ({ value: kind, label: locationKindLabels[kind] ?? kind }));
const classOptions = HAZARD_CLASSES.map((value) => ({ value, label: hazardClassLabels[value] }));

const schema = z
  .object({
    name: z
      .string()
      .trim()
      .min(1, 'Name the location, like "Bay B" or "Van 2"')
      .max(120, 'Keep it to 120 characters'),
    kind: z.enum(LOCATION_KINDS as [LocationKind, ...LocationKind[]], {
      error: 'Choose what kind of place it is',
    }),
    parentId: z.string(),
    capacityLitres: z.string().trim(),
    allowedHazardClasses: z.array(z.string()),
    notes: z.string().max(2000, 'Keep it to 2000 characters'),
  })
  .superRefine((values, ctx) => {
    if (
      values.kind === 'flammables-cabinet' &&
      values.capacityLitres !== '' &&
      !/^\d{1,7}(\.\d{1,3})?$/.test(values.capacityLitres)
    ) {
      ctx.addIssue({
        code: 'custom',
        path: ['capacityLitres'],
        message: 'Write the litres as a number, like 50',
      });
    }
    if (values.kind === 'flammables-cabinet' && /^0+(\.0+)?$/.test(values.capacityLitres)) {
      ctx.addIssue({
        code: 'custom',
        path: ['capacityLitres'],
        message: 'A cabinet holds more than 0 litres',
      });
    }
  });

type Values = z.infer<typeof schema>;

interface LocationFormModalProps {
  opened: boolean;
  onClose: () => void;
  location?: Location;
  locations: Location[];
}

export function LocationFormModal({ opened, onClose, location, locations }: LocationFormModalProps) {
  const title = location ? `Change ${location.name}` : 'Add a location';
  return (
    <Modal opened={opened} onClose={onClose} title={title} size="lg">
      {opened ? (
        <LocationForm
          key={location?.id ?? 'new'}
          title={title}
          location={location}
          locations={locations}
          onClose={onClose}
        />
      ) : null}
    </Modal>
  );
}

function LocationForm({
  title,
  location,
  locations,
  onClose,
}: Omit<LocationFormModalProps, 'opened'> & { title: string }) {
  const save = useSaveLocation();
  const [other, setOther] = useState<string | null>(null);
  const form = useForm<Values>({
    initialValues: {
      name: location?.name ?? '',
      kind: location?.kind ?? ('' as LocationKind),
      parentId: location?.parentId ?? '',
      capacityLitres: location?.capacityLitres ? String(Number(location.capacityLitres)) : '',
      allowedHazardClasses: location?.allowedHazardClasses ?? [],
      notes: location?.notes ?? '',
    },
    validate: zod4Resolver(schema, { errorPriority: 'first' }),
  });
  const cabinet = form.values.kind === 'flammables-cabinet';
  const parents = locations.filter((candidate) => candidate.id !== location?.id && candidate.active);

  const submit = form.onSubmit((values) => {
    setOther(null);
    const classes = values.allowedHazardClasses as HazardClass[];
    save.mutate(
      {
        id: location?.id,
        body: {
          name: values.name.trim(),
          kind: values.kind,
          parentId: values.parentId === '' ? null : values.parentId,
          ...(cabinet && values.capacityLitres !== '' ? { capacityLitres: values.capacityLitres } : {}),
          ...(classes.length > 0 ? { allowedHazardClasses: classes } : {}),
          ...(values.notes.trim() !== '' ? { notes: values.notes.trim() } : {}),
        },
      },
      {
        onSuccess: (saved) => {
          notifications.show({ color: 'green', message: `${saved.path} is saved.` });
          onClose();
        },
        onError: (error) => {
          const split = splitFieldErrors(
            error,
            ['name', 'kind', 'parentId', 'capacityLitres', 'allowedHazardClasses', 'notes'],
            {
              duplicate_name: 'name',
            },
          );
          form.setErrors(split.fields);
          setOther(split.other);
        },
      },
    );
  });

  return (
    <form onSubmit={submit} noValidate aria-label={title}>
      <Stack gap="md">
        <SimpleGrid cols={{ base: 1, sm: 2 }} spacing="sm">
          <TextInput label="Name" data-autofocus {...form.getInputProps('name')} />
          <Select
            size="md"
            label="Kind"
            placeholder="Choose a kind"
            data={kindOptions}
            {...form.getInputProps('kind')}
          />
        </SimpleGrid>
        <Select
          size="md"
          label="Inside"
          description="The store or bay it is part of (counts and cabinets include what is inside them)"
          data={[
            { value: '', label: 'Nothing: a place of its own' },
            ...parents.map((parent) => ({ value: parent.id, label: parent.path })),
          ]}
          searchable
          {...form.getInputProps('parentId')}
        />
        {cabinet ? (
          <TextInput
            label="Capacity (litres)"
            description="Left empty: 50 L, the most HSE HSG51 allows in a cabinet in a workroom"
            inputMode="decimal"
            {...form.getInputProps('capacityLitres')}
          />
        ) : null}
        <MultiSelect
          size="md"
          label="Hazard classes it may hold"
          description="Left empty: the usual for its kind (peroxide only in a peroxide store, flammables away from it, nothing dangerous outdoors)"
          data={classOptions}
          clearable
          {...form.getInputProps('allowedHazardClasses')}
        />
        <Text size="xs" c="dimmed">
          Potlife refuses to put organic peroxide catalyst (class 5.2) with flammable liquids or accelerators
          (class 3), and the reverse (HSE CS21). Your local codes and licensed practice decide the layout of
          your store.
        </Text>
        <Textarea label="Notes" autosize minRows={2} {...form.getInputProps('notes')} />
        {other ? (
          <Alert color="red" variant="light" role="alert" title="The location was not saved">
            {other}
          </Alert>
        ) : null}
        <Group justify="flex-end">
          <Button variant="default" onClick={onClose}>
            Cancel
          </Button>
          <Button type="submit" loading={save.isPending}>
            {location ? 'Save changes' : 'Add location'}
          </Button>
        </Group>
      </Stack>
    </form>
  );
}
