import type { Material } from './api/types';

// Materials as the API sends them, for the catalogue's tests (an invented firm's stock).

export function material(overrides: Partial<Material> = {}): Material {
  return {
    id: 'mat-res',
    code: 'RES-25',
    name: 'Base resin, 25 kg drum',
    kind: 'base-resin',
    stockUnit: 'kg',
    packSizes: [{ size: '25', label: '25 kg drum' }],
    lotTracked: true,
    shelfLifeDays: 90,
    storageMinC: '5',
    storageMaxC: '25',
    hazardClass: '3',
    unNumber: '1866',
    packingGroup: 'III',
    flashPointC: '32',
    isAccelerator: false,
    reorderLevel: '50',
    reorderQuantity: '100',
    matGsm: null,
    rollWidthM: null,
    trimKind: null,
    trimLengthM: null,
    trimPiece: null,
    topcoatColour: null,
    litresPerKg: null,
    active: true,
    notes: null,
    createdAt: '2025-03-01T08:00:00Z',
    updatedAt: '2025-03-02T08:00:00Z',
    ...overrides,
  };
}

export const materials: Material[] = [
  material(),
  material({
    id: 'mat-450',
    code: 'MAT-450',
    name: 'Chopped strand mat 450 g/m²',
    kind: 'mat',
    stockUnit: 'm2',
    packSizes: [{ size: '64', label: '64 m² roll' }],
    shelfLifeDays: null,
    storageMinC: null,
    storageMaxC: null,
    hazardClass: 'none',
    unNumber: null,
    packingGroup: null,
    flashPointC: null,
    matGsm: 450,
    rollWidthM: '1.04',
  }),
];

export const page = (items: Material[]) => ({ items, total: items.length, page: 1, pageSize: 25 });
