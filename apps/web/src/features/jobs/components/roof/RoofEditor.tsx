import {
  Alert,
  Badge,
  Box,
  Button,
  Grid,
  Group,
  Paper,
  SimpleGrid,
  Stack,
  Switch,
  Text,
  Textarea,
  TextInput,
} from '@mantine/core';
import { modals } from '@mantine/modals';
import { notifications } from '@mantine/notifications';
import { IconDeviceFloppy, IconPlus, IconRestore } from '@tabler/icons-react';
import { useEffect, useMemo, useState } from 'react';
import { errorMessage } from '../../../../lib/api-client';
import { usePutRoof } from '../../api/put-roof';
import type { RoofRecord } from '../../api/types';
import { AreaCard } from './AreaCard';
import { FreeEdgesCard } from './FreeEdgesCard';
import { appendPoint } from './area-edits';
import { RoofPlan, type DrawingState } from './RoofPlan';
import { RoofTotals } from './RoofTotals';
import {
  fieldErrors,
  fromStoredRoof,
  newArea,
  paths,
  previewRoof,
  toRoofBody,
  type AreaDraft,
  type PointDraft,
  type RoofDraft,
} from './roof-model';

/** What the draft says, without the keys that only tell React's rows apart. */
function signature(draft: RoofDraft): string {
  return JSON.stringify(draft, (key, value: unknown) => (key === 'key' ? undefined : value));
}

interface RoofEditorProps {
  jobId: string;
  record: RoofRecord;
  /** the job's build-up upstand, for walls that give none */
  upstandM?: string;
  /** the roof of a closed job is shown, not edited */
  readOnlyReason?: string | null;
  /** told when the form starts or stops differing from the saved roof */
  onDirtyChange?: (dirty: boolean) => void;
}

/** The roof form beside its live plan; the plan's totals come from the domain as the form changes. */
export function RoofEditor({
  jobId,
  record,
  upstandM,
  readOnlyReason = null,
  onDirtyChange,
}: RoofEditorProps) {
  const [draft, setDraft] = useState<RoofDraft>(() => fromStoredRoof(record.roof));
  const [saved, setSaved] = useState(() => signature(draft));
  const [showAll, setShowAll] = useState(false);
  const [drawing, setDrawing] = useState<DrawingState | null>(null);
  const [drawStep, setDrawStep] = useState('0.5');
  const [focused, setFocused] = useState<string | null>(null);
  const save = usePutRoof(jobId);

  const preview = useMemo(() => previewRoof(draft, upstandM ? { upstandM } : {}), [draft, upstandM]);
  const errors = useMemo(() => fieldErrors(draft), [draft]);
  const dirty = signature(draft) !== saved;

  useEffect(() => {
    onDirtyChange?.(dirty);
  }, [dirty, onDirtyChange]);

  useEffect(() => {
    if (!dirty) {
      return undefined;
    }
    const warn = (event: BeforeUnloadEvent) => {
      event.preventDefault();
    };
    window.addEventListener('beforeunload', warn);
    return () => window.removeEventListener('beforeunload', warn);
  }, [dirty]);

  /** A field's message: at once when something unreadable was typed, for empty fields after a save attempt. */
  const errorOf = (path: string, value?: string) => {
    const message = errors.get(path);
    if (message === undefined) {
      return undefined;
    }
    return showAll || (value !== undefined && value.trim() !== '') ? message : undefined;
  };

  const setArea = (key: string, area: AreaDraft) =>
    setDraft((d) => ({ ...d, areas: d.areas.map((a) => (a.key === key ? area : a)) }));

  const addPoint = (point: PointDraft) => {
    const area = drawing ? draft.areas.find((a) => a.key === drawing.areaKey) : undefined;
    if (!area) {
      return;
    }
    const first = area.points[0];
    // Clicking the first corner again closes the outline.
    if (first && area.points.length >= 3 && first.x === point.x && first.y === point.y) {
      setDrawing(null);
      return;
    }
    const last = area.points[area.points.length - 1];
    if (last && last.x === point.x && last.y === point.y) {
      return;
    }
    setArea(area.key, appendPoint(area, point));
  };

  const removeArea = (area: AreaDraft, index: number) =>
    modals.openConfirmModal({
      title: `Remove area ${index + 1}?`,
      children: (
        <Text size="sm">
          “{area.name || 'Unnamed area'}” and the edges of its sides leave the roof. Nothing is saved until
          you save the roof.
        </Text>
      ),
      labels: { confirm: 'Remove the area', cancel: 'Keep it' },
      confirmProps: { color: 'red' },
      onConfirm: () => {
        if (drawing?.areaKey === area.key) {
          setDrawing(null);
        }
        setDraft((d) => ({ ...d, areas: d.areas.filter((a) => a.key !== area.key) }));
      },
    });

  const undo = () =>
    modals.openConfirmModal({
      title: 'Undo your changes?',
      children: <Text size="sm">The roof goes back to how it was last saved.</Text>,
      labels: { confirm: 'Undo changes', cancel: 'Keep editing' },
      confirmProps: { color: 'red' },
      onConfirm: () => {
        const restored = fromStoredRoof(record.roof);
        setDraft(restored);
        setSaved(signature(restored));
        setDrawing(null);
        setShowAll(false);
      },
    });

  const submit = () => {
    setShowAll(true);
    const badGeometry = preview.areas.find((a) => a.problem);
    if (errors.size > 0 || badGeometry || preview.problem) {
      notifications.show({
        color: 'red',
        title: 'The roof was not saved',
        message:
          errors.size > 0
            ? `Fix the ${errors.size === 1 ? 'field' : `${errors.size} fields`} marked in red first.`
            : (badGeometry?.problem ?? preview.problem ?? 'Fix the areas marked in red first.'),
      });
      return;
    }
    save.mutate(toRoofBody(draft), {
      onSuccess: (result) => {
        const next = fromStoredRoof(result.roof);
        setDraft(next);
        setSaved(signature(next));
        setDrawing(null);
        setShowAll(false);
        notifications.show({ color: 'green', message: 'Roof saved.' });
      },
    });
  };

  const readOnly = readOnlyReason !== null;
  const figures = preview.takeoff
    ? {
        ...preview.takeoff,
        trimMByKind: Object.fromEntries(
          preview.takeoff.lines
            .filter((l) => l.role.startsWith('trim:'))
            .map((l) => [l.role.slice(5), l.metres ?? '0']),
        ),
      }
    : null;

  return (
    <Grid gap="lg">
      <Grid.Col span={{ base: 12, lg: 6 }} order={{ base: 2, lg: 1 }}>
        <Stack gap="md">
          {readOnly ? (
            <Alert color="gray" variant="light">
              {readOnlyReason}
            </Alert>
          ) : null}
          {save.isError ? (
            <Alert
              color="red"
              variant="light"
              title="The roof was not saved"
              withCloseButton
              onClose={() => save.reset()}
            >
              {errorMessage(save.error)}
            </Alert>
          ) : null}
          <Box component="fieldset" disabled={readOnly} m={0} p={0} style={{ border: 0, minWidth: 0 }}>
            <Stack gap="md">
              {draft.areas.map((area, index) => (
                <AreaCard
                  key={area.key}
                  area={area}
                  index={index}
                  check={preview.areas[index]}
                  errorOf={errorOf}
                  onChange={(next) => setArea(area.key, next)}
                  onRemove={draft.areas.length > 1 ? () => removeArea(area, index) : undefined}
                  drawing={drawing?.areaKey === area.key}
                  drawStep={drawStep}
                  onDrawStepChange={(step) => {
                    setDrawStep(step);
                    setDrawing((d) => (d ? { ...d, step } : d));
                  }}
                  onToggleDrawing={() =>
                    setDrawing((d) =>
                      d?.areaKey === area.key ? null : { areaKey: area.key, step: drawStep },
                    )
                  }
                  onFocus={() => setFocused(area.key)}
                />
              ))}
              <Group gap="sm">
                <Button
                  variant="default"
                  leftSection={<IconPlus size={16} />}
                  onClick={() => setDraft((d) => ({ ...d, areas: [...d.areas, newArea(d.areas.length)] }))}
                >
                  Add a rectangle
                </Button>
                <Button
                  variant="default"
                  leftSection={<IconPlus size={16} />}
                  onClick={() => {
                    const area = newArea(draft.areas.length, 'polygon');
                    setDraft((d) => ({ ...d, areas: [...d.areas, area] }));
                    setDrawing({ areaKey: area.key, step: drawStep });
                  }}
                >
                  Add a polygon
                </Button>
              </Group>

              <FreeEdgesCard
                edges={draft.freeEdges}
                errorOf={errorOf}
                onChange={(freeEdges) => setDraft((d) => ({ ...d, freeEdges }))}
              />

              <Paper
                withBorder
                p="md"
                radius="md"
                component="section"
                aria-label="Pipes, outlets and corners"
              >
                <Stack gap="sm">
                  <Text fw={700}>Pipes, outlets and corners</Text>
                  <SimpleGrid cols={{ base: 2 }} spacing="sm" maw={360}>
                    <TextInput
                      label="Pipes"
                      inputMode="numeric"
                      value={draft.pipes}
                      error={errorOf(paths.pipes, draft.pipes)}
                      onChange={(e) => setDraft({ ...draft, pipes: e.currentTarget.value })}
                    />
                    <TextInput
                      label="Outlets"
                      inputMode="numeric"
                      value={draft.outlets}
                      error={errorOf(paths.outlets, draft.outlets)}
                      onChange={(e) => setDraft({ ...draft, outlets: e.currentTarget.value })}
                    />
                  </SimpleGrid>
                  <Switch
                    label="I counted the corner pieces myself"
                    description="Otherwise external corners come from neighbouring drip and kerb edges; internal corners (an L-shaped roof) must be counted."
                    checked={draft.cornersGiven}
                    onChange={(e) => setDraft({ ...draft, cornersGiven: e.currentTarget.checked })}
                  />
                  {draft.cornersGiven ? (
                    <SimpleGrid cols={{ base: 2 }} spacing="sm" maw={360}>
                      <TextInput
                        label="External corners"
                        inputMode="numeric"
                        value={draft.cornersExternal}
                        error={errorOf(paths.cornersExternal, draft.cornersExternal)}
                        onChange={(e) => setDraft({ ...draft, cornersExternal: e.currentTarget.value })}
                      />
                      <TextInput
                        label="Internal corners"
                        inputMode="numeric"
                        value={draft.cornersInternal}
                        error={errorOf(paths.cornersInternal, draft.cornersInternal)}
                        onChange={(e) => setDraft({ ...draft, cornersInternal: e.currentTarget.value })}
                      />
                    </SimpleGrid>
                  ) : null}
                  <Textarea
                    label="Notes on the roof"

                    rows={2}
                    maxLength={2000}
                    value={draft.notes}
                    onChange={(e) => setDraft({ ...draft, notes: e.currentTarget.value })}
                  />
                </Stack>
              </Paper>
            </Stack>
          </Box>
        </Stack>
      </Grid.Col>
      <Grid.Col span={{ base: 12, lg: 6 }} order={{ base: 1, lg: 2 }}>
        <Stack gap="sm" pos="sticky" top={76}>
          <Group justify="space-between" wrap="wrap" gap="xs">
            <Group gap="xs">
              <Text fw={700}>Plan</Text>
              {dirty ? (
                <Badge color="resin" variant="light">
                  Unsaved changes
                </Badge>
              ) : record.updatedAt ? (
                <Badge color="green" variant="light">
                  Saved
                </Badge>
              ) : null}
            </Group>
            {!readOnly ? (
              <Group gap="xs">
                <Button
                  variant="default"
                  size="sm"
                  leftSection={<IconRestore size={16} />}
                  disabled={!dirty || save.isPending}
                  onClick={undo}
                >
                  Undo changes
                </Button>
                <Button
                  size="sm"
                  leftSection={<IconDeviceFloppy size={16} />}
                  loading={save.isPending}
                  onClick={submit}
                >
                  Save roof
                </Button>
              </Group>
            ) : null}
          </Group>
          <RoofPlan
            draft={draft}
            preview={preview}
            drawing={readOnly ? null : drawing}
            onAddPoint={addPoint}
            focusedAreaKey={focused}
          />
          <RoofTotals figures={figures} leftOut={preview.leftOut} problem={preview.problem} />
          {draft.freeEdges.length > 0 ? (
            <Text size="xs" c="dimmed">
              Other edges are counted in the totals but not drawn: they have no place on the plan.
            </Text>
          ) : null}
        </Stack>
      </Grid.Col>
    </Grid>
  );
}
