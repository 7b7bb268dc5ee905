import {
  ActionIcon,
  Alert,
  Badge,
  Button,
  Checkbox,
  Group,
  Paper,
  SegmentedControl,
  Select,
  SimpleGrid,
  Stack,
  Table,
  Text,
  TextInput,
  Tooltip,
} from '@mantine/core';
import {
  IconAlertTriangle,
  IconPencil,
  IconPlayerStop,
  IconPlus,
  IconTrash,
  IconX,
} from '@tabler/icons-react';
import type { EdgeKind } from '@potlife/domain';
import { appendPoint, changeShape, removePoint, setPoint } from './area-edits';
import { EdgeSample } from './RoofPlan';
import { SIDE_KIND_OPTIONS, styleOf } from './edge-styles';
import { paths, sideLengths, type AreaCheck, type AreaDraft, type SideKind } from './roof-model';
import { formatArea, formatLength } from '../../utils/format';

export const GRID_STEPS = [
  { value: '0.1', label: '0.1 m' },
  { value: '0.25', label: '0.25 m' },
  { value: '0.5', label: '0.5 m' },
  { value: '1', label: '1 m' },
];

interface AreaCardProps {
  area: AreaDraft;
  index: number;
  check: AreaCheck | undefined;
  /** the message for a field, if it should be shown */
  errorOf: (path: string, value?: string) => string | undefined;
  onChange: (area: AreaDraft) => void;
  onRemove?: () => void;
  drawing: boolean;
  drawStep: string;
  onDrawStepChange: (step: string) => void;
  onToggleDrawing: () => void;
  onFocus: () => void;
}

const RECTANGLE_SIDES = ['Length (bottom)', 'Width (right)', 'Length (top)', 'Width (left)'];

/** One area of the roof: its shape and size, its sides as edges to classify, its fall. */
export function AreaCard({
  area,
  index,
  check,
  errorOf,
  onChange,
  onRemove,
  drawing,
  drawStep,
  onDrawStepChange,
  onToggleDrawing,
  onFocus,
}: AreaCardProps) {
  const label = `Area ${index + 1}`;
  const lengths = sideLengths(area);
  const pointsError = errorOf(paths.areaPoints(area.key));

  const setSide = (i: number, kind: SideKind, upstandM?: string) =>
    onChange({
      ...area,
      sides: area.sides.map((s, j) => (j === i ? { kind, upstandM: upstandM ?? s.upstandM } : s)),
    });

  return (
    <Paper
      withBorder
      p="md"
      radius="md"
      component="section"
      aria-label={`${label}: ${area.name || 'unnamed'}`}
      onFocusCapture={onFocus}
      style={check?.problem ? { borderColor: 'var(--mantine-color-red-5)' } : undefined}
    >
      <Stack gap="sm">
        <Group justify="space-between" align="flex-end" wrap="wrap" gap="sm">
          <Group gap="sm" align="flex-end" wrap="wrap">
            <TextInput
              label={`${label} name`}
              value={area.name}
              maxLength={80}
              w={200}
              error={errorOf(paths.areaName(area.key), area.name)}
              onChange={(e) => onChange({ ...area, name: e.currentTarget.value })}
            />
            <SegmentedControl
              aria-label={`${label} shape`}
              value={area.shape}
              data={[
                { value: 'rectangle', label: 'Rectangle' },
                { value: 'polygon', label: 'Polygon' },
              ]}
              onChange={(value) => onChange(changeShape(area, value === 'polygon' ? 'polygon' : 'rectangle'))}
            />
          </Group>
          <Group gap="xs">
            {check?.areaM2 ? (
              <Badge variant="light" color="topcoat" size="lg" radius="sm" tt="none">
                {formatArea(check.areaM2)}
              </Badge>
            ) : null}
            {onRemove ? (
              <Tooltip label={`Remove ${label}`}>
                <ActionIcon variant="subtle" color="red" aria-label={`Remove ${label}`} onClick={onRemove}>
                  <IconTrash size={18} />
                </ActionIcon>
              </Tooltip>
            ) : null}
          </Group>
        </Group>

        {area.shape === 'rectangle' ? (
          <SimpleGrid cols={{ base: 2 }} spacing="sm" maw={360}>
            <TextInput
              label="Length (m)"
              inputMode="decimal"
              value={area.lengthM}
              error={errorOf(paths.areaLength(area.key), area.lengthM)}
              onChange={(e) => onChange({ ...area, lengthM: e.currentTarget.value })}
            />
            <TextInput
              label="Width (m)"
              inputMode="decimal"
              value={area.widthM}
              error={errorOf(paths.areaWidth(area.key), area.widthM)}
              onChange={(e) => onChange({ ...area, widthM: e.currentTarget.value })}
            />
          </SimpleGrid>
        ) : (
          <Stack gap="xs">
            <Group justify="space-between" wrap="wrap" gap="xs">
              <Text size="sm" fw={600}>
                Corners, in order round the area (m)
              </Text>
              <Group gap="xs" wrap="wrap">
                <Select
                  aria-label={`${label} grid step`}
                  data={GRID_STEPS}
                  value={drawStep}
                  onChange={(v) => v && onDrawStepChange(v)}
                  w={96}
                  size="xs"
                  allowDeselect={false}
                />
                <Button
                  size="xs"
                  variant={drawing ? 'filled' : 'light'}
                  leftSection={drawing ? <IconPlayerStop size={14} /> : <IconPencil size={14} />}
                  onClick={onToggleDrawing}
                >
                  {drawing ? 'Stop clicking corners' : 'Click corners on the plan'}
                </Button>
              </Group>
            </Group>
            {area.points.length > 0 ? (
              <Table withRowBorders={false} verticalSpacing={4} horizontalSpacing="xs" maw={380}>
                <Table.Thead>
                  <Table.Tr>
                    <Table.Th w={40}>#</Table.Th>
                    <Table.Th>x</Table.Th>
                    <Table.Th>y</Table.Th>
                    <Table.Th w={40} />
                  </Table.Tr>
                </Table.Thead>
                <Table.Tbody>
                  {area.points.map((p, i) => (
                    <Table.Tr key={i}>
                      <Table.Td>
                        <Text size="sm" c="dimmed">
                          {i + 1}
                        </Text>
                      </Table.Td>
                      <Table.Td>
                        <TextInput
                          size="xs"
                          aria-label={`${label} corner ${i + 1} x`}
                          inputMode="decimal"
                          value={p.x}
                          error={errorOf(paths.point(area.key, i, 'x'), p.x)}
                          onChange={(e) => onChange(setPoint(area, i, { ...p, x: e.currentTarget.value }))}
                        />
                      </Table.Td>
                      <Table.Td>
                        <TextInput
                          size="xs"
                          aria-label={`${label} corner ${i + 1} y`}
                          inputMode="decimal"
                          value={p.y}
                          error={errorOf(paths.point(area.key, i, 'y'), p.y)}
                          onChange={(e) => onChange(setPoint(area, i, { ...p, y: e.currentTarget.value }))}
                        />
                      </Table.Td>
                      <Table.Td>
                        <ActionIcon
                          variant="subtle"
                          color="gray"
                          aria-label={`Remove corner ${i + 1} of ${label}`}
                          onClick={() => onChange(removePoint(area, i))}
                        >
                          <IconX size={16} />
                        </ActionIcon>
                      </Table.Td>
                    </Table.Tr>
                  ))}
                </Table.Tbody>
              </Table>
            ) : null}
            <Group gap="xs">
              <Button
                size="xs"
                variant="default"
                leftSection={<IconPlus size={14} />}
                onClick={() => onChange(appendPoint(area, { x: '', y: '' }))}
              >
                Add a corner
              </Button>
            </Group>
            {pointsError ? (
              <Text size="sm" c="red.8" role="alert">
                {pointsError}
              </Text>
            ) : null}
          </Stack>
        )}

        {check?.problem ? (
          <Alert
            color="red"
            variant="light"
            icon={<IconAlertTriangle size={18} />}
            title={`${label} cannot be measured`}
          >
            {check.problem}
          </Alert>
        ) : null}

        {area.sides.length > 0 ? (
          <Stack gap={4}>
            <Text size="sm" fw={600}>
              Edges of this area
            </Text>
            <Table.ScrollContainer minWidth={440} type="native">
              <Table verticalSpacing={4} horizontalSpacing="xs">
                <Table.Thead>
                  <Table.Tr>
                    <Table.Th>Side</Table.Th>
                    <Table.Th>Length</Table.Th>
                    <Table.Th>Kind</Table.Th>
                    <Table.Th>Upstand (m)</Table.Th>
                  </Table.Tr>
                </Table.Thead>
                <Table.Tbody>
                  {area.sides.map((side, i) => {
                    const name =
                      area.shape === 'rectangle'
                        ? (RECTANGLE_SIDES[i] ?? `Side ${i + 1}`)
                        : `${i + 1} → ${((i + 1) % area.sides.length) + 1}`;
                    return (
                      <Table.Tr key={i}>
                        <Table.Td>
                          <Group gap={6} wrap="nowrap">
                            <EdgeSample style={styleOf(side.kind)} />
                            <Text size="sm" style={{ whiteSpace: 'nowrap' }}>
                              {name}
                            </Text>
                          </Group>
                        </Table.Td>
                        <Table.Td>
                          <Text size="sm">{formatLength(lengths[i] ?? null)}</Text>
                        </Table.Td>
                        <Table.Td miw={150}>
                          <Select
                            size="xs"
                            aria-label={`Kind of ${label} side ${name}`}
                            placeholder="Choose…"
                            data={SIDE_KIND_OPTIONS}
                            value={side.kind}
                            error={errorOf(paths.side(area.key, i))}
                            onChange={(v) => setSide(i, (v as EdgeKind | 'none' | null) ?? null)}
                            comboboxProps={{ withinPortal: true }}
                          />
                        </Table.Td>
                        <Table.Td w={110}>
                          {side.kind === 'wall' ? (
                            <TextInput
                              size="xs"
                              aria-label={`Upstand of ${label} side ${name}`}
                              placeholder="build-up's"
                              inputMode="decimal"
                              value={side.upstandM}
                              error={errorOf(paths.sideUpstand(area.key, i), side.upstandM)}
                              onChange={(e) => setSide(i, 'wall', e.currentTarget.value)}
                            />
                          ) : (
                            <Text size="xs" c="dimmed">
                              —
                            </Text>
                          )}
                        </Table.Td>
                      </Table.Tr>
                    );
                  })}
                </Table.Tbody>
              </Table>
            </Table.ScrollContainer>
          </Stack>
        ) : null}

        <Stack gap="xs">
          <Checkbox
            label="A fall was measured on this area"
            checked={area.hasFall}
            onChange={(e) => onChange({ ...area, hasFall: e.currentTarget.checked })}
          />
          {area.hasFall ? (
            <>
              <SimpleGrid cols={2} spacing="sm" maw={360}>
                <TextInput
                  label="Rise (mm)"
                  inputMode="decimal"
                  value={area.fallRiseMm}
                  error={errorOf(paths.fallRise(area.key), area.fallRiseMm)}
                  onChange={(e) => onChange({ ...area, fallRiseMm: e.currentTarget.value })}
                />
                <TextInput
                  label="Over a run of (m)"
                  inputMode="decimal"
                  value={area.fallRunM}
                  error={errorOf(paths.fallRun(area.key), area.fallRunM)}
                  onChange={(e) => onChange({ ...area, fallRunM: e.currentTarget.value })}
                />
              </SimpleGrid>
              {check?.fall ? (
                <Alert
                  variant="light"
                  color={
                    check.fall.level === 'ok' ? 'green' : check.fall.level === 'warning' ? 'yellow' : 'red'
                  }
                  title={`Fall ${check.fall.ratio}: ${check.fall.level === 'ok' ? 'fine' : check.fall.level === 'warning' ? 'check the levels' : 'too flat'}`}
                  icon={check.fall.level === 'ok' ? undefined : <IconAlertTriangle size={18} />}
                >
                  {check.fall.message}
                </Alert>
              ) : check?.fallProblem ? (
                <Text size="sm" c="red.8">
                  {check.fallProblem}
                </Text>
              ) : null}
            </>
          ) : null}
        </Stack>
      </Stack>
    </Paper>
  );
}
