import type { LineRole, MaterialKind } from '@potlife/domain';
import { Accordion, Alert, Button, Group, Radio, Select, SimpleGrid, Stack, Text } from '@mantine/core';
import { useMemo, useState } from 'react';
import type { CostBasis, Estimate } from '../../api/types';
import { useRunMaterials } from '../../api/get-run-materials';
import { roleLabels, runRoles, type RunRole } from './run-materials';

/** The Select value that leaves a role to the costing engine's best fit. */
export const BEST_FIT = 'best-fit';

export const costBasisHelp: Record<CostBasis, string> = {
  supplier: 'Every pack at the cheapest current supplier price.',
  stock: 'Lots this job could reserve for its date, at what they cost; only the rest at supplier prices.',
};

/** A choice for each role: the estimator's, else what the last version used, else best fit. */
export function choiceOf(r: RunRole, overrides: Partial<Record<LineRole, string>>): string {
  return overrides[r.role] ?? r.used?.id ?? BEST_FIT;
}

/** The run's `materials`: every role not left to best fit. */
export function chosenMaterials(
  roles: readonly RunRole[],
  overrides: Partial<Record<LineRole, string>>,
): { role: LineRole; materialId: string }[] {
  return roles
    .map((r) => ({ role: r.role, materialId: choiceOf(r, overrides) }))
    .filter((c) => c.materialId !== BEST_FIT);
}

interface RunOptionsProps {
  /** the job has a scheduled date (stock cost needs one) */
  hasDate: boolean;
  costBasis: CostBasis;
  onCostBasis: (basis: CostBasis) => void;
  /** the newest version, whose roles and materials are the starting point; undefined when none */
  last: Estimate | undefined;
  lastLoading: boolean;
  overrides: Partial<Record<LineRole, string>>;
  onChoose: (role: LineRole, value: string) => void;
}

/** Before a run: what to cost the materials at, and which material each role takes. */
export function RunOptions({
  hasDate,
  costBasis,
  onCostBasis,
  last,
  lastLoading,
  overrides,
  onChoose,
}: RunOptionsProps) {
  const [opened, setOpened] = useState<string | null>(null);
  const roles = useMemo(() => runRoles(last), [last]);
  const kinds = useMemo(() => [...new Set(roles.map((r) => r.kind))] as MaterialKind[], [roles]);
  const catalogue = useRunMaterials(kinds, opened === 'materials');
  const chosen = chosenMaterials(roles, overrides).length;
  const changed = roles.filter(
    (r) => overrides[r.role] !== undefined && overrides[r.role] !== (r.used?.id ?? BEST_FIT),
  ).length;
  const summary = lastLoading
    ? 'loading the last version…'
    : chosen === 0
      ? 'best fit for every role'
      : `${chosen} of ${roles.length} chosen${last ? `, as version ${last.version}` : ''}${changed ? ` with ${changed} changed` : ''}`;

  return (
    <Stack gap="sm">
      <Radio.Group
        label="Cost the materials at"
        value={costBasis}
        onChange={(v) => onCostBasis(v as CostBasis)}
        description={
          hasDate || costBasis === 'stock'
            ? costBasisHelp[costBasis]
            : `${costBasisHelp.supplier} Stock cost needs the job’s scheduled date.`
        }
      >
        <Group gap="lg" mt={6} wrap="wrap">
          <Radio value="supplier" label="Supplier prices" />
          <Radio value="stock" label="Stock the job can reserve" disabled={!hasDate} />
        </Group>
      </Radio.Group>

      <Accordion variant="contained" radius="md" value={opened} onChange={setOpened}>
        <Accordion.Item value="materials">
          <Accordion.Control>
            <Text size="sm" fw={600} span>
              Materials for this run
            </Text>{' '}
            <Text size="sm" c="dimmed" span>
              · {summary}
            </Text>
          </Accordion.Control>
          <Accordion.Panel>
            <Stack gap="sm">
              <Text size="sm" c="dimmed">
                {last
                  ? `The roles of version ${last.version}, each with the material it used. Best fit lets the costing engine choose from the catalogue.`
                  : 'Every role a roof can need. Best fit lets the costing engine choose from the catalogue; roles this roof does not need are left out.'}
              </Text>
              {catalogue.isError ? (
                <Alert color="red" variant="light" title="The catalogue could not be loaded">
                  <Group gap="sm">
                    <Text size="sm">The choices below show only what the last version used.</Text>
                    <Button
                      size="xs"
                      variant="white"
                      onClick={() => void catalogue.refetch()}
                      loading={catalogue.isFetching}
                    >
                      Try again
                    </Button>
                  </Group>
                </Alert>
              ) : null}
              <SimpleGrid cols={{ base: 1, sm: 2 }} spacing="sm">
                {roles.map((r) => {
                  const options = (catalogue.data ?? [])
                    .filter((m) => m.kind === r.kind)
                    .map((m) => ({ value: m.id, label: `${m.name} (${m.code})` }));
                  if (r.used && !options.some((o) => o.value === r.used!.id)) {
                    // until the catalogue arrives, or a material no longer active
                    options.unshift({
                      value: r.used.id,
                      label: catalogue.isSuccess
                        ? `${r.used.name} (no longer active: best fit is used)`
                        : r.used.name,
                    });
                  }
                  return (
                    <Select
                      key={r.role}
                      label={roleLabels[r.role]}
                      data={[{ value: BEST_FIT, label: 'Best fit' }, ...options]}
                      value={choiceOf(r, overrides)}
                      onChange={(v) => onChoose(r.role, v ?? BEST_FIT)}
                      allowDeselect={false}
                      searchable
                      nothingFoundMessage={`No active ${r.kind} in the catalogue`}
                      placeholder={catalogue.isPending ? 'Loading…' : undefined}
                      rightSection={catalogue.isFetching ? <Text size="xs">…</Text> : undefined}
                      comboboxProps={{ withinPortal: true }}
                    />
                  );
                })}
              </SimpleGrid>
            </Stack>
          </Accordion.Panel>
        </Accordion.Item>
      </Accordion>
    </Stack>
  );
}
