import { DEFAULT_BUILD_UP, EDGE_KINDS, type EdgeKind, type ScalarRate } from '@potlife/domain';
import type { BuildUp } from '../api/get-build-ups';

// The build-up form's fields, their units and bounds (the API's bounds, so a bad rate is refused
// here, beside the field, before anything is sent).

export type Rule = 'positive' | 'non-negative' | 'percent' | 'layers';

export interface RateField {
  key: ScalarRate;
  label: string;
  unit: string;
  rule: Rule;
}

export interface RateGroup {
  title: string;
  hint: string;
  fields: RateField[];
}

export const RATE_GROUPS: RateGroup[] = [
  {
    title: 'Laminate',
    hint: 'The mat, how much resin wets it and the topcoat over it.',
    fields: [
      { key: 'matGsm', label: 'Mat weight', unit: 'g/m²', rule: 'positive' },
      { key: 'layers', label: 'Layers of mat', unit: '', rule: 'layers' },
      { key: 'rollWidthM', label: 'Roll width', unit: 'm', rule: 'positive' },
      { key: 'lapM', label: 'Lap between runs', unit: 'm', rule: 'non-negative' },
      { key: 'resinToGlass', label: 'Resin to glass', unit: ': 1', rule: 'positive' },
      { key: 'topcoatKgPerM2', label: 'Topcoat', unit: 'kg/m²', rule: 'non-negative' },
      { key: 'matWastagePct', label: 'Mat wastage', unit: '%', rule: 'percent' },
      { key: 'resinWastagePct', label: 'Resin wastage', unit: '%', rule: 'percent' },
    ],
  },
  {
    title: 'Trims and upstands',
    hint: 'Trim lengths and their lap; the upstand laminated up a wall when the roof gives none.',
    fields: [
      { key: 'trimLengthM', label: 'Trim length', unit: 'm', rule: 'positive' },
      { key: 'trimLapM', label: 'Trim lap', unit: 'm', rule: 'non-negative' },
      { key: 'upstandM', label: 'Upstand height', unit: 'm', rule: 'non-negative' },
    ],
  },
  {
    title: 'Bandage and details',
    hint: 'Bandage over trim junctions, joints, corners, pipes and outlets, and the resin to dress them.',
    fields: [
      { key: 'bandageWidthMm', label: 'Bandage width', unit: 'mm', rule: 'non-negative' },
      { key: 'bandageGsm', label: 'Bandage weight', unit: 'g/m²', rule: 'non-negative' },
      { key: 'bandageMPerEdgeM', label: 'Bandage per m of edge', unit: 'm', rule: 'non-negative' },
      { key: 'bandageMPerTrimJoint', label: 'Bandage per trim joint', unit: 'm', rule: 'non-negative' },
      { key: 'bandageMPerCorner', label: 'Bandage per corner', unit: 'm', rule: 'non-negative' },
      { key: 'bandageMPerPipe', label: 'Bandage per pipe', unit: 'm', rule: 'non-negative' },
      { key: 'bandageMPerOutlet', label: 'Bandage per outlet', unit: 'm', rule: 'non-negative' },
      { key: 'extraResinKgPerPipe', label: 'Resin per pipe', unit: 'kg', rule: 'non-negative' },
      { key: 'extraResinKgPerOutlet', label: 'Resin per outlet', unit: 'kg', rule: 'non-negative' },
    ],
  },
  {
    title: 'Consumables',
    hint: 'Cleaning and fixing.',
    fields: [
      { key: 'acetoneLPerM2', label: 'Acetone', unit: 'L/m²', rule: 'non-negative' },
      { key: 'adhesiveTrimMPerCartridge', label: 'Trim per adhesive cartridge', unit: 'm', rule: 'positive' },
    ],
  },
  {
    title: 'Labour',
    hint: 'Hours the crew takes, priced at the labour rate.',
    fields: [
      { key: 'labourHoursPerM2', label: 'Hours per m² laminated', unit: 'h', rule: 'non-negative' },
      { key: 'labourHoursPerTrimM', label: 'Hours per m of trim', unit: 'h', rule: 'non-negative' },
    ],
  },
];

export const EDGE_LABELS: Record<EdgeKind, string> = {
  drip: 'Drip',
  kerb: 'Kerb',
  wall: 'Wall',
  angle: 'Angle',
};

export type BuildUpValues = Record<ScalarRate, string> & {
  name: string;
  description: string;
  labourRate: string;
  markupPct: string;
  vatRatePct: string;
  catalystBands: { fromC: string; percent: string }[];
  battenMPerEdgeM: Record<EdgeKind, string>;
  nailsPerEdgeM: Record<EdgeKind, string>;
};

function perEdge(values: Readonly<Record<EdgeKind, unknown>>): Record<EdgeKind, string> {
  return Object.fromEntries(EDGE_KINDS.map((k) => [k, String(values[k])])) as Record<EdgeKind, string>;
}

/** A new build-up starts from the domain's trade-typical defaults. */
export function defaultValues(): BuildUpValues {
  const scalars = Object.fromEntries(
    RATE_GROUPS.flatMap((g) => g.fields).map((f) => [f.key, String(DEFAULT_BUILD_UP[f.key])]),
  ) as Record<ScalarRate, string>;
  return {
    ...scalars,
    name: '',
    description: '',
    labourRate: '',
    markupPct: '',
    vatRatePct: '20',
    catalystBands: DEFAULT_BUILD_UP.catalystBands.map((b) => ({
      fromC: String(b.fromC),
      percent: String(b.percent),
    })),
    battenMPerEdgeM: perEdge(DEFAULT_BUILD_UP.battenMPerEdgeM),
    nailsPerEdgeM: perEdge(DEFAULT_BUILD_UP.nailsPerEdgeM),
  };
}

export function valuesOf(b: BuildUp): BuildUpValues {
  const scalars = Object.fromEntries(
    RATE_GROUPS.flatMap((g) => g.fields).map((f) => [f.key, b[f.key]]),
  ) as Record<ScalarRate, string>;
  return {
    ...scalars,
    name: b.name,
    description: b.description ?? '',
    labourRate: b.labourRate,
    markupPct: b.markupPct,
    vatRatePct: b.vatRatePct,
    catalystBands: b.catalystBands.map((x) => ({ fromC: x.fromC, percent: x.percent })),
    battenMPerEdgeM: perEdge(b.battenMPerEdgeM),
    nailsPerEdgeM: perEdge(b.nailsPerEdgeM),
  };
}

const DECIMAL = /^-?\d{1,12}(\.\d{1,8})?$/;

/** The message for a rate that breaks its rule, or null. */
export function checkRate(
  value: string,
  rule: Rule | 'money' | 'markup' | 'band-from' | 'band-percent',
): string | null {
  const v = value.trim();
  if (v === '') {
    return 'Enter a value';
  }
  if (!DECIMAL.test(v)) {
    return 'Write a number, like 12.5';
  }
  const n = Number(v);
  switch (rule) {
    case 'positive':
      return n > 0 ? null : 'Must be more than 0';
    case 'non-negative':
      return n >= 0 ? null : 'Must not be negative';
    case 'percent':
      return n >= 0 && n <= 100 ? null : 'A percentage from 0 to 100';
    case 'layers':
      return n >= 1 && n <= 10 ? null : 'From 1 to 10 layers';
    case 'money':
      return n >= 0 && n <= 10000 && /^\d+(\.\d{1,2})?$/.test(v)
        ? null
        : 'Pounds and pence from 0 to 10,000, like 32.50';
    case 'markup':
      return n >= 0 && n <= 1000 && /^\d+(\.\d{1,2})?$/.test(v)
        ? null
        : 'A percentage from 0 to 1,000, at most 2 decimals';
    case 'band-from':
      return n >= -50 && n <= 60 ? null : 'From −50 to 60 °C';
    case 'band-percent':
      return n >= 1 && n <= 4 ? null : 'A dose from 1 to 4 %';
    default:
      return null;
  }
}
