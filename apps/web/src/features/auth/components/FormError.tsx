import { Alert } from '@mantine/core';
import { IconAlertCircle } from '@tabler/icons-react';
import { errorMessage } from '../../../lib/api-client';

/** The server's reason a form was refused, above the form's button. */
export function FormError({ error }: { error: unknown }) {
  if (!error) {
    return null;
  }
  return (
    <Alert color="red" variant="light" icon={<IconAlertCircle size={18} />} role="alert">
      {errorMessage(error)}
    </Alert>
  );
}
