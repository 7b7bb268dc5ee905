import { Text } from '@mantine/core';
import type { Reconciliation } from '../../api/types';
import { formatMoney, formatNumber } from '../../utils/format';

/** How the reconciliation prices labour: the crew's recorded hours at the estimate's rate, or the estimate's own. */
export function labourBasisText(rec: Pick<Reconciliation, 'labour'>): string {
  const l = rec.labour;
  if (l.basis === 'recorded') {
    return `Labour: ${formatNumber(l.recordedHours)} h recorded × ${formatMoney(l.rate)}/h = ${formatMoney(l.recordedCost)} (the estimate allowed ${formatNumber(l.estimatedHours)} h, ${formatMoney(l.estimatedCost)}).`;
  }
  return `Labour: no hours recorded yet, so the estimate’s ${formatNumber(l.estimatedHours)} h (${formatMoney(l.estimatedCost)}) stands in. Record the crew’s hours on the Labour tab.`;
}

export function LabourCostLine({ reconciliation }: { reconciliation: Pick<Reconciliation, 'labour'> }) {
  // An older API answers without the labour block: say nothing rather than guess.
  if (!(reconciliation as Partial<Reconciliation>).labour) {
    return null;
  }
  return (
    <Text
      size="sm"
      c={reconciliation.labour.basis === 'recorded' ? undefined : 'dimmed'}
      data-testid="labour-basis"
    >
      {labourBasisText(reconciliation)}
    </Text>
  );
}
