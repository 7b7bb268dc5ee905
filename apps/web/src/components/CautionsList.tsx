import { Accordion, Alert, Text } from '@mantine/core';
import { cautionsFor, type MaterialKind } from '@potlife/domain';
import { IconAlertTriangle } from '@tabler/icons-react';

interface CautionsListProps {
  kinds: readonly MaterialKind[];
  /**
   * 'store': handling in the store (receiving, counting, moving), where the roof's edges are not
   * near, so the work-at-height caution is left out; 'roof': all of them.
   */
  where: 'store' | 'roof';
  title?: string;
}

/** The usual cautions for the materials in hand (from @potlife/domain cautionsFor), each deferring to the SDS and local codes. */
export function CautionsList({ kinds, where, title = 'Take care' }: CautionsListProps) {
  const cautions = cautionsFor(kinds).filter(
    (caution) => where === 'roof' || caution.id !== 'work-at-height',
  );
  if (cautions.length === 0) {
    return null;
  }
  return (
    <Alert color="yellow" variant="light" icon={<IconAlertTriangle size={20} />} title={title} p="sm">
      <Accordion variant="default" chevronPosition="right" multiple>
        {cautions.map((caution) => (
          <Accordion.Item key={caution.id} value={caution.id}>
            <Accordion.Control py={4} px={0}>
              <Text size="sm" fw={600}>
                {caution.title}
              </Text>
            </Accordion.Control>
            <Accordion.Panel px={0}>
              <Text size="sm">{caution.text}</Text>
            </Accordion.Panel>
          </Accordion.Item>
        ))}
      </Accordion>
    </Alert>
  );
}
