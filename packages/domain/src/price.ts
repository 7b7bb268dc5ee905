import { PackedMaterial, PackSizes, DEFAULT_BUILD_UP } from './build-up';
import { Decimal, Numeric, nonNegative, roundMoney, percentToFraction, ZERO } from './decimal';
import { Estimate, Unit } from './estimate';
import { PackChoice, choosePacks } from './packs';
import { UK_VAT_STANDARD_RATE_PCT, vatOnInvoice } from './vat';

/** A line to price: its quantity and the cost of one unit of it (a line of an Estimate with a unitCost added will do). */
export interface PricedLine {
  quantity: Numeric;
  unitCost: Numeric;
}

/** A price. Every figure to the penny; net = materialCost + labourCost + markup; gross = net + vat. */
export interface Price {
  materialCost: Decimal;
  labourCost: Decimal;
  markup: Decimal;
  net: Decimal;
  vat: Decimal;
  gross: Decimal;
}

/**
 * The price of a take-off: materials (Σ quantity × unitCost), labour (hours × rate) and a markup
 * of `markupPct` on both. Each figure is worked out exactly and rounded to the penny (half up)
 * once, at the end; net is the sum of the rounded figures so a quote adds up; VAT is vatOnInvoice
 * on the net (rounded down, HMRC VAT Notice 700 §17.5), at 20 % unless told otherwise.
 */
export function priceEstimate(
  lines: readonly PricedLine[],
  labourHours: Numeric,
  labourRate: Numeric,
  markupPct: Numeric,
  vatRatePct: Numeric = UK_VAT_STANDARD_RATE_PCT,
): Price {
  let materials = ZERO;
  lines.forEach((line, i) => {
    const q = nonNegative(line.quantity, `quantity of line ${i + 1}`);
    materials = materials.plus(q.times(nonNegative(line.unitCost, `unitCost of line ${i + 1}`)));
  });
  const labour = nonNegative(labourHours, 'labour hours').times(nonNegative(labourRate, 'labour rate'));
  const markupExact = materials.plus(labour).times(percentToFraction(nonNegative(markupPct, 'markup (%)')));
  const materialCost = roundMoney(materials);
  const labourCost = roundMoney(labour);
  const markup = roundMoney(markupExact);
  const net = materialCost.plus(labourCost).plus(markup);
  const vat = vatOnInvoice(net, vatRatePct);
  return { materialCost, labourCost, markup, net, vat, gross: net.plus(vat) };
}

/** What to buy of one material for an estimate. */
export interface MaterialPacks extends PackChoice {
  material: PackedMaterial;
  unit: Unit;
  /** the estimate's quantity of the material, summed over its lines */
  quantity: Decimal;
}

/**
 * The packs to buy for an estimate: its lines summed by material (base resin for the deck and for
 * bandage together), then choosePacks for every material that has pack sizes.
 */
export function packsForEstimate(
  estimate: Pick<Estimate, 'lines'>,
  packSizes: PackSizes = DEFAULT_BUILD_UP.packSizes,
): MaterialPacks[] {
  const totals = new Map<PackedMaterial, { unit: Unit; quantity: Decimal }>();
  for (const line of estimate.lines) {
    const material = line.material as PackedMaterial;
    if (packSizes[material] === undefined) {
      continue;
    }
    const t = totals.get(material);
    totals.set(material, { unit: line.unit, quantity: (t?.quantity ?? ZERO).plus(line.quantity) });
  }
  return [...totals].map(([material, t]) => ({
    material,
    unit: t.unit,
    quantity: t.quantity,
    ...choosePacks(t.quantity, packSizes[material] as readonly Numeric[]),
  }));
}
