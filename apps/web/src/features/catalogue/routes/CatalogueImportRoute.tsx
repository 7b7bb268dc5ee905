import { Button, Card, Code, Stack, Table, Text, Title } from '@mantine/core';
import { IconArrowLeft } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { CsvImportFlow } from '../../../components/csv-import/CsvImportFlow';
import { PageHeader } from '../../../components/PageHeader';
import { paths } from '../../../config/paths';
import { useImportMaterials, type MaterialImportRow } from '../api/import-materials';

// The columns as the API reads them (apps/api/src/catalogue/material-csv.ts); an export writes the same.
const COLUMNS: [name: string, note: string][] = [
  ['code', 'required; letters, digits and . _ / -; unique in the company'],
  ['name', 'required'],
  [
    'kind',
    'required: mat, bandage, base-resin, topcoat, catalyst, trim, outlet, acetone, adhesive, batten, fixing, other',
  ],
  ['stock_unit', 'required: kg, L, m2, m, each'],
  ['pack_sizes', 'required: size:label, several separated by ";", e.g. "20:20 kg drum; 25:25 kg drum"'],
  ['lot_tracked', 'yes or no (default yes)'],
  ['shelf_life_days', 'whole days'],
  ['storage_min_c, storage_max_c', '°C'],
  ['hazard_class', 'none, 2, 3, 4.1, 5.1, 5.2, 6.1, 8, 9 (default none)'],
  ['un_number', 'four digits; needed when the hazard class is not none'],
  ['packing_group', 'I, II or III'],
  ['flash_point_c', '°C'],
  ['is_accelerator', 'yes or no (default no)'],
  ['reorder_level, reorder_quantity', 'in the stock unit (default 0)'],
  ['mat_gsm, roll_width_m', 'needed for a mat'],
  ['trim_kind, trim_length_m', 'needed for a trim: drip, kerb, wall or angle; metres'],
  ['trim_piece', 'trims only: length, external-corner or internal-corner (empty or left out: length)'],
  ['topcoat_colour', 'topcoat only'],
  ['litres_per_kg', 'for liquids stocked by weight'],
  ['active', 'yes or no (default yes); no archives the material'],
  ['notes', 'free text'],
];

export function CatalogueImportRoute() {
  const send = useImportMaterials();
  return (
    <>
      <PageHeader
        title="Import the catalogue"
        description="Add and change materials from a CSV file. A row whose code is already in the catalogue changes that material; a new code adds one. Every row is written, or none."
        actions={
          <Button
            component={Link}
            to={paths.catalogue}
            variant="default"
            leftSection={<IconArrowLeft size={18} />}
          >
            Back to the catalogue
          </Button>
        }
      />
      <Stack gap="lg" maw={1100}>
        <CsvImportFlow<MaterialImportRow>
          what="the catalogue CSV"
          send={send}
          actionLabels={{ create: 'New material', update: 'Changes', unchanged: 'Unchanged' }}
          commitLabel={(summary) =>
            `Import ${summary.created + summary.updated} material${summary.created + summary.updated === 1 ? '' : 's'}`
          }
          columns={[
            {
              accessor: 'code',
              title: 'Code',
              sortable: true,
              render: (row) => (
                <Text size="sm" ff="monospace" fw={600}>
                  {row.code || '—'}
                </Text>
              ),
            },
            { accessor: 'name', title: 'Name', sortable: true, render: (row) => row.name || '—' },
          ]}
        />
        <Card>
          <Title order={2} fz="lg" mb="xs">
            The file
          </Title>
          <Text size="sm" c="dimmed" mb="sm">
            Comma-separated, first row the column names (any order, any case). Only the required columns must
            be there; a column left out leaves that field as it is. &quot;Export CSV&quot; on the catalogue
            writes exactly this format, so the easiest start is an export.
          </Text>
          <Table.ScrollContainer minWidth={520}>
            <Table striped withTableBorder fz="sm">
              <Table.Thead>
                <Table.Tr>
                  <Table.Th>Column</Table.Th>
                  <Table.Th>What goes in it</Table.Th>
                </Table.Tr>
              </Table.Thead>
              <Table.Tbody>
                {COLUMNS.map(([name, note]) => (
                  <Table.Tr key={name}>
                    <Table.Td>
                      <Code>{name}</Code>
                    </Table.Td>
                    <Table.Td>{note}</Table.Td>
                  </Table.Tr>
                ))}
              </Table.Tbody>
            </Table>
          </Table.ScrollContainer>
        </Card>
      </Stack>
    </>
  );
}
