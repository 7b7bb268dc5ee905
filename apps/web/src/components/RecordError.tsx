import { Anchor, Stack, Text, Title } from '@mantine/core';
import { Link } from 'react-router-dom';
import { isApiError } from '../lib/api-client';
import { QueryError } from './QueryError';

interface RecordErrorProps {
  /** The record in words with its article, e.g. "the job". */
  what: string;
  /** The heading when the API answers 404, e.g. "Job not found". */
  notFoundTitle: string;
  /** The list to go back to, e.g. paths.jobs, and its name, e.g. "the jobs". */
  backTo: string;
  backLabel: string;
  error: unknown;
  onRetry: () => void;
  retrying: boolean;
}

/**
 * What a record's page shows when the record could not be loaded: "not found" (404, which is
 * also what another company's record answers) with the way back, or the server's message and a retry.
 */
export function RecordError({
  what,
  notFoundTitle,
  backTo,
  backLabel,
  error,
  onRetry,
  retrying,
}: RecordErrorProps) {
  if (isApiError(error) && error.status === 404) {
    const noun = what.replace(/^the /, '');
    return (
      <Stack gap="sm">
        <Title order={1}>{notFoundTitle}</Title>
        <Text>
          This {noun} does not exist, or belongs to another company.{' '}
          <Anchor component={Link} to={backTo}>
            Back to {backLabel}
          </Anchor>
        </Text>
      </Stack>
    );
  }
  return <QueryError what={what} error={error} onRetry={onRetry} retrying={retrying} />;
}
