import {
  Alert,
  Badge,
  Button,
  Group,
  Paper,
  SimpleGrid,
  Stack,
  Switch,
  Text,
  TextInput,
} from '@mantine/core';
import { useForm } from '@mantine/form';
import { IconCircleCheck, IconCloudRain, IconTemperature } from '@tabler/icons-react';
import { zod4Resolver } from 'mantine-form-zod-resolver';
import { z } from 'zod';
import { useLayingCheck } from '../../api/laying-check';
import { formatNumber } from '../../utils/format';
import { CautionsList } from './CautionsList';

const decimal = /^-?\d{1,3}(\.\d{1,2})?$/;
const reading = (what: string, min: number, max: number) =>
  z
    .string()
    .trim()
    .min(1, `Enter the ${what}`)
    .refine((v) => decimal.test(v), 'Write a number, like 12.5')
    .refine((v) => !decimal.test(v) || (Number(v) >= min && Number(v) <= max), `Between ${min} and ${max}`);

export const layingCheckSchema = z.object({
  airC: reading('air temperature', -45, 60),
  surfaceC: reading('deck temperature', -45, 80),
  relativeHumidityPct: reading('humidity', 0.1, 100),
  raining: z.boolean(),
});

type LayingValues = { airC: string; surfaceC: string; relativeHumidityPct: string; raining: boolean };

/** Whether the planned day's weather lets the crew lay resin, with the dose and working time. */
export function LayingCheckCard() {
  const check = useLayingCheck();
  const form = useForm<LayingValues>({
    initialValues: { airC: '', surfaceC: '', relativeHumidityPct: '', raining: false },
    validate: zod4Resolver(layingCheckSchema, { errorPriority: 'first' }),
  });
  const submit = form.onSubmit((v) =>
    check.mutate({
      airC: v.airC.trim(),
      surfaceC: v.surfaceC.trim(),
      relativeHumidityPct: v.relativeHumidityPct.trim(),
      raining: v.raining,
    }),
  );
  const result = check.data;

  return (
    <Paper withBorder p="md" radius="md" component="section" aria-label="Laying check">
      <Stack gap="sm">
        <div>
          <Text fw={700}>Laying check</Text>
          <Text size="sm" c="dimmed">
            The forecast for the planned day: whether resin may be laid, the catalyst dose and how long it
            stays workable.
          </Text>
        </div>
        <form onSubmit={submit} noValidate aria-label="Laying check">
          <Stack gap="sm">
            <SimpleGrid cols={{ base: 1, xs: 3 }} spacing="sm">
              <TextInput label="Air (°C)" inputMode="decimal" {...form.getInputProps('airC')} />
              <TextInput
                label="Humidity (%)"
                inputMode="decimal"
                {...form.getInputProps('relativeHumidityPct')}
              />
              <TextInput label="Deck (°C)" inputMode="decimal" {...form.getInputProps('surfaceC')} />
            </SimpleGrid>
            <Group justify="space-between" wrap="wrap">
              <Switch label="Rain expected" {...form.getInputProps('raining', { type: 'checkbox' })} />
              <Button
                type="submit"
                variant="light"
                leftSection={<IconTemperature size={16} />}
                loading={check.isPending}
              >
                Check the day
              </Button>
            </Group>
          </Stack>
        </form>
        {result ? (
          <Stack gap="sm" aria-live="polite">
            {result.ok ? (
              <Alert color="green" variant="light" icon={<IconCircleCheck size={18} />} title="Fit to lay">
                Dew point {formatNumber(result.dewPointC, 1)} °C.
              </Alert>
            ) : (
              <Alert color="red" variant="light" icon={<IconCloudRain size={18} />} title="Not fit to lay">
                <Stack gap={2}>
                  {result.problems.map((p) => (
                    <Text key={p} size="sm">
                      · {p}
                    </Text>
                  ))}
                  <Text size="sm" c="dimmed">
                    Dew point {formatNumber(result.dewPointC, 1)} °C.
                  </Text>
                </Stack>
              </Alert>
            )}
            <Group gap="sm" wrap="wrap">
              {result.catalystPercent !== null ? (
                <Badge size="lg" variant="light" color="resin">
                  Catalyst {formatNumber(result.catalystPercent)} %
                </Badge>
              ) : (
                <Badge size="lg" variant="outline" color="red">
                  Too cold to catalyse
                </Badge>
              )}
              {result.workingTime ? <Text size="sm">{result.workingTime.text}</Text> : null}
            </Group>
            <CautionsList cautions={result.cautions} />
          </Stack>
        ) : null}
      </Stack>
    </Paper>
  );
}
