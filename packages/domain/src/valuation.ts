import { Decimal, Numeric, nonNegative, roundMoney, ZERO } from './decimal';
import { DomainError } from './errors';

/**
 * The cost formulas allowed for interchangeable items: FIFO or weighted average; LIFO is not.
 * [pub] IAS 2 Inventories §§23–25 (UK: FRS 102 §13).
 */
export type ValuationMethod = 'fifo' | 'weighted-average';

/** A layer of stock at one unit cost, as received. */
export interface CostLayer {
  quantity: Numeric;
  unitCost: Numeric;
}

export interface Valuation {
  /** the cost of the quantity issued, to the penny (half up) */
  issuedCost: Decimal;
  closingQuantity: Decimal;
  /** total cost − issued cost, so no penny is lost to rounding */
  closingValue: Decimal;
  /** the cost of all the layers, to the penny (half up) */
  totalCost: Decimal;
}

/**
 * Periodic valuation of stock layers (in the order received) after `issuedQuantity` has gone out:
 * FIFO takes the oldest layers first; weighted average issues at total cost ÷ total quantity.
 * Issued cost and total cost are rounded to the penny once, at the end; closing value is their
 * difference. `'lifo'` or any other method throws DomainError (`not-allowed`), as does issuing more
 * than the layers hold.
 */
export function valueInventory(layers: readonly CostLayer[], issuedQuantity: Numeric, method: ValuationMethod): Valuation {
  const checked = layers.map((l, i) => ({
    quantity: nonNegative(l.quantity, `quantity of layer ${i + 1}`),
    unitCost: nonNegative(l.unitCost, `unit cost of layer ${i + 1}`),
  }));
  const issued = nonNegative(issuedQuantity, 'issued quantity');
  let totalQuantity = ZERO;
  let totalCostExact = ZERO;
  for (const l of checked) {
    totalQuantity = totalQuantity.plus(l.quantity);
    totalCostExact = totalCostExact.plus(l.quantity.times(l.unitCost));
  }

  let issuedExact: Decimal;
  switch (method) {
    case 'fifo': {
      issuedExact = ZERO;
      let left = issued;
      for (const l of checked) {
        const take = Decimal.min(l.quantity, left);
        issuedExact = issuedExact.plus(take.times(l.unitCost));
        left = left.minus(take);
      }
      break;
    }
    case 'weighted-average':
      issuedExact = totalQuantity.isZero() ? ZERO : issued.times(totalCostExact).div(totalQuantity);
      break;
    default: {
      const name = JSON.stringify(method as unknown);
      throw new DomainError(
        `${name} is not an allowed cost formula: IAS 2 (§§23–25) allows FIFO ('fifo') or weighted average ('weighted-average'), not LIFO.`,
        'not-allowed',
      );
    }
  }
  if (issued.gt(totalQuantity)) {
    throw new DomainError(
      `Cannot issue ${issued.toString()} when the layers hold ${totalQuantity.toString()}.`,
      'not-allowed',
    );
  }
  const totalCost = roundMoney(totalCostExact);
  const issuedCost = roundMoney(issuedExact);
  return {
    issuedCost,
    closingQuantity: totalQuantity.minus(issued),
    closingValue: totalCost.minus(issuedCost),
    totalCost,
  };
}
