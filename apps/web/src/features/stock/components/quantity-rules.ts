import { Decimal } from '@potlife/domain';

/** A quantity typed into a stock form: more than 0, at most `max`, 3 decimal places. Null when fine. */
export function quantityProblem(value: string, max: string | null, unit: string): string | null {
  const text = value.trim();
  if (text === '') {
    return 'Enter how much';
  }
  if (!/^\d+(\.\d{1,3})?$/.test(text)) {
    return 'Write it as a number, with at most 3 decimal places';
  }
  const quantity = new Decimal(text);
  if (quantity.lte(0)) {
    return 'It must be more than 0';
  }
  if (max !== null && quantity.gt(max)) {
    return `Only ${new Decimal(max).toString()} ${unit} of it is there`;
  }
  return null;
}

/** "50.000" → "50", "12.500" → "12.5": a quantity as a person would type it. */
export function plainQuantity(value: string): string {
  try {
    return new Decimal(value).toString();
  } catch {
    return value;
  }
}
