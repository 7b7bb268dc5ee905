import dayjs from 'dayjs';

// The days a month view shows: whole weeks, Monday first, from the week of the 1st to the week of
// the last day.

export interface MonthDay {
  date: string;
  day: number;
  inMonth: boolean;
  weekend: boolean;
}

export function isMonth(value: string | null): value is string {
  return value !== null && /^\d{4}-(0[1-9]|1[0-2])$/.test(value);
}

export function monthDays(month: string): MonthDay[] {
  const first = dayjs(`${month}-01`);
  const offset = (first.day() + 6) % 7;
  const start = first.subtract(offset, 'day');
  const last = first.endOf('month');
  const trailing = 6 - ((last.day() + 6) % 7);
  const end = last.add(trailing, 'day');
  const days: MonthDay[] = [];
  for (let d = start; !d.isAfter(end, 'day'); d = d.add(1, 'day')) {
    days.push({
      date: d.format('YYYY-MM-DD'),
      day: d.date(),
      inMonth: d.month() === first.month(),
      weekend: d.day() === 0 || d.day() === 6,
    });
  }
  return days;
}

export function shiftMonth(month: string, by: number): string {
  return dayjs(`${month}-01`).add(by, 'month').format('YYYY-MM');
}

export function monthTitle(month: string): string {
  return dayjs(`${month}-01`).toDate().toLocaleDateString('en-GB', { month: 'long', year: 'numeric' });
}

export const WEEKDAYS = ['Mon', 'Tue', 'Wed', 'Thu', 'Fri', 'Sat', 'Sun'];
