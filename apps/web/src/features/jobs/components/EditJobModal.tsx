import { Button, Group, Modal, Select, SimpleGrid, Stack, Textarea, TextInput } from '@mantine/core';
import { useForm } from '@mantine/form';
import { notifications } from '@mantine/notifications';
import { zod4Resolver } from 'mantine-form-zod-resolver';
import { useEffect } from 'react';
import { z } from 'zod';
import { useBuildUps } from '../api/get-build-ups';
import { useEstimators } from '../api/get-estimators';
import { useUpdateJob } from '../api/update-job';
import { SUBSTRATES, type JobDetail, type Substrate } from '../api/types';
import { substrateLabels } from '../utils/labels';

const text = (max: number) => z.string().trim().max(max, `Keep it to ${max} characters`);

export const editJobSchema = z.object({
  title: z.string().trim().min(1, 'Give the job a title').max(160, 'Keep it to 160 characters'),
  siteAddress: z.string().trim().min(1, 'Enter the site address').max(500, 'Keep it to 500 characters'),
  substrate: z.enum(SUBSTRATES, { error: 'Choose what the roof is laid on' }),
  scheduledOn: z
    .string()
    .refine((v) => v === '' || /^\d{4}-\d{2}-\d{2}$/.test(v), 'Enter a date, or leave it empty'),
  buildUpId: z.string().nullable(),
  estimatorId: z.string().nullable(),
  topcoatColour: text(60),
  crew: text(160),
  notes: text(4000),
});

type EditJobValues = {
  title: string;
  siteAddress: string;
  substrate: Substrate | null;
  scheduledOn: string;
  buildUpId: string | null;
  estimatorId: string | null;
  topcoatColour: string;
  crew: string;
  notes: string;
};

function valuesOf(job: JobDetail): EditJobValues {
  return {
    title: job.title,
    siteAddress: job.siteAddress,
    substrate: job.substrate,
    scheduledOn: job.scheduledOn ?? '',
    buildUpId: job.buildUp?.id ?? null,
    estimatorId: job.estimator?.id ?? null,
    topcoatColour: job.topcoatColour ?? '',
    crew: job.crew ?? '',
    notes: job.notes ?? '',
  };
}

const orNull = (v: string) => (v.trim() === '' ? null : v.trim());

export function EditJobModal({
  job,
  opened,
  onClose,
}: {
  job: JobDetail;
  opened: boolean;
  onClose: () => void;
}) {
  const form = useForm<EditJobValues>({
    initialValues: valuesOf(job),
    validate: zod4Resolver(editJobSchema, { errorPriority: 'first' }),
  });
  const buildUps = useBuildUps(opened);
  const estimators = useEstimators(opened);
  const update = useUpdateJob();

  useEffect(() => {
    if (opened) {
      form.setValues(valuesOf(job));
      form.resetDirty(valuesOf(job));
    }
    // Refill when the modal opens.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [opened]);

  const submit = form.onSubmit((values) => {
    if (values.substrate === null) {
      return;
    }
    update.mutate(
      {
        id: job.id,
        title: values.title.trim(),
        siteAddress: values.siteAddress.trim(),
        substrate: values.substrate,
        scheduledOn: values.scheduledOn === '' ? null : values.scheduledOn,
        buildUpId: values.buildUpId,
        // Sent only when changed: someone who has left would be refused as a new choice.
        estimatorId: values.estimatorId !== (job.estimator?.id ?? null) ? values.estimatorId : undefined,
        topcoatColour: orNull(values.topcoatColour),
        crew: orNull(values.crew),
        notes: orNull(values.notes),
      },
      {
        onSuccess: () => {
          notifications.show({ color: 'green', message: `${job.reference} saved.` });
          onClose();
        },
      },
    );
  });

  const buildUpOptions = [
    ...(job.buildUp && !(buildUps.data ?? []).some((b) => b.id === job.buildUp?.id)
      ? [{ value: job.buildUp.id, label: job.buildUp.name }]
      : []),
    ...(buildUps.data ?? []).map((b) => ({ value: b.id, label: b.name })),
  ];

  // Someone who has since left stays shown on their job until another is chosen.
  const estimatorOptions = [
    ...(job.estimator && !(estimators.data ?? []).some((p) => p.id === job.estimator?.id)
      ? [{ value: job.estimator.id, label: `${job.estimator.name} (no longer estimates)` }]
      : []),
    ...(estimators.data ?? []).map((p) => ({ value: p.id, label: p.name })),
  ];

  return (
    <Modal opened={opened} onClose={onClose} title={`Edit ${job.reference}`} size="lg">
      <form onSubmit={submit} noValidate aria-label={`Edit ${job.reference}`}>
        <Stack gap="sm">
          <TextInput label="Title" {...form.getInputProps('title')} />
          <Textarea label="Site address" rows={2} {...form.getInputProps('siteAddress')} />
          <SimpleGrid cols={{ base: 1, sm: 2 }} spacing="sm">
            <Select
              label="Laid on"
              data={SUBSTRATES.map((s) => ({ value: s, label: substrateLabels[s] }))}
              allowDeselect={false}
              comboboxProps={{ withinPortal: true }}
              {...form.getInputProps('substrate')}
            />
            <TextInput label="Scheduled for" type="date" {...form.getInputProps('scheduledOn')} />
            <Select
              label="Build-up"
              placeholder="None chosen"
              data={buildUpOptions}
              clearable
              comboboxProps={{ withinPortal: true }}
              {...form.getInputProps('buildUpId')}
            />
            <TextInput label="Topcoat colour" {...form.getInputProps('topcoatColour')} />
            <TextInput label="Crew" {...form.getInputProps('crew')} />
            <Select
              label="Estimator"
              placeholder="Nobody chosen"
              data={estimatorOptions}
              clearable
              comboboxProps={{ withinPortal: true }}
              {...form.getInputProps('estimatorId')}
            />
          </SimpleGrid>
          <Textarea label="Notes" rows={2} {...form.getInputProps('notes')} />
          <Group justify="flex-end" gap="sm">
            <Button variant="default" onClick={onClose} disabled={update.isPending}>
              Cancel
            </Button>
            <Button type="submit" loading={update.isPending}>
              Save
            </Button>
          </Group>
        </Stack>
      </form>
    </Modal>
  );
}
