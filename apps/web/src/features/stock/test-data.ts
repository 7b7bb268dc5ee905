import type { Location, LotDetail } from './api/types';

// Stock as the API sends it, for the stock screens' tests (an invented store).

export function lot(overrides: Partial<LotDetail> = {}): LotDetail {
  return {
    id: 'lot-1',
    materialId: 'm-res',
    materialCode: 'RES-25',
    materialName: 'Base resin',
    materialKind: 'base-resin',
    stockUnit: 'kg',
    hazardClass: '3',
    batchNumber: 'B24-0917',
    receivedOn: '2025-06-02',
    expiry: { expiresOn: '2025-06-20', daysToExpiry: 12, badge: 'expiring' },
    status: 'available',
    usable: true,
    quantity: '50.000',
    unitCost: '3.2000',
    value: '160.00',
    locationId: 'loc-bay',
    locationName: 'Bay A',
    places: [{ locationId: 'loc-bay', locationName: 'Bay A', quantity: '50.000' }],
    receiptId: 'rcpt-1',
    receiptNumber: 12,
    exposureFlagged: false,
    exposureReason: null,
    exposureFlaggedAt: null,
    labelUrl: '/api/lots/lot-1/label.pdf',
    createdAt: '2025-06-02T08:00:00Z',
    events: [],
    ...overrides,
  };
}

export function location(overrides: Partial<Location> = {}): Location {
  return {
    id: 'loc-bay',
    name: 'Bay A',
    kind: 'bay',
    parentId: 'loc-store',
    parentName: 'Main store',
    path: 'Main store › Bay A',
    capacityLitres: null,
    allowedHazardClasses: ['none', '3'],
    active: true,
    notes: null,
    lotCount: 1,
    hazardClassesStored: ['3'],
    litresHeld: null,
    createdAt: '2025-01-01T08:00:00Z',
    updatedAt: '2025-01-01T08:00:00Z',
    ...overrides,
  };
}

export const movementsPage = { items: [], total: 0 };
