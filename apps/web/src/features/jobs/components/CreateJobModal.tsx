import {
  Button,
  Divider,
  Group,
  Modal,
  SegmentedControl,
  Select,
  SimpleGrid,
  Stack,
  Text,
  Textarea,
  TextInput,
} from '@mantine/core';
import { useForm } from '@mantine/form';
import { useDebouncedValue } from '@mantine/hooks';
import { notifications } from '@mantine/notifications';
import { zod4Resolver } from 'mantine-form-zod-resolver';
import { useEffect, useState } from 'react';
import { z } from 'zod';
import { useBuildUps } from '../api/get-build-ups';
import { useCreateCustomer } from '../../../lib/customers';
import { useCreateJob } from '../api/create-job';
import { useCustomers } from '../api/get-customers';
import { useEstimators } from '../api/get-estimators';
import { SUBSTRATES, type JobDetail, type Substrate } from '../api/types';
import { useSessionUser } from '../../../lib/session';
import { substrateLabels } from '../utils/labels';

const optionalText = (max: number) => z.string().trim().max(max, `Keep it to ${max} characters`);

export const createJobSchema = z.object({
  customerMode: z.enum(['existing', 'new']),
  customerId: z.string().nullable(),
  customerName: optionalText(160),
  contactName: optionalText(120),
  email: z.string().trim().max(320, 'Keep it to 320 characters'),
  phone: optionalText(40),
  billingAddress: optionalText(500),
  title: optionalText(160),
  siteAddress: z.string().trim().min(1, 'Enter the site address').max(500, 'Keep it to 500 characters'),
  substrate: z.enum(SUBSTRATES, { error: 'Choose what the roof is laid on' }),
  scheduledOn: z
    .string()
    .refine((v) => v === '' || /^\d{4}-\d{2}-\d{2}$/.test(v), 'Enter a date, or leave it empty'),
  buildUpId: z.string().nullable(),
  estimatorId: z.string().nullable(),
  topcoatColour: optionalText(60),
  crew: optionalText(160),
  notes: optionalText(4000),
});

/** The customer's fields, which depend on whether one is chosen or added (checked with the rest). */
export function customerErrors(v: {
  customerMode: string;
  customerId: string | null;
  customerName: string;
  email: string;
}) {
  const errors: Record<string, string> = {};
  if (v.customerMode === 'existing' && !v.customerId) {
    errors.customerId = 'Choose the customer, or add a new one';
  }
  if (v.customerMode === 'new') {
    if (v.customerName.trim() === '') {
      errors.customerName = 'Enter the customer’s name';
    }
    if (v.email.trim() !== '' && !z.email().safeParse(v.email.trim()).success) {
      errors.email = 'Enter a whole e-mail address, like name@example.com';
    }
  }
  return errors;
}

const fieldsResolver = zod4Resolver(createJobSchema, { errorPriority: 'first' });

type CreateJobValues = {
  customerMode: 'existing' | 'new';
  customerId: string | null;
  customerName: string;
  contactName: string;
  email: string;
  phone: string;
  billingAddress: string;
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

const initialValues: CreateJobValues = {
  customerMode: 'existing',
  customerId: null,
  customerName: '',
  contactName: '',
  email: '',
  phone: '',
  billingAddress: '',
  title: '',
  siteAddress: '',
  substrate: null,
  scheduledOn: '',
  buildUpId: null,
  estimatorId: null,
  topcoatColour: '',
  crew: '',
  notes: '',
};

const substrateOptions = SUBSTRATES.map((s) => ({ value: s, label: substrateLabels[s] }));
const orNull = (v: string) => (v.trim() === '' ? null : v.trim());

interface CreateJobModalProps {
  opened: boolean;
  /** a customer to start with (from the customer's page) */
  forCustomer?: { id: string; name: string } | null;
  onClose: () => void;
  onCreated: (job: JobDetail) => void;
}

/** A new job: its customer (chosen or added here), the site and what the roof is laid on. */
export function CreateJobModal({ opened, forCustomer = null, onClose, onCreated }: CreateJobModalProps) {
  const me = useSessionUser();
  // The estimator is me when I estimate; otherwise the form asks (the API checks either way).
  const mine = me.role === 'owner' || me.role === 'estimator' ? me.id : null;
  const form = useForm<CreateJobValues>({
    initialValues: { ...initialValues, estimatorId: mine },
    validate: (values) => ({ ...fieldsResolver(values), ...customerErrors(values) }),
  });
  const [search, setSearch] = useState('');
  const [debounced] = useDebouncedValue(search, 250);
  const customers = useCustomers(debounced, opened);
  const buildUps = useBuildUps(opened);
  const estimators = useEstimators(opened);
  const createCustomer = useCreateCustomer();
  const createJob = useCreateJob();
  // A customer added here is kept even if the job then fails, so nothing is typed twice.
  const [added, setAdded] = useState<{ id: string; name: string } | null>(null);
  // Opened from a customer's page: that customer, chosen and in the list.
  useEffect(() => {
    if (opened && forCustomer) {
      setAdded(forCustomer);
      form.setValues({ customerMode: 'existing', customerId: forCustomer.id });
    }
    // Only a new opening or another customer drives this.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [opened, forCustomer?.id]);

  const close = () => {
    form.reset();
    setSearch('');
    setAdded(null);
    createCustomer.reset();
    createJob.reset();
    onClose();
  };

  const customerOptions = [
    ...(added ? [{ value: added.id, label: added.name }] : []),
    ...(customers.data?.items ?? [])
      .filter((c) => c.id !== added?.id)
      .map((c) => ({ value: c.id, label: c.contactName ? `${c.name} (${c.contactName})` : c.name })),
  ];

  const submit = form.onSubmit(async (values) => {
    let customerId = values.customerId;
    if (values.customerMode === 'new') {
      try {
        const customer = await createCustomer.mutateAsync({
          name: values.customerName.trim(),
          contactName: orNull(values.contactName),
          email: orNull(values.email),
          phone: orNull(values.phone),
          billingAddress: orNull(values.billingAddress),
        });
        customerId = customer.id;
        setAdded({ id: customer.id, name: customer.name });
        form.setValues({ customerMode: 'existing', customerId: customer.id });
      } catch {
        return;
      }
    }
    if (!customerId || values.substrate === null) {
      return;
    }
    try {
      const job = await createJob.mutateAsync({
        customerId,
        title: orNull(values.title),
        siteAddress: values.siteAddress.trim(),
        substrate: values.substrate,
        scheduledOn: values.scheduledOn === '' ? null : values.scheduledOn,
        buildUpId: values.buildUpId,
        estimatorId: values.estimatorId,
        topcoatColour: orNull(values.topcoatColour),
        crew: orNull(values.crew),
        notes: orNull(values.notes),
      });
      notifications.show({
        color: 'green',
        title: `${job.reference} created`,
        message: `${job.title} for ${job.customer.name}.`,
      });
      close();
      onCreated(job);
    } catch {
      // The notification says why; the form keeps what was typed.
    }
  });

  const busy = createCustomer.isPending || createJob.isPending;

  return (
    <Modal opened={opened} onClose={close} title="New job" size="lg">
      <form onSubmit={submit} noValidate aria-label="New job">
        <Stack gap="md">
          <Stack gap="xs">
            <Group justify="space-between" wrap="wrap">
              <Text fw={700}>Customer</Text>
              <SegmentedControl
                size="xs"
                aria-label="Customer"
                data={[
                  { value: 'existing', label: 'Choose a customer' },
                  { value: 'new', label: 'New customer' },
                ]}
                {...form.getInputProps('customerMode')}
              />
            </Group>
            {form.values.customerMode === 'existing' ? (
              <Select
                label="Customer"
                placeholder="Type to search by name, contact or e-mail"
                searchable
                data={customerOptions}
                searchValue={search}
                onSearchChange={setSearch}
                filter={({ options }) => options}
                nothingFoundMessage={
                  customers.isFetching
                    ? 'Searching…'
                    : 'No customer matches. Choose “New customer” to add them.'
                }
                comboboxProps={{ withinPortal: true }}
                {...form.getInputProps('customerId')}
              />
            ) : (
              <SimpleGrid cols={{ base: 1, sm: 2 }} spacing="sm">
                <TextInput label="Customer name" data-autofocus {...form.getInputProps('customerName')} />
                <TextInput label="Contact" {...form.getInputProps('contactName')} />
                <TextInput label="E-mail" type="email" inputMode="email" {...form.getInputProps('email')} />
                <TextInput label="Phone" type="tel" {...form.getInputProps('phone')} />
                <Textarea
                  label="Billing address"

                  rows={2}
                  style={{ gridColumn: '1 / -1' }}
                  {...form.getInputProps('billingAddress')}
                />
              </SimpleGrid>
            )}
          </Stack>
          <Divider />
          <Stack gap="sm">
            <Text fw={700}>Site and roof</Text>
            <Textarea label="Site address" rows={2} {...form.getInputProps('siteAddress')} />
            <TextInput
              label="Title"
              placeholder="e.g. Rear extension flat roof"
              description="Left empty: “Flat roof” and the first line of the site address"
              {...form.getInputProps('title')}
            />
            <SimpleGrid cols={{ base: 1, sm: 2 }} spacing="sm">
              <Select
                label="Laid on"
                placeholder="Choose the deck"
                data={substrateOptions}
                comboboxProps={{ withinPortal: true }}
                {...form.getInputProps('substrate')}
              />
              <TextInput label="Scheduled for" type="date" {...form.getInputProps('scheduledOn')} />
              <Select
                label="Build-up"
                placeholder={buildUps.isPending ? 'Loading build-ups…' : 'Choose later'}
                data={(buildUps.data ?? []).map((b) => ({ value: b.id, label: b.name }))}
                clearable
                comboboxProps={{ withinPortal: true }}
                {...form.getInputProps('buildUpId')}
              />
              <TextInput label="Topcoat colour" {...form.getInputProps('topcoatColour')} />
              <TextInput label="Crew" {...form.getInputProps('crew')} />
              <Select
                label="Estimator"
                placeholder={estimators.isPending ? 'Loading people…' : 'Nobody yet'}
                data={(estimators.data ?? []).map((p) => ({
                  value: p.id,
                  label: p.id === me.id ? `${p.name} (me)` : p.name,
                }))}
                clearable
                comboboxProps={{ withinPortal: true }}
                {...form.getInputProps('estimatorId')}
              />
            </SimpleGrid>
            <Textarea label="Notes" rows={2} {...form.getInputProps('notes')} />
          </Stack>
          <Group justify="flex-end" gap="sm">
            <Button variant="default" onClick={close} disabled={busy}>
              Cancel
            </Button>
            <Button type="submit" loading={busy}>
              Create job
            </Button>
          </Group>
        </Stack>
      </form>
    </Modal>
  );
}
