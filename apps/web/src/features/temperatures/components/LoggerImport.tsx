import { Alert, Button, Code, Group, List, Stack, Text } from '@mantine/core';
import { notifications } from '@mantine/notifications';
import { useQueryClient } from '@tanstack/react-query';
import { IconFileImport } from '@tabler/icons-react';
import { DataTable } from 'mantine-datatable';
import { useRef, useState } from 'react';
import { CSV_ACCEPT, MAX_CSV_BYTES } from '../../../components/csv-import/CsvImportFlow';
import { ImportProgress, type ImportStage } from '../../../components/csv-import/ImportProgress';
import { FileDrop } from '../../../components/FileDrop';
import { errorMessage } from '../../../lib/api-client';
import { formatDateTime } from '../../../lib/format';
import { newIdempotencyKey, readTextFile } from '../../../lib/upload';
import { importReadings } from '../api/record-reading';
import { STOCK_KEY, temperatureKeys, type ImportReadingsResult, type ImportRowProblem } from '../api/types';

type Stage =
  | { name: 'idle' }
  | { name: 'working'; step: ImportStage; fraction: number | null; dryRun: boolean }
  | { name: 'previewed'; result: ImportReadingsResult }
  | { name: 'imported'; result: ImportReadingsResult }
  | { name: 'failed'; message: string };

const PAGE = 10;

function Problems({ title, rows }: { title: string; rows: ImportRowProblem[] }) {
  const [page, setPage] = useState(1);
  if (rows.length === 0) {
    return null;
  }
  return (
    <Stack gap={4}>
      <Text size="sm" fw={600}>
        {title}
      </Text>
      <DataTable<ImportRowProblem>
        withTableBorder
        borderRadius="md"
        verticalSpacing={4}
        records={rows.slice((page - 1) * PAGE, page * PAGE)}
        idAccessor="row"
        totalRecords={rows.length}
        recordsPerPage={PAGE}
        page={page}
        onPageChange={setPage}
        paginationText={({ from, to, totalRecords }) => `${from}–${to} of ${totalRecords}`}
        columns={[
          { accessor: 'row', title: 'Row', width: 70 },
          { accessor: 'message', title: 'Why it is left out' },
        ]}
      />
    </Stack>
  );
}

/**
 * A data logger's CSV for one location: checked first (nothing saved), every row left out listed
 * with its row number and reason, then imported. Readings outside the band flag the lots stored there.
 */
export function LoggerImport({ locationId, locationName }: { locationId: string; locationName: string }) {
  const queryClient = useQueryClient();
  const [file, setFile] = useState<File | null>(null);
  const [stage, setStage] = useState<Stage>({ name: 'idle' });
  const csv = useRef('');
  const key = useRef(newIdempotencyKey());

  const run = async (dryRun: boolean, chosen: File) => {
    try {
      if (dryRun) {
        setStage({ name: 'working', step: 'reading', fraction: 0, dryRun });
        csv.current = await readTextFile(chosen, (fraction) =>
          setStage({ name: 'working', step: 'reading', fraction, dryRun }),
        );
        if (csv.current.trim() === '') {
          setStage({ name: 'failed', message: `${chosen.name} is empty.` });
          return;
        }
      }
      setStage({ name: 'working', step: 'sending', fraction: 0, dryRun });
      const result = await importReadings(
        { locationId, csv: csv.current, dryRun },
        dryRun ? null : key.current,
        (p) =>
          setStage({
            name: 'working',
            step: p.phase === 'waiting' ? 'checking' : 'sending',
            fraction: p.fraction,
            dryRun,
          }),
      );
      if (dryRun) {
        setStage({ name: 'previewed', result });
      } else {
        setStage({ name: 'imported', result });
        key.current = newIdempotencyKey();
        notifications.show({
          color: 'green',
          message: `${result.imported} readings imported for ${locationName}.`,
        });
        await Promise.all([
          queryClient.invalidateQueries({ queryKey: temperatureKeys.all }),
          queryClient.invalidateQueries({ queryKey: STOCK_KEY }),
        ]);
      }
    } catch (error) {
      setStage({ name: 'failed', message: errorMessage(error) });
    }
  };

  const result = stage.name === 'previewed' || stage.name === 'imported' ? stage.result : null;

  return (
    <Stack gap="sm">
      <Text size="sm" c="dimmed">
        A header row, then a time column (<Code>timestamp</Code>, <Code>time</Code>, <Code>date/time</Code>…)
        and a temperature column (<Code>temperature</Code>, <Code>temp</Code>, <Code>°C</Code>…). Times
        without a zone are UK local time; 01/06/2025 is 1 June.
      </Text>
      <FileDrop
        what="the logger's CSV"
        accept={CSV_ACCEPT}
        typesText="CSV"
        maxBytes={MAX_CSV_BYTES}
        file={file}
        onFile={(chosen) => {
          setFile(chosen);
          setStage({ name: 'idle' });
          if (chosen) {
            void run(true, chosen);
          }
        }}
        disabled={stage.name === 'working'}
        inputName="loggerCsv"
      />
      {stage.name === 'working' ? (
        <ImportProgress
          stage={stage.step}
          fraction={stage.fraction}
          label={stage.dryRun ? 'Checking every row' : 'Saving the readings'}
          showSteps={stage.dryRun}
        />
      ) : null}
      {stage.name === 'failed' ? (
        <Alert color="red" variant="light" role="alert" title="The file could not be used">
          {stage.message}
        </Alert>
      ) : null}
      {result ? (
        <Stack gap="sm">
          <Alert
            color={stage.name === 'imported' ? 'green' : result.errors.length > 0 ? 'yellow' : 'blue'}
            variant="light"
            title={stage.name === 'imported' ? 'Imported' : 'Checked: nothing saved yet'}
          >
            <List size="sm" spacing={2}>
              <List.Item>
                {result.imported} of {result.rows} rows{' '}
                {stage.name === 'imported' ? 'imported' : 'can be imported'}
                {result.firstTakenAt && result.lastTakenAt
                  ? `, ${formatDateTime(result.firstTakenAt)} to ${formatDateTime(result.lastTakenAt)}`
                  : ''}
                .
              </List.Item>
              {result.errors.length > 0 ? (
                <List.Item>
                  {result.errors.length} rows are left out (listed below, with the reason).
                </List.Item>
              ) : null}
              {result.duplicates.length > 0 ? (
                <List.Item>{result.duplicates.length} rows are already held and are skipped.</List.Item>
              ) : null}
              {result.flaggedLots.length > 0 ? (
                <List.Item>
                  {result.flaggedLots.length} lot{result.flaggedLots.length === 1 ? '' : 's'}{' '}
                  {stage.name === 'imported' ? 'are' : 'would be'} flagged &quot;check before use&quot;.
                </List.Item>
              ) : null}
            </List>
          </Alert>
          {result.flaggedLots.length > 0 ? (
            <List size="sm" spacing={2}>
              {result.flaggedLots.map((lot) => (
                <List.Item key={`${lot.lotId}-${lot.readingId}`}>{lot.message}</List.Item>
              ))}
            </List>
          ) : null}
          <Problems title="Rows left out" rows={result.errors} />
          <Problems title="Rows already held" rows={result.duplicates} />
          {stage.name === 'previewed' && file ? (
            <Group>
              <Button
                leftSection={<IconFileImport size={18} />}
                disabled={result.imported === 0}
                onClick={() => void run(false, file)}
              >
                {result.imported === 0 ? 'Nothing to import' : `Import ${result.imported} readings`}
              </Button>
            </Group>
          ) : null}
        </Stack>
      ) : null}
    </Stack>
  );
}
