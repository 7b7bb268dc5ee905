import { ActionIcon, Button, Group, Paper, Select, Stack, Table, Text, TextInput } from '@mantine/core';
import type { EdgeKind } from '@potlife/domain';
import { IconPlus, IconTrash } from '@tabler/icons-react';
import { EdgeSample } from './RoofPlan';
import { EDGE_KIND_OPTIONS, EDGE_STYLES } from './edge-styles';
import { newKey, paths, type FreeEdgeDraft } from './roof-model';

interface FreeEdgesCardProps {
  edges: FreeEdgeDraft[];
  errorOf: (path: string, value?: string) => string | undefined;
  onChange: (edges: FreeEdgeDraft[]) => void;
}

/** Edges measured along the roof rather than drawn as the side of an area. */
export function FreeEdgesCard({ edges, errorOf, onChange }: FreeEdgesCardProps) {
  const update = (key: string, change: Partial<FreeEdgeDraft>) =>
    onChange(edges.map((e) => (e.key === key ? { ...e, ...change } : e)));
  return (
    <Paper withBorder p="md" radius="md" component="section" aria-label="Other edges">
      <Stack gap="sm">
        <div>
          <Text fw={700}>Other edges</Text>
          <Text size="sm" c="dimmed">
            Runs measured by tape that are not a side of an area above, such as part of a side that meets a
            wall.
          </Text>
        </div>
        {edges.length > 0 ? (
          <Table.ScrollContainer minWidth={560} type="native">
            <Table verticalSpacing={4} horizontalSpacing="xs">
              <Table.Thead>
                <Table.Tr>
                  <Table.Th>Kind</Table.Th>
                  <Table.Th>Length (m)</Table.Th>
                  <Table.Th>Upstand (m)</Table.Th>
                  <Table.Th>Where</Table.Th>
                  <Table.Th w={40} />
                </Table.Tr>
              </Table.Thead>
              <Table.Tbody>
                {edges.map((edge, i) => (
                  <Table.Tr key={edge.key}>
                    <Table.Td miw={150}>
                      <Group gap={6} wrap="nowrap">
                        <EdgeSample style={EDGE_STYLES[edge.kind]} />
                        <Select
                          size="xs"
                          aria-label={`Kind of other edge ${i + 1}`}
                          data={EDGE_KIND_OPTIONS}
                          value={edge.kind}
                          allowDeselect={false}
                          onChange={(v) => v && update(edge.key, { kind: v as EdgeKind })}
                          comboboxProps={{ withinPortal: true }}
                        />
                      </Group>
                    </Table.Td>
                    <Table.Td>
                      <TextInput
                        size="xs"
                        aria-label={`Length of other edge ${i + 1}`}
                        inputMode="decimal"
                        value={edge.lengthM}
                        error={errorOf(paths.edgeLength(edge.key), edge.lengthM)}
                        onChange={(e) => update(edge.key, { lengthM: e.currentTarget.value })}
                      />
                    </Table.Td>
                    <Table.Td>
                      {edge.kind === 'wall' ? (
                        <TextInput
                          size="xs"
                          aria-label={`Upstand of other edge ${i + 1}`}
                          placeholder="build-up's"
                          inputMode="decimal"
                          value={edge.upstandM}
                          error={errorOf(paths.edgeUpstand(edge.key), edge.upstandM)}
                          onChange={(e) => update(edge.key, { upstandM: e.currentTarget.value })}
                        />
                      ) : (
                        <Text size="xs" c="dimmed">
                          —
                        </Text>
                      )}
                    </Table.Td>
                    <Table.Td>
                      <TextInput
                        size="xs"
                        aria-label={`Where other edge ${i + 1} runs`}
                        placeholder="e.g. gutter side"
                        maxLength={80}
                        value={edge.label}
                        onChange={(e) => update(edge.key, { label: e.currentTarget.value })}
                      />
                    </Table.Td>
                    <Table.Td>
                      <ActionIcon
                        variant="subtle"
                        color="red"
                        aria-label={`Remove other edge ${i + 1}`}
                        onClick={() => onChange(edges.filter((e) => e.key !== edge.key))}
                      >
                        <IconTrash size={16} />
                      </ActionIcon>
                    </Table.Td>
                  </Table.Tr>
                ))}
              </Table.Tbody>
            </Table>
          </Table.ScrollContainer>
        ) : null}
        <Group>
          <Button
            size="xs"
            variant="default"
            leftSection={<IconPlus size={14} />}
            onClick={() =>
              onChange([
                ...edges,
                { key: newKey('edge'), kind: 'drip', lengthM: '', upstandM: '', label: '' },
              ])
            }
          >
            Add an edge
          </Button>
        </Group>
      </Stack>
    </Paper>
  );
}
