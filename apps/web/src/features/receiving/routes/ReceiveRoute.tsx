import {
  Alert,
  Button,
  Card,
  Group,
  SegmentedControl,
  Select,
  SimpleGrid,
  Stack,
  Text,
  Textarea,
  TextInput,
  Title,
} from '@mantine/core';
import { useForm } from '@mantine/form';
import { notifications } from '@mantine/notifications';
import { IconArrowLeft, IconPlus } from '@tabler/icons-react';
import { useState } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { CautionsList } from '../../../components/CautionsList';
import { FileDrop } from '../../../components/FileDrop';
import { ImportProgress } from '../../../components/csv-import/ImportProgress';
import { PageHeader } from '../../../components/PageHeader';
import { PageLoader } from '../../../components/PageLoader';
import { QueryError } from '../../../components/QueryError';
import { hrefs, paths } from '../../../config/paths';
import { errorMessage } from '../../../lib/api-client';
import { formatQuantity } from '../../../lib/amounts';
import { splitFieldErrors } from '../../../lib/field-errors';
import { scrollToFirstError } from '../../../lib/scroll-to-error';
import { newIdempotencyKey } from '../../../lib/upload';
import { useCreateReceipt } from '../api/create-receipt';
import { useUploadDeliveryNote } from '../api/delivery-note';
import {
  useLocationChoices,
  useMaterialChoices,
  useSupplierChoices,
  type MaterialChoice,
} from '../api/get-choices';
import { DELIVERY_NOTE_ACCEPT, DELIVERY_NOTE_MAX_BYTES, type Receipt } from '../api/types';
import {
  initialReceipt,
  lineQuantity,
  newLine,
  receiptBodyOf,
  validateReceipt,
  type ReceiptValues,
} from '../components/receipt-form';
import { ReceiptLineCard } from '../components/ReceiptLineCard';

export interface PostedState {
  justPosted: true;
  warnings: string[];
  uploadError: string | null;
}

type Stage =
  | { name: 'form' }
  | { name: 'confirm' }
  | { name: 'posting' }
  | { name: 'uploading'; fraction: number | null; step: 'sending' | 'checking' };

export function ReceiveRoute() {
  const suppliers = useSupplierChoices();
  const materials = useMaterialChoices();
  const locations = useLocationChoices();

  if (suppliers.isPending || materials.isPending || locations.isPending) {
    return <PageLoader label="Getting the form ready…" />;
  }
  const failed = suppliers.error ?? materials.error ?? locations.error;
  if (failed) {
    return (
      <QueryError
        what="what the form needs"
        error={failed}
        onRetry={() => {
          void suppliers.refetch();
          void materials.refetch();
          void locations.refetch();
        }}
      />
    );
  }
  return (
    <ReceiveForm
      suppliers={suppliers.data ?? []}
      materials={materials.data ?? []}
      locations={locations.data ?? []}
    />
  );
}

function ReceiveForm({
  suppliers,
  materials,
  locations,
}: {
  suppliers: { id: string; name: string }[];
  materials: MaterialChoice[];
  locations: NonNullable<ReturnType<typeof useLocationChoices>['data']>;
}) {
  const navigate = useNavigate();
  const create = useCreateReceipt();
  const upload = useUploadDeliveryNote();
  // One key for this delivery: a second press, or a retry after a dropped connection, books it once.
  const [key] = useState(newIdempotencyKey);
  const [file, setFile] = useState<File | null>(null);
  const [stage, setStage] = useState<Stage>({ name: 'form' });
  const [error, setError] = useState<string | null>(null);
  const form = useForm<ReceiptValues>({
    initialValues: { ...initialReceipt(), supplierMode: suppliers.length === 0 ? 'other' : 'listed' },
    validate: (values) => validateReceipt(values, materials),
  });

  const kinds = [
    ...new Set(
      form.values.lines
        .map((line) => materials.find((m) => m.id === line.materialId)?.kind)
        .filter((k) => k !== undefined),
    ),
  ];
  const packsIn = form.values.lines.reduce((sum, line) => sum + (Number(line.packsReceived) || 0), 0);
  const packsOut = form.values.lines.reduce((sum, line) => sum + (Number(line.packsRefused) || 0), 0);
  const supplierName =
    form.values.supplierMode === 'listed'
      ? (suppliers.find((s) => s.id === form.values.supplierId)?.name ?? '')
      : form.values.supplierName.trim();

  const afterPosting = async (receipt: Receipt) => {
    let uploadError: string | null = null;
    if (file) {
      setStage({ name: 'uploading', fraction: 0, step: 'sending' });
      try {
        await upload(receipt.id, file, (p) =>
          setStage({
            name: 'uploading',
            fraction: p.fraction,
            step: p.phase === 'waiting' ? 'checking' : 'sending',
          }),
        );
      } catch (failure) {
        uploadError = errorMessage(failure);
      }
    }
    notifications.show({
      color: 'green',
      title: `Receipt ${receipt.number} is booked in`,
      message: 'Print the labels for the packs next.',
    });
    const state: PostedState = { justPosted: true, warnings: receipt.warnings, uploadError };
    void navigate(hrefs.receipt(receipt.id), { state });
  };

  const post = () => {
    setError(null);
    setStage({ name: 'posting' });
    create.mutate(
      { body: receiptBodyOf(form.values), key },
      {
        onSuccess: (receipt) => void afterPosting(receipt),
        onError: (failure) => {
          const fields = form.values.lines.flatMap((_, index) =>
            [
              'materialId',
              'batchNumber',
              'expiresOn',
              'packSize',
              'packsReceived',
              'packsRefused',
              'refusedReason',
              'unitCost',
              'locationId',
            ].map((field) => `lines.${index}.${field}`),
          );
          const split = splitFieldErrors(failure, [
            'supplierId',
            'supplierName',
            'deliveryNoteNumber',
            'receivedOn',
            'note',
            ...fields,
          ]);
          form.setErrors(split.fields);
          setError(
            split.other ??
              (Object.keys(split.fields).length > 0
                ? 'Some lines need a change: see the fields marked in red.'
                : errorMessage(failure)),
          );
          setStage(Object.keys(split.fields).length > 0 ? { name: 'form' } : { name: 'confirm' });
        },
      },
    );
  };

  const busy = stage.name === 'posting' || stage.name === 'uploading';

  if (stage.name !== 'form') {
    return (
      <>
        <PageHeader title="Check the delivery" description="Nothing is booked in until you confirm." />
        <Stack gap="md" maw={760}>
          <Card>
            <Title order={2} fz="lg" mb="xs">
              From {supplierName || 'an unlisted supplier'}
              {form.values.deliveryNoteNumber.trim()
                ? `, delivery note ${form.values.deliveryNoteNumber.trim()}`
                : ''}
            </Title>
            <Text size="sm" c="dimmed" mb="sm">
              {packsIn} pack{packsIn === 1 ? '' : 's'} taken in
              {packsOut > 0 ? `, ${packsOut} refused as damaged` : ''}.{' '}
              {file
                ? `The delivery note ${file.name} goes with it.`
                : 'No delivery note file: you can add one later.'}
            </Text>
            <Stack gap={6}>
              {form.values.lines.map((line, index) => {
                const material = materials.find((m) => m.id === line.materialId);
                const location = locations.find((l) => l.id === line.locationId);
                const quantity = lineQuantity(line);
                return (
                  <Text key={line.key} size="sm">
                    {index + 1}. {material ? `${material.code} ${material.name}` : '?'}
                    {line.batchNumber.trim() ? `, batch ${line.batchNumber.trim()}` : ''}:{' '}
                    {line.packsReceived} pack
                    {line.packsReceived === '1' ? '' : 's'}
                    {quantity && material ? ` (${formatQuantity(quantity, material.stockUnit)})` : ''}
                    {location ? ` to ${location.path}` : ''}
                    {Number(line.packsRefused) > 0 ? `; ${line.packsRefused} refused` : ''}
                  </Text>
                );
              })}
            </Stack>
          </Card>
          {stage.name === 'uploading' ? (
            <ImportProgress stage={stage.step} fraction={stage.fraction} label="Checking the delivery note" />
          ) : null}
          {error ? (
            <Alert color="red" variant="light" role="alert" title="The delivery was not booked in">
              {error}
            </Alert>
          ) : null}
          <Group justify="flex-end">
            <Button variant="default" onClick={() => setStage({ name: 'form' })} disabled={busy}>
              Back to the form
            </Button>
            <Button onClick={post} loading={busy} data-autofocus>
              Book it in
            </Button>
          </Group>
        </Stack>
      </>
    );
  }

  return (
    <>
      <PageHeader
        title="Receive a delivery"
        description="Each line becomes a lot: its batch number, expiry and where it is put away. Packs refused at the door are recorded, not stocked."
        actions={
          <Button
            component={Link}
            to={paths.receipts}
            variant="default"
            leftSection={<IconArrowLeft size={18} />}
          >
            Receipts
          </Button>
        }
      />
      <form
        noValidate
        aria-label="Receive a delivery"
        onSubmit={form.onSubmit(
          () => {
            setError(null);
            setStage({ name: 'confirm' });
          },
          () => {
            setError('Some fields need a change: see the ones marked in red.');
            scrollToFirstError('Receive a delivery');
          },
        )}
      >
        <Stack gap="lg" maw={960}>
          <Card>
            <Title order={2} fz="lg" mb="sm">
              The delivery
            </Title>
            <Stack gap="sm">
              <SegmentedControl
                aria-label="Supplier in the list or not"
                value={form.values.supplierMode}
                onChange={(value) =>
                  form.setFieldValue('supplierMode', value as ReceiptValues['supplierMode'])
                }
                data={[
                  { value: 'listed', label: 'A supplier in the list', disabled: suppliers.length === 0 },
                  { value: 'other', label: 'Not in the list' },
                ]}
                w="fit-content"
              />
              <SimpleGrid cols={{ base: 1, sm: 3 }} spacing="sm">
                {form.values.supplierMode === 'listed' ? (
                  <Select
                    size="md"
                    label="Supplier"
                    placeholder="Choose the supplier"
                    searchable
                    data={suppliers.map((s) => ({ value: s.id, label: s.name }))}
                    {...form.getInputProps('supplierId')}
                  />
                ) : (
                  <TextInput label="Delivered by" {...form.getInputProps('supplierName')} />
                )}
                <TextInput label="Delivery note number" {...form.getInputProps('deliveryNoteNumber')} />
                <TextInput label="Received on" type="date" {...form.getInputProps('receivedOn')} />
              </SimpleGrid>
              <Stack gap={4}>
                <Text size="sm" fw={500}>
                  Delivery note (file)
                </Text>
                <FileDrop
                  what="the delivery note"
                  accept={DELIVERY_NOTE_ACCEPT}
                  typesText="PDF, JPEG or PNG"
                  typesHint="a photo or scan"
                  maxBytes={DELIVERY_NOTE_MAX_BYTES}
                  file={file}
                  onFile={setFile}
                  inputName="deliveryNote"
                />
              </Stack>
            </Stack>
          </Card>

          <Stack gap="sm">
            <Title order={2} fz="lg">
              Lines
            </Title>
            {locations.length === 0 ? (
              <Alert color="yellow" variant="light" title="There is nowhere to put stock yet">
                Add the store&apos;s locations first, under Stock › Store layout.
              </Alert>
            ) : null}
            {materials.length === 0 ? (
              <Alert color="yellow" variant="light" title="The catalogue is empty">
                The owner or estimator adds the materials to the catalogue first.
              </Alert>
            ) : null}
            {form.values.lines.map((line, index) => (
              <ReceiptLineCard
                key={line.key}
                form={form}
                index={index}
                materials={materials}
                locations={locations}
                canRemove={form.values.lines.length > 1}
              />
            ))}
            <Group>
              <Button
                variant="light"
                leftSection={<IconPlus size={16} />}
                disabled={form.values.lines.length >= 200}
                onClick={() =>
                  form.insertListItem(
                    'lines',
                    newLine(form.values.lines[form.values.lines.length - 1]?.locationId ?? ''),
                  )
                }
              >
                Add a line
              </Button>
            </Group>
          </Stack>

          {kinds.length > 0 ? <CautionsList kinds={kinds} where="store" title="Handling what came" /> : null}

          <Textarea
            label="Note"
            description="Optional: anything about the delivery"
            autosize
            minRows={2}
            {...form.getInputProps('note')}
          />
          {error ? (
            <Alert color="red" variant="light" role="alert">
              {error}
            </Alert>
          ) : null}
          <Group justify="flex-end">
            <Button component={Link} to={paths.receipts} variant="default">
              Cancel
            </Button>
            <Button type="submit">Check and book in</Button>
          </Group>
        </Stack>
      </form>
    </>
  );
}
