import '@mantine/charts/styles.css';
import { LineChart } from '@mantine/charts';
import { Text } from '@mantine/core';
import { formatDateTime } from '../../../lib/format';
import type { Band, Reading } from '../api/types';

// Loaded on its own (React.lazy) so the charting library stays out of the first download.

const dayFormat = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short' });

/** One location's readings against the band its stored materials allow. */
export default function ReadingsChart({ readings, band }: { readings: Reading[]; band: Band | null }) {
  const data = [...readings]
    .sort((a, b) => a.takenAt.localeCompare(b.takenAt))
    .map((reading) => ({
      t: new Date(reading.takenAt).getTime(),
      temperature: Number(reading.temperatureC),
    }));
  const min = band?.minC !== null && band?.minC !== undefined ? Number(band.minC) : null;
  const max = band?.maxC !== null && band?.maxC !== undefined ? Number(band.maxC) : null;
  const values = data.map((point) => point.temperature);
  const low = Math.floor(Math.min(...values, min ?? Infinity, max ?? Infinity) - 2);
  const high = Math.ceil(Math.max(...values, min ?? -Infinity, max ?? -Infinity) + 2);
  return (
    <figure style={{ margin: 0 }} aria-label="Readings against the allowed band">
      <LineChart
        h={280}
        data={data}
        dataKey="t"
        series={[{ name: 'temperature', label: 'Temperature °C', color: 'resin.7' }]}
        curveType="monotone"
        withDots={data.length <= 120}
        unit=" °C"
        xAxisProps={{
          type: 'number',
          scale: 'time',
          domain: ['dataMin', 'dataMax'],
          tickFormatter: (value: number) => dayFormat.format(new Date(value)),
        }}
        yAxisProps={{ domain: [low, high] }}
        tooltipProps={{ labelFormatter: (value) => formatDateTime(new Date(Number(value))) }}
        referenceAreas={
          min !== null || max !== null
            ? [
                {
                  y1: min ?? low,
                  y2: max ?? high,
                  color: 'teal',
                  fillOpacity: 0.12,
                  label: 'Allowed',
                  labelPosition: 'insideTopLeft',
                },
              ]
            : []
        }
        referenceLines={[
          ...(max !== null
            ? [{ y: max, color: 'red.6', label: `Max ${max} °C`, labelPosition: 'insideTopRight' as const }]
            : []),
          ...(min !== null
            ? [
                {
                  y: min,
                  color: 'blue.6',
                  label: `Min ${min} °C`,
                  labelPosition: 'insideBottomRight' as const,
                },
              ]
            : []),
        ]}
      />
      <Text component="figcaption" size="xs" c="dimmed" mt={4}>
        {min !== null || max !== null
          ? `The shaded band is what the materials kept here allow (${min ?? '…'} to ${max ?? '…'} °C).`
          : 'Nothing kept here has a storage range, so there is no band.'}
      </Text>
    </figure>
  );
}
