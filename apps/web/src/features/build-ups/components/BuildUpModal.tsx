import {
  ActionIcon,
  Alert,
  Button,
  Divider,
  Group,
  Modal,
  SimpleGrid,
  Stack,
  Text,
  Textarea,
  TextInput,
} from '@mantine/core';
import { useForm, type FormErrors } from '@mantine/form';
import { DomainError, EDGE_KINDS, resolveBuildUp } from '@potlife/domain';
import { notifications } from '@mantine/notifications';
import { IconPlus, IconTrash } from '@tabler/icons-react';
import { useEffect, useState } from 'react';
import type { BuildUp } from '../api/get-build-ups';
import { useSaveBuildUp } from '../api/save-build-up';
import {
  checkRate,
  defaultValues,
  EDGE_LABELS,
  RATE_GROUPS,
  valuesOf,
  type BuildUpValues,
} from './rate-fields';

export function validateBuildUp(values: BuildUpValues): FormErrors {
  const errors: FormErrors = {};
  if (values.name.trim() === '') {
    errors.name = 'Name the build-up, e.g. “Standard deck, one layer 450 g”';
  } else if (values.name.trim().length > 120) {
    errors.name = 'Keep it to 120 characters';
  }
  const put = (path: string, message: string | null) => {
    if (message) {
      errors[path] = message;
    }
  };
  put('labourRate', checkRate(values.labourRate, 'money'));
  put('markupPct', checkRate(values.markupPct, 'markup'));
  put('vatRatePct', checkRate(values.vatRatePct, 'percent'));
  for (const group of RATE_GROUPS) {
    for (const field of group.fields) {
      put(field.key, checkRate(values[field.key], field.rule));
    }
  }
  if (values.catalystBands.length === 0) {
    errors.catalystBands = 'Give at least one catalyst band';
  }
  values.catalystBands.forEach((b, i) => {
    put(`catalystBands.${i}.fromC`, checkRate(b.fromC, 'band-from'));
    put(`catalystBands.${i}.percent`, checkRate(b.percent, 'band-percent'));
  });
  for (const kind of EDGE_KINDS) {
    put(`battenMPerEdgeM.${kind}`, checkRate(values.battenMPerEdgeM[kind], 'non-negative'));
    put(`nailsPerEdgeM.${kind}`, checkRate(values.nailsPerEdgeM[kind], 'non-negative'));
  }
  return errors;
}

function bodyOf(values: BuildUpValues) {
  const scalars = Object.fromEntries(
    RATE_GROUPS.flatMap((g) => g.fields).map((f) => [f.key, values[f.key].trim()]),
  );
  return {
    ...scalars,
    name: values.name.trim(),
    description: values.description.trim() === '' ? null : values.description.trim(),
    labourRate: values.labourRate.trim(),
    markupPct: values.markupPct.trim(),
    vatRatePct: values.vatRatePct.trim(),
    catalystBands: values.catalystBands.map((b) => ({ fromC: b.fromC.trim(), percent: b.percent.trim() })),
    battenMPerEdgeM: values.battenMPerEdgeM,
    nailsPerEdgeM: values.nailsPerEdgeM,
  };
}

interface BuildUpModalProps {
  /** null: a new build-up */
  buildUp: BuildUp | null;
  opened: boolean;
  onClose: () => void;
  /** shown to an estimator: the rates, not to be changed */
  readOnly?: boolean;
}

/** The owner's rates form: every rate of the costing engine, labour rate, markup and VAT. */
export function BuildUpModal({ buildUp, opened, onClose, readOnly = false }: BuildUpModalProps) {
  const save = useSaveBuildUp();
  const [domainProblem, setDomainProblem] = useState<string | null>(null);
  const form = useForm<BuildUpValues>({ initialValues: defaultValues(), validate: validateBuildUp });

  useEffect(() => {
    if (opened) {
      const v = buildUp ? valuesOf(buildUp) : defaultValues();
      form.setValues(v);
      form.resetDirty(v);
      form.clearErrors();
      setDomainProblem(null);
    }
    // Refill when opened for another build-up.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [opened, buildUp?.id]);

  const submit = form.onSubmit((values) => {
    const body = bodyOf(values);
    // The domain checks the build-up as a whole (catalyst bands rising, within 1–4 %), as the API will.
    try {
      resolveBuildUp(body);
    } catch (error) {
      if (error instanceof DomainError) {
        setDomainProblem(error.message);
        return;
      }
      throw error;
    }
    setDomainProblem(null);
    save.mutate(buildUp ? { ...body, id: buildUp.id } : body, {
      onSuccess: (saved) => {
        notifications.show({ color: 'green', message: `${saved.name} saved.` });
        onClose();
      },
    });
  });

  return (
    <Modal
      opened={opened}
      onClose={onClose}
      title={readOnly && buildUp ? buildUp.name : buildUp ? `Edit ${buildUp.name}` : 'New build-up'}
      size="xl"
    >
      <form
        onSubmit={submit}
        noValidate
        aria-label={readOnly && buildUp ? buildUp.name : buildUp ? `Edit ${buildUp.name}` : 'New build-up'}
      >
        <fieldset disabled={readOnly} style={{ border: 0, margin: 0, padding: 0, minWidth: 0 }}>
          <Stack gap="md">
            <SimpleGrid cols={{ base: 1, sm: 2 }} spacing="sm">
              <TextInput label="Name" data-autofocus {...form.getInputProps('name')} />
              <Textarea label="Description" rows={1} {...form.getInputProps('description')} />
            </SimpleGrid>
            <div>
              <Text fw={700}>Price</Text>
              <SimpleGrid cols={{ base: 1, xs: 3 }} spacing="sm" mt={4}>
                <TextInput
                  label="Labour rate (£ an hour)"
                  inputMode="decimal"
                  {...form.getInputProps('labourRate')}
                />
                <TextInput label="Markup (%)" inputMode="decimal" {...form.getInputProps('markupPct')} />
                <TextInput
                  label="VAT (%)"
                  description="UK standard rate 20 %"
                  inputMode="decimal"
                  {...form.getInputProps('vatRatePct')}
                />
              </SimpleGrid>
            </div>
            {RATE_GROUPS.map((group) => (
              <div key={group.title}>
                <Divider mb="xs" />
                <Text fw={700}>{group.title}</Text>
                <Text size="xs" c="dimmed">
                  {group.hint}
                </Text>
                <SimpleGrid cols={{ base: 2, sm: 4 }} spacing="sm" mt={6}>
                  {group.fields.map((f) => (
                    <TextInput
                      key={f.key}
                      label={f.unit ? `${f.label} (${f.unit})` : f.label}
                      inputMode="decimal"
                      {...form.getInputProps(f.key)}
                    />
                  ))}
                </SimpleGrid>
              </div>
            ))}
            <div>
              <Divider mb="xs" />
              <Text fw={700}>Battens and nails by edge kind</Text>
              <Text size="xs" c="dimmed">
                Per metre of edge: drip trims usually sit on a double batten.
              </Text>
              <SimpleGrid cols={{ base: 2, sm: 4 }} spacing="sm" mt={6}>
                {EDGE_KINDS.map((kind) => (
                  <TextInput
                    key={`b-${kind}`}
                    label={`${EDGE_LABELS[kind]} batten (m/m)`}
                    inputMode="decimal"
                    {...form.getInputProps(`battenMPerEdgeM.${kind}`)}
                  />
                ))}
                {EDGE_KINDS.map((kind) => (
                  <TextInput
                    key={`n-${kind}`}
                    label={`${EDGE_LABELS[kind]} nails (per m)`}
                    inputMode="decimal"
                    {...form.getInputProps(`nailsPerEdgeM.${kind}`)}
                  />
                ))}
              </SimpleGrid>
            </div>
            <div>
              <Divider mb="xs" />
              <Text fw={700}>Catalyst dose by air temperature</Text>
              <Text size="xs" c="dimmed">
                From each temperature up, the dose as % of resin and topcoat weight: bands rising, each from 1
                to 4 %.
              </Text>
              <Stack gap={6} mt={6}>
                {form.values.catalystBands.map((_, i) => (
                  <Group key={i} gap="sm" align="flex-start" wrap="nowrap">
                    <TextInput
                      label={i === 0 ? 'From (°C)' : undefined}
                      aria-label={`Band ${i + 1} from (°C)`}
                      inputMode="decimal"
                      w={120}
                      {...form.getInputProps(`catalystBands.${i}.fromC`)}
                    />
                    <TextInput
                      label={i === 0 ? 'Dose (%)' : undefined}
                      aria-label={`Band ${i + 1} dose (%)`}
                      inputMode="decimal"
                      w={120}
                      {...form.getInputProps(`catalystBands.${i}.percent`)}
                    />
                    <ActionIcon
                      variant="subtle"
                      color="red"
                      mt={i === 0 ? 28 : 4}
                      aria-label={`Remove band ${i + 1}`}
                      disabled={form.values.catalystBands.length === 1}
                      onClick={() => form.removeListItem('catalystBands', i)}
                    >
                      <IconTrash size={16} />
                    </ActionIcon>
                  </Group>
                ))}
                <Group>
                  <Button
                    size="xs"
                    variant="default"
                    leftSection={<IconPlus size={14} />}
                    onClick={() => form.insertListItem('catalystBands', { fromC: '', percent: '' })}
                  >
                    Add a band
                  </Button>
                </Group>
                {typeof form.errors.catalystBands === 'string' ? (
                  <Text size="sm" c="red.8">
                    {form.errors.catalystBands}
                  </Text>
                ) : null}
              </Stack>
            </div>
            {domainProblem ? (
              <Alert color="red" variant="light" title="The build-up does not hold together">
                {domainProblem}
              </Alert>
            ) : null}
          </Stack>
        </fieldset>
        <Group justify="flex-end" gap="sm" mt="md">
          {readOnly ? (
            <Button variant="default" onClick={onClose}>
              Close
            </Button>
          ) : (
            <>
              <Button variant="default" onClick={onClose} disabled={save.isPending}>
                Cancel
              </Button>
              <Button type="submit" loading={save.isPending}>
                {buildUp ? 'Save changes' : 'Create build-up'}
              </Button>
            </>
          )}
        </Group>
      </form>
    </Modal>
  );
}
