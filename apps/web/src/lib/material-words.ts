import type { EdgeKind, HazardClass, MaterialKind } from '@potlife/domain';

// The words the screens use for the catalogue's codes (GLOSSARY.md): one word for one thing.

export const materialKindLabels: Record<MaterialKind, string> = {
  mat: 'Mat',
  bandage: 'Bandage',
  'base-resin': 'Base resin',
  topcoat: 'Topcoat',
  catalyst: 'Catalyst',
  trim: 'Trim',
  outlet: 'Outlet piece',
  acetone: 'Acetone',
  adhesive: 'Adhesive',
  batten: 'Batten',
  fixing: 'Fixing',
  other: 'Other',
};

export function materialKindLabel(kind: string): string {
  return (materialKindLabels as Record<string, string>)[kind] ?? kind;
}

export const STOCK_UNITS = ['kg', 'L', 'm2', 'm', 'each'] as const;
export type StockUnit = (typeof STOCK_UNITS)[number];

/** How a stock unit is written after a quantity: "25 kg", "30 m²", "4 each". */
export function unitLabel(unit: string): string {
  return unit === 'm2' ? 'm²' : unit;
}

export const stockUnitOptions = STOCK_UNITS.map((unit) => ({
  value: unit,
  label: { kg: 'kg (kilograms)', L: 'L (litres)', m2: 'm² (square metres)', m: 'm (metres)', each: 'each' }[
    unit
  ],
}));

export const hazardClassLabels: Record<HazardClass, string> = {
  none: 'Not dangerous goods',
  '2': 'Class 2 — gases',
  '3': 'Class 3 — flammable liquid',
  '4.1': 'Class 4.1 — flammable solid',
  '5.1': 'Class 5.1 — oxidiser',
  '5.2': 'Class 5.2 — organic peroxide',
  '6.1': 'Class 6.1 — toxic',
  '8': 'Class 8 — corrosive',
  '9': 'Class 9 — miscellaneous',
};

/** "Class 3", or "—" for none: for table cells. */
export function hazardShort(hazardClass: string): string {
  return hazardClass === 'none' ? '—' : `Class ${hazardClass}`;
}

export const trimKindLabels: Record<EdgeKind, string> = {
  drip: 'Drip trim',
  kerb: 'Kerb trim',
  wall: 'Wall trim',
  angle: 'Angle trim',
};

export const locationKindLabels: Record<string, string> = {
  store: 'Store',
  bay: 'Bay',
  shelf: 'Shelf',
  'flammables-cabinet': 'Flammables cabinet',
  'peroxide-store': 'Peroxide store',
  van: 'Van',
  outdoor: 'Outdoor',
};

export function locationKindLabel(kind: string): string {
  return locationKindLabels[kind] ?? kind;
}
