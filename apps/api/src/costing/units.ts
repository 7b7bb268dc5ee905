import { Decimal, gsmToKgPerM2, Unit } from '@potlife/domain';
import type { Material } from '../catalogue/entities/material.entity';

/** What a conversion may use beside the material's own fields: the build-up's mat weight, bandage and trim sizes. */
export interface UnitContext {
  matGsm: string;
  bandageWidthMm: string;
  bandageGsm: string;
  trimLengthM: string;
}

export type Converted = { ok: true; quantity: Decimal } | { ok: false; problem: string };

const MM_PER_M = new Decimal(1000);

/**
 * A take-off quantity in the unit of its estimate line, in the material's stock unit: the same
 * unit as it is; m² of mat as kg by its weight; m of bandage as m² or kg by its width and weight;
 * trim lengths as metres; litres and kilograms by the material's litres per kg.
 */
export function toStockUnit(
  quantity: Decimal,
  from: Unit,
  material: Pick<Material, 'name' | 'stockUnit' | 'matGsm' | 'rollWidthM' | 'trimLengthM' | 'litresPerKg'>,
  ctx: UnitContext,
): Converted {
  const to = material.stockUnit;
  if (to === from) {
    return { ok: true, quantity };
  }
  const gsm = new Decimal(material.matGsm ?? ctx.matGsm);
  const fail = (why: string): Converted => ({
    ok: false,
    problem: `${material.name} is stocked in ${to} but the take-off gives ${from}: ${why}`,
  });
  if (from === 'm2' && to === 'kg') {
    return { ok: true, quantity: quantity.times(gsmToKgPerM2(gsm)) };
  }
  if (from === 'm' && (to === 'm2' || to === 'kg')) {
    const widthM = material.rollWidthM
      ? new Decimal(material.rollWidthM)
      : new Decimal(ctx.bandageWidthMm).div(MM_PER_M);
    const m2 = quantity.times(widthM);
    if (to === 'm2') {
      return { ok: true, quantity: m2 };
    }
    return { ok: true, quantity: m2.times(gsmToKgPerM2(material.matGsm ?? ctx.bandageGsm)) };
  }
  if (from === 'each' && to === 'm') {
    return { ok: true, quantity: quantity.times(material.trimLengthM ?? ctx.trimLengthM) };
  }
  if (from === 'm' && to === 'each' && material.trimLengthM) {
    return { ok: true, quantity: quantity.div(material.trimLengthM).ceil() };
  }
  if ((from === 'L' && to === 'kg') || (from === 'kg' && to === 'L')) {
    if (!material.litresPerKg) {
      return fail('give the material its litres per kg in the catalogue.');
    }
    const lpk = new Decimal(material.litresPerKg);
    return { ok: true, quantity: from === 'L' ? quantity.div(lpk) : quantity.times(lpk) };
  }
  return fail(`change its stock unit to ${from} in the catalogue, or choose another material.`);
}
