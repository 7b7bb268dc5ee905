import dayjs, { Dayjs } from 'dayjs';
import { DomainError } from './errors';

/** A calendar date as an ISO string, `YYYY-MM-DD`. */
export type IsoDate = string;

const ISO_DATE = /^\d{4}-\d{2}-\d{2}$/;
const FORMAT = 'YYYY-MM-DD';

/** An ISO date string as a Dayjs at local midnight; refuses anything else, and dates like 2025-02-30. */
export function parseDate(value: IsoDate, name = 'date'): Dayjs {
  if (typeof value !== 'string' || !ISO_DATE.test(value)) {
    throw new DomainError(`${name} must be a date written YYYY-MM-DD (got ${JSON.stringify(value)}).`);
  }
  const d = dayjs(value);
  if (!d.isValid() || d.format(FORMAT) !== value) {
    throw new DomainError(`${name} is not a calendar date: ${value}.`);
  }
  return d;
}

export function formatDate(d: Dayjs): IsoDate {
  return d.format(FORMAT);
}
