import { Decimal, Numeric, nonNegative, roundMoney, ZERO } from './decimal';
import { IsoDate } from './dates';
import { choosePacks, PackChoice } from './packs';
import { allocateFefo, FefoLot } from './stock';

/** A lot offered to costFromStock: a FefoLot with the cost of one stock unit of it. */
export interface CostedLot extends FefoLot {
  unitCost: Numeric;
}

/** What is taken from one lot, at the lot's own cost. */
export interface StockPart {
  lotId: string;
  quantity: Decimal;
  unitCost: Decimal;
  /** quantity × unitCost, to the penny (for display; price the exact figures with priceEstimate) */
  cost: Decimal;
}

export interface StockCostSplit {
  /** from the lots, first expired first out */
  fromStock: StockPart[];
  /** Σ of fromStock quantities */
  stockQuantity: Decimal;
  /** what stock does not cover, to buy */
  remainder: Decimal;
  /** choosePacks over the remainder; null when nothing is left to buy */
  packs: PackChoice | null;
}

/**
 * A need split between stock and buying: what the lots offered can cover, taken first expired
 * first out (allocateFefo: usable lots in date on `useBy`, never more than a lot holds) and
 * costed at each lot's own unit cost; only the remainder is bought, in packs by choosePacks.
 * Give `packSizes` empty when the material has none: the remainder is then left without packs.
 */
export function costFromStock(
  lots: readonly CostedLot[],
  need: Numeric,
  useBy: IsoDate,
  packSizes: readonly Numeric[],
): StockCostSplit {
  const needed = nonNegative(need, 'need');
  const costs = new Map<string, Decimal>();
  for (const lot of lots) {
    costs.set(lot.id, nonNegative(lot.unitCost, `unitCost of lot ${lot.id}`));
  }
  const fefo = allocateFefo(lots, needed, useBy);
  const fromStock: StockPart[] = fefo.allocations.map((a) => {
    const unitCost = costs.get(a.lotId) as Decimal;
    return { lotId: a.lotId, quantity: a.quantity, unitCost, cost: roundMoney(a.quantity.times(unitCost)) };
  });
  const stockQuantity = fromStock.reduce((s, p) => s.plus(p.quantity), ZERO);
  const remainder = fefo.shortfall;
  const packs = remainder.isZero() || packSizes.length === 0 ? null : choosePacks(remainder, packSizes);
  return { fromStock, stockQuantity, remainder, packs };
}
