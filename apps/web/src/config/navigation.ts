import {
  IconAddressBook,
  IconBooks,
  IconCalendarEvent,
  IconClipboardList,
  IconHome2,
  IconListCheck,
  IconMailbox,
  IconPackages,
  IconStack2,
  IconTemperature,
  IconTruck,
  IconTruckDelivery,
  IconUsers,
  type Icon,
} from '@tabler/icons-react';
import type { Role } from '../lib/roles';
import { paths } from './paths';

// Who sees what: one row per navigation entry, with the roles that may open it. The navbar lists
// the rows the user's role may see, and the router guards each screen with the same roles.
// Later screens (stock, receipts, jobs, estimates, purchase orders...) add their row here.

export type NavKey =
  | 'home'
  | 'users'
  | 'mailOutbox'
  | 'jobs'
  | 'calendar'
  | 'buildUps'
  | 'customers'
  | 'catalogue'
  | 'suppliers'
  | 'receipts'
  | 'stock'
  | 'counts'
  | 'temperatures';

export interface NavEntry {
  key: NavKey;
  label: string;
  to: string;
  icon: Icon;
  roles: readonly Role[];
  /** One line on what the screen is for (the home page lists it). */
  summary: string;
}

export const navigation: readonly NavEntry[] = [
  {
    key: 'home',
    label: 'Home',
    to: paths.home,
    icon: IconHome2,
    roles: ['owner', 'estimator', 'storeman'],
    summary: 'What you do in Potlife.',
  },
  {
    key: 'receipts',
    label: 'Receive',
    to: paths.receipts,
    icon: IconTruckDelivery,
    roles: ['owner', 'storeman'],
    summary: 'Book deliveries in lot by lot, keep the delivery note and print the labels for the packs.',
  },
  {
    key: 'stock',
    label: 'Stock',
    to: paths.stock,
    icon: IconPackages,
    roles: ['owner', 'estimator', 'storeman'],
    summary:
      'What is in the store by material, by location and lot by lot, with expiry and status; moves and write-offs.',
  },
  {
    key: 'counts',
    label: 'Counts',
    to: paths.counts,
    icon: IconListCheck,
    roles: ['owner', 'storeman'],
    summary: 'Count the shelves blind, see the differences, and (for the owner) approve them.',
  },
  {
    key: 'temperatures',
    label: 'Temperatures',
    to: paths.temperatures,
    icon: IconTemperature,
    roles: ['owner', 'storeman'],
    summary:
      'Store readings typed in or from a logger, charted against the allowed band; lots to check before use.',
  },
  {
    key: 'jobs',
    label: 'Jobs',
    to: paths.jobs,
    icon: IconClipboardList,
    roles: ['owner', 'estimator', 'storeman'],
    summary: 'Every job from enquiry to invoice: its roof plan, estimates, quote, materials and pick list.',
  },
  {
    key: 'calendar',
    label: 'Calendar',
    to: paths.calendar,
    icon: IconCalendarEvent,
    roles: ['owner', 'estimator', 'storeman'],
    summary: 'The scheduled jobs month by month, and whether their materials are all reserved or short.',
  },
  {
    key: 'customers',
    label: 'Customers',
    to: paths.customers,
    icon: IconAddressBook,
    roles: ['owner', 'estimator'],
    summary: 'Who the roofs are for: contacts, billing addresses, and each customer’s jobs with their value.',
  },
  {
    key: 'buildUps',
    label: 'Build-ups',
    to: paths.buildUps,
    icon: IconStack2,
    roles: ['owner', 'estimator'],
    summary: 'The layers and rates roofs are priced with: mat, resin, trims, labour and markup.',
  },
  {
    key: 'catalogue',
    label: 'Catalogue',
    to: paths.catalogue,
    icon: IconBooks,
    roles: ['owner', 'estimator', 'storeman'],
    summary:
      'Every material the company stocks: packs, shelf life, storage and hazard; CSV import and export.',
  },
  {
    key: 'suppliers',
    label: 'Suppliers',
    to: paths.suppliers,
    icon: IconTruck,
    roles: ['owner', 'estimator', 'storeman'],
    summary: 'The firms you buy from, their contacts and lead times, and their prices with history.',
  },
  {
    key: 'users',
    label: 'Users',
    to: paths.users,
    icon: IconUsers,
    roles: ['owner'],
    summary: 'Invite people, change their role, deactivate those who have left.',
  },
  {
    key: 'mailOutbox',
    label: 'Mail outbox',
    to: paths.mailOutbox,
    icon: IconMailbox,
    roles: ['owner'],
    summary: 'Every e-mail Potlife has sent, as the recipient would see it.',
  },
];

export function navigationFor(role: Role): NavEntry[] {
  return navigation.filter((entry) => entry.roles.includes(role));
}

export function rolesFor(key: NavKey): readonly Role[] {
  const entry = navigation.find((candidate) => candidate.key === key);
  if (!entry) {
    throw new Error(`No navigation entry "${key}"`);
  }
  return entry.roles;
}

/** Whether a nav entry is the current page: exact for home, by prefix for the others. */
export function isActiveEntry(entry: NavEntry, pathname: string): boolean {
  if (entry.to === paths.home) {
    return pathname === paths.home;
  }
  return pathname === entry.to || pathname.startsWith(`${entry.to}/`);
}
