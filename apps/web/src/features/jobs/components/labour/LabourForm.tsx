import {
  Autocomplete,
  Button,
  Group,
  Paper,
  SimpleGrid,
  Stack,
  Text,
  Textarea,
  TextInput,
} from '@mantine/core';
import { useForm } from '@mantine/form';
import { notifications } from '@mantine/notifications';
import dayjs from 'dayjs';
import { zod4Resolver } from 'mantine-form-zod-resolver';
import { z } from 'zod';
import { useRecordLabour } from '../../api/record-labour';
import { formatNumber } from '../../utils/format';

const today = () => dayjs().format('YYYY-MM-DD');

/** The API's rule, said the same way: more than 0, at most 24, to the quarter or the minute (2 places). */
export const labourSchema = z.object({
  workedOn: z
    .string()
    .regex(/^\d{4}-\d{2}-\d{2}$/, 'Enter the day the hours were worked')
    .refine((v) => v <= today(), 'Hours are for a day already worked, not a future date'),
  hours: z
    .string()
    .trim()
    .regex(/^\d{1,2}(\.\d{1,2})?$/, 'Enter hours like 7.5 (at most 2 decimal places)')
    .refine((v) => Number(v) > 0, 'Enter more than 0 hours')
    .refine((v) => Number(v) <= 24, 'A day has at most 24 hours'),
  crewMember: z.string().trim().min(1, 'Enter who worked').max(120, 'Keep it to 120 characters'),
  note: z.string().trim().max(1000, 'Keep it to 1000 characters'),
});

type LabourValues = z.infer<typeof labourSchema>;

interface LabourFormProps {
  jobId: string;
  /** names to offer: the crew already on the sheet and on the job */
  names: string[];
}

/** One line of the time sheet: the day, the hours, who, and a note. */
export function LabourForm({ jobId, names }: LabourFormProps) {
  const form = useForm<LabourValues>({
    initialValues: { workedOn: today(), hours: '', crewMember: '', note: '' },
    validate: zod4Resolver(labourSchema, { errorPriority: 'first' }),
  });
  const record = useRecordLabour(jobId);

  const submit = form.onSubmit((values) => {
    record.mutate(
      {
        workedOn: values.workedOn,
        hours: values.hours.trim(),
        crewMember: values.crewMember.trim(),
        note: values.note.trim() === '' ? null : values.note.trim(),
      },
      {
        onSuccess: (sheet) => {
          notifications.show({
            color: 'green',
            message: `${formatNumber(values.hours.trim())} h for ${values.crewMember.trim()} recorded; ${formatNumber(sheet.recordedHours)} h on the job so far.`,
          });
          // Same day, next person: keep the date.
          form.setValues({ hours: '', crewMember: '', note: '' });
          form.resetDirty();
        },
      },
    );
  });

  return (
    <Paper withBorder p="md" radius="md" component="section" aria-label="Record hours">
      <form onSubmit={submit} noValidate aria-label="Record hours">
        <Stack gap="sm">
          <Text fw={700}>Record hours</Text>
          <SimpleGrid cols={{ base: 1, xs: 3 }} spacing="sm">
            <TextInput label="Worked on" type="date" max={today()} {...form.getInputProps('workedOn')} />
            <TextInput
              label="Hours"
              inputMode="decimal"
              placeholder="e.g. 7.5"
              {...form.getInputProps('hours')}
            />
            <Autocomplete
              label="Who worked"
              placeholder="Crew member’s name"
              data={[...new Set(names)]}
              comboboxProps={{ withinPortal: true }}
              {...form.getInputProps('crewMember')}
            />
          </SimpleGrid>
          <Textarea label="Note" rows={1} autosize maxRows={4} {...form.getInputProps('note')} />
          <Group justify="flex-end">
            <Button type="submit" loading={record.isPending}>
              Record hours
            </Button>
          </Group>
        </Stack>
      </form>
    </Paper>
  );
}
