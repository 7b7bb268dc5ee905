import { Button, Group, Paper, SimpleGrid, Stack, Text, ThemeIcon } from '@mantine/core';
import { IconFileTypePdf, IconPrinter } from '@tabler/icons-react';
import { useDownloadPickList } from '../api/download-pick-list';
import { useDownloadQuote } from '../api/download-quote';
import type { JobDetail } from '../api/types';

interface DocumentsTabProps {
  job: JobDetail;
  seesPrices: boolean;
  onGoToEstimate?: () => void;
}

/** The papers of a job: the customer's quote and the store's pick list, as PDFs. */
export function DocumentsTab({ job, seesPrices, onGoToEstimate }: DocumentsTabProps) {
  const quote = useDownloadQuote();
  const pickList = useDownloadPickList();
  return (
    <SimpleGrid cols={{ base: 1, md: 2 }} spacing="md" maw={960}>
      {seesPrices ? (
        <Paper withBorder p="md" radius="md" component="section" aria-label="Quote">
          <Stack gap="sm">
            <Group gap="sm">
              <ThemeIcon variant="light" size="lg">
                <IconFileTypePdf size={20} />
              </ThemeIcon>
              <Text fw={700}>Quote for the customer</Text>
            </Group>
            <Text size="sm" c="dimmed">
              The company&apos;s details, the scope in plain words, the price with VAT, how long it holds, and
              the cautions of the trade.
            </Text>
            {job.acceptedEstimate ? (
              <Group>
                <Button
                  leftSection={<IconFileTypePdf size={16} />}
                  loading={quote.isPending}
                  onClick={() =>
                    quote.mutate({
                      jobId: job.id,
                      version: job.acceptedEstimate?.version ?? 1,
                      reference: job.reference,
                    })
                  }
                >
                  Download the quote (version {job.acceptedEstimate.version})
                </Button>
              </Group>
            ) : (
              <Stack gap="xs">
                <Text size="sm">
                  Accept an estimate first: the quote gives its price. Each version&apos;s quote can also be
                  downloaded from the list of versions.
                </Text>
                {onGoToEstimate ? (
                  <Group>
                    <Button variant="light" onClick={onGoToEstimate}>
                      Open the estimates
                    </Button>
                  </Group>
                ) : null}
              </Stack>
            )}
          </Stack>
        </Paper>
      ) : null}
      <Paper withBorder p="md" radius="md" component="section" aria-label="Pick list document">
        <Stack gap="sm">
          <Group gap="sm">
            <ThemeIcon variant="light" size="lg" color="topcoat">
              <IconPrinter size={20} />
            </ThemeIcon>
            <Text fw={700}>Pick list for the store</Text>
          </Group>
          <Text size="sm" c="dimmed">
            What goes to the site, lot by lot and where each is kept, with the safety cautions for what is on
            it.
          </Text>
          <Group>
            <Button
              variant="default"
              leftSection={<IconPrinter size={16} />}
              loading={pickList.isPending}
              onClick={() => pickList.mutate({ jobId: job.id, reference: job.reference })}
            >
              Download the pick list
            </Button>
          </Group>
        </Stack>
      </Paper>
    </SimpleGrid>
  );
}
