import { Alert, Badge, Button, Group, List, SegmentedControl, Stack, Text } from '@mantine/core';
import { IconAlertTriangle, IconCircleCheck, IconFileImport, IconRefresh } from '@tabler/icons-react';
import { DataTable, type DataTableColumn, type DataTableSortStatus } from 'mantine-datatable';
import { useMemo, useRef, useState, type ReactNode } from 'react';
import { errorMessage } from '../../lib/api-client';
import { compareValues } from '../../lib/format';
import { readTextFile, type SendProgress } from '../../lib/upload';
import { FileDrop } from '../FileDrop';
import { ImportProgress, type ImportStage } from './ImportProgress';

// A CSV import in two steps, the same for the catalogue and for a supplier's price list: choose a
// file and see every row as the import would treat it (with the row number and the reason for
// each problem), then commit. The server writes every row or none, so the commit waits until no
// row has a problem.

export interface ImportRowError {
  field: string;
  message: string;
}

export interface ImportRowBase {
  row: number;
  action: 'create' | 'update' | 'unchanged';
  errors: ImportRowError[];
}

export interface ImportSummary<R extends ImportRowBase> {
  rows: R[];
  valid: number;
  invalid: number;
  created: number;
  updated: number;
  unchanged: number;
  committed: boolean;
}

export type ImportMode = 'preview' | 'commit';

export type SendImport<R extends ImportRowBase> = (
  mode: ImportMode,
  csv: string,
  onProgress: (progress: SendProgress) => void,
) => Promise<ImportSummary<R>>;

/** Files over this are refused before reading (the API takes up to 2 MB of CSV text). */
export const MAX_CSV_BYTES = 2 * 1024 * 1024;

export const CSV_ACCEPT: Record<string, string[]> = {
  'text/csv': ['.csv'],
  'text/plain': ['.csv', '.txt'],
  'application/vnd.ms-excel': ['.csv'],
};

interface CsvImportFlowProps<R extends ImportRowBase> {
  /** The file in words: "the catalogue CSV". */
  what: string;
  send: SendImport<R>;
  /** Columns describing each row (code, name, price…), between the row number and its problems. */
  columns: DataTableColumn<R>[];
  /** Words for the commit button: "Import 12 materials". */
  commitLabel: (summary: ImportSummary<R>) => string;
  /** Something the user sets before choosing the file (e.g. a date for every row). */
  before?: ReactNode;
  /** Called once every row is written. */
  onCommitted?: (summary: ImportSummary<R>) => void;
  /** Words for what each action means: create → "New material". */
  actionLabels: Record<ImportRowBase['action'], string>;
}

type Stage =
  | { name: 'idle' }
  | { name: 'working'; step: ImportStage; fraction: number | null; mode: ImportMode }
  | { name: 'previewed' }
  | { name: 'committed' }
  | { name: 'failed'; message: string; mode: ImportMode };

type RowFilter = 'all' | 'errors' | 'changes';
const PAGE_SIZE = 20;

const actionColors: Record<ImportRowBase['action'], string> = {
  create: 'green',
  update: 'blue',
  unchanged: 'gray',
};

export function CsvImportFlow<R extends ImportRowBase>({
  what,
  send,
  columns,
  commitLabel,
  before,
  onCommitted,
  actionLabels,
}: CsvImportFlowProps<R>) {
  const [file, setFile] = useState<File | null>(null);
  const [stage, setStage] = useState<Stage>({ name: 'idle' });
  const [summary, setSummary] = useState<ImportSummary<R> | null>(null);
  const [filter, setFilter] = useState<RowFilter>('all');
  const [page, setPage] = useState(1);
  const [sortStatus, setSortStatus] = useState<DataTableSortStatus<R>>({
    columnAccessor: 'row',
    direction: 'asc',
  });
  const csvText = useRef<string>('');

  const working = stage.name === 'working';

  const run = async (mode: ImportMode, chosen: File | null) => {
    if (!chosen) {
      return;
    }
    try {
      if (mode === 'preview') {
        setStage({ name: 'working', step: 'reading', fraction: 0, mode });
        csvText.current = await readTextFile(chosen, (fraction) =>
          setStage({ name: 'working', step: 'reading', fraction, mode }),
        );
        if (csvText.current.trim() === '') {
          setStage({
            name: 'failed',
            message: `${chosen.name} is empty: choose the file with the rows in it.`,
            mode,
          });
          return;
        }
      }
      setStage({ name: 'working', step: 'sending', fraction: 0, mode });
      const result = await send(mode, csvText.current, (progress) =>
        setStage({
          name: 'working',
          step: progress.phase === 'waiting' ? 'checking' : 'sending',
          fraction: progress.fraction,
          mode,
        }),
      );
      setSummary(result);
      setPage(1);
      if (mode === 'commit') {
        setStage({ name: 'committed' });
        onCommitted?.(result);
      } else {
        setFilter(result.invalid > 0 ? 'errors' : 'all');
        setStage({ name: 'previewed' });
      }
    } catch (error) {
      setStage({ name: 'failed', message: errorMessage(error), mode });
    }
  };

  const choose = (chosen: File | null) => {
    setFile(chosen);
    setSummary(null);
    setStage({ name: 'idle' });
    if (chosen) {
      void run('preview', chosen);
    }
  };

  const rows = useMemo(() => {
    const all = summary?.rows ?? [];
    const chosen =
      filter === 'errors'
        ? all.filter((row) => row.errors.length > 0)
        : filter === 'changes'
          ? all.filter((row) => row.errors.length === 0 && row.action !== 'unchanged')
          : all;
    const column = String(sortStatus.columnAccessor);
    const direction = sortStatus.direction === 'asc' ? 1 : -1;
    const value = (row: R): unknown =>
      column === 'row'
        ? row.row
        : column === 'action'
          ? row.errors.length > 0
            ? 'error'
            : row.action
          : (row as unknown as Record<string, unknown>)[column];
    return [...chosen].sort((a, b) => direction * compareValues(value(a), value(b)));
  }, [summary, filter, sortStatus]);

  const lastPage = Math.max(1, Math.ceil(rows.length / PAGE_SIZE));
  const currentPage = Math.min(page, lastPage);
  const records = rows.slice((currentPage - 1) * PAGE_SIZE, currentPage * PAGE_SIZE);
  const changes = summary ? summary.created + summary.updated : 0;

  return (
    <Stack gap="md">
      {before}
      <FileDrop
        what={what}
        accept={CSV_ACCEPT}
        typesText="CSV"
        typesHint="comma-separated, UTF-8"
        maxBytes={MAX_CSV_BYTES}
        file={file}
        onFile={choose}
        disabled={working}
        inputName="csv"
      />

      {stage.name === 'working' ? (
        <ImportProgress
          stage={stage.step}
          fraction={stage.fraction}
          label={stage.mode === 'commit' ? 'Importing the rows' : 'Checking every row'}
          showSteps={stage.mode === 'preview'}
        />
      ) : null}

      {stage.name === 'failed' ? (
        <Alert
          color="red"
          variant="light"
          icon={<IconAlertTriangle size={20} />}
          title={stage.mode === 'commit' ? 'Nothing was imported' : 'The file could not be checked'}
          role="alert"
        >
          <Text size="sm">{stage.message}</Text>
          {file ? (
            <Button
              mt="sm"
              size="xs"
              variant="white"
              color="red"
              leftSection={<IconRefresh size={14} />}
              onClick={() => void run(stage.mode === 'commit' && summary ? 'commit' : 'preview', file)}
            >
              Try again
            </Button>
          ) : null}
        </Alert>
      ) : null}

      {summary && stage.name !== 'working' ? (
        <>
          {stage.name === 'committed' ? (
            <Alert
              color="green"
              variant="light"
              icon={<IconCircleCheck size={20} />}
              title="Imported"
              role="status"
            >
              <Text size="sm">
                {summary.created} new, {summary.updated} changed, {summary.unchanged} unchanged. Every row of{' '}
                {file?.name ?? 'the file'} was written.
              </Text>
            </Alert>
          ) : summary.invalid > 0 ? (
            <Alert
              color="red"
              variant="light"
              icon={<IconAlertTriangle size={20} />}
              title={`${summary.invalid} of ${summary.rows.length} rows have problems`}
              role="alert"
            >
              <Text size="sm">
                Nothing is imported until every row is right. Fix the rows listed below in your spreadsheet
                (row numbers count the header as row 1), save it as CSV and choose the file again.
              </Text>
            </Alert>
          ) : (
            <Alert
              color="green"
              variant="light"
              icon={<IconCircleCheck size={20} />}
              title="Every row can be imported"
            >
              <List size="sm" spacing={2}>
                <List.Item>{summary.created} new</List.Item>
                <List.Item>{summary.updated} changed</List.Item>
                <List.Item>{summary.unchanged} already as in the file (left alone)</List.Item>
              </List>
            </Alert>
          )}

          <Group justify="space-between" wrap="wrap" gap="sm">
            <SegmentedControl
              size="xs"
              value={filter}
              onChange={(value) => {
                setFilter(value as RowFilter);
                setPage(1);
              }}
              data={[
                { value: 'all', label: `All rows (${summary.rows.length})` },
                { value: 'errors', label: `With problems (${summary.invalid})` },
                { value: 'changes', label: `To import (${changes})` },
              ]}
              aria-label="Which rows to show"
            />
            {stage.name === 'previewed' ? (
              <Button
                leftSection={<IconFileImport size={18} />}
                disabled={summary.invalid > 0 || changes === 0}
                onClick={() => void run('commit', file)}
              >
                {summary.invalid > 0
                  ? 'Fix the rows first'
                  : changes === 0
                    ? 'Nothing to import'
                    : commitLabel(summary)}
              </Button>
            ) : null}
          </Group>

          <DataTable<R>
            withTableBorder
            borderRadius="md"
            verticalSpacing="xs"
            minHeight={records.length === 0 ? 160 : undefined}
            records={records}
            idAccessor="row"
            noRecordsText={
              filter === 'errors'
                ? 'No row has a problem.'
                : filter === 'changes'
                  ? 'No row changes anything.'
                  : 'The file has no rows below its header.'
            }
            sortStatus={sortStatus}
            onSortStatusChange={setSortStatus}
            totalRecords={rows.length}
            recordsPerPage={PAGE_SIZE}
            page={currentPage}
            onPageChange={setPage}
            paginationText={({ from, to, totalRecords }) => `${from}–${to} of ${totalRecords} rows`}
            rowBackgroundColor={(row) =>
              row.errors.length > 0
                ? { light: 'var(--mantine-color-red-0)', dark: 'var(--mantine-color-red-9)' }
                : undefined
            }
            columns={[
              { accessor: 'row', title: 'Row', sortable: true, width: 70 },
              {
                accessor: 'action',
                title: 'Import as',
                sortable: true,
                width: 140,
                render: (row) =>
                  row.errors.length > 0 ? (
                    <Badge
                      color="red"
                      leftSection={<IconAlertTriangle size={12} aria-hidden />}
                      styles={{ label: { textTransform: 'none', overflow: 'visible' } }}
                    >
                      Problem
                    </Badge>
                  ) : (
                    <Badge
                      color={actionColors[row.action]}
                      styles={{ label: { textTransform: 'none', overflow: 'visible' } }}
                    >
                      {actionLabels[row.action]}
                    </Badge>
                  ),
              },
              ...columns,
              {
                accessor: 'errors',
                title: 'Problems',
                render: (row) =>
                  row.errors.length === 0 ? (
                    <Text size="sm" c="dimmed">
                      —
                    </Text>
                  ) : (
                    <List size="sm" spacing={2} c="red.9">
                      {row.errors.map((error, index) => (
                        <List.Item key={`${error.field}-${index}`}>
                          {error.field === 'row' ? error.message : `${error.field}: ${error.message}`}
                        </List.Item>
                      ))}
                    </List>
                  ),
              },
            ]}
          />
        </>
      ) : null}
    </Stack>
  );
}
