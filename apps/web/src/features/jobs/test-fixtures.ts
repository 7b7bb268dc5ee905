import type { Estimate, EstimateSummary, JobDetail, PickList, Reservations } from './api/types';

// Invented records for the jobs screens' tests (a fictional firm's fictional customers).

export const JOB_ID = '4f1c2b9e-7d0a-4c55-9b7e-2a6f3d8e1c01';

export function jobDetail(overrides: Partial<JobDetail> = {}): JobDetail {
  return {
    id: JOB_ID,
    reference: 'J-0012',
    number: 12,
    title: 'Rear extension flat roof',
    status: 'quoted',
    nextStatuses: ['won', 'lost', 'cancelled'],
    statusChangedAt: '2026-05-02T09:00:00Z',
    customer: { id: 'cust-1', name: 'Harrow Lane Surgery' },
    siteAddress: '3 Harrow Lane, Hollowmere HM2 7PD',
    substrate: 'osb',
    scheduledOn: '2026-06-15',
    estimator: { id: 'user-estimator', name: 'Ravi Okafor' },
    crew: 'Jonah and Bea',
    topcoatColour: 'Slate grey',
    buildUp: { id: 'bu-1', name: 'Standard deck, one layer 450 g' },
    hasRoof: true,
    roofUpdatedAt: '2026-05-01T09:00:00Z',
    acceptedEstimate: null,
    value: null,
    materialState: 'no-estimate',
    notes: null,
    createdAt: '2026-04-28T09:00:00Z',
    updatedAt: '2026-05-02T09:00:00Z',
    customerContact: {
      contactName: 'Priya Lennox',
      phone: '01632 960 118',
      email: 'practice@harrowlane.test',
    },
    statusHistory: [],
    ...overrides,
  };
}

export const buildUp = {
  id: 'bu-1',
  name: 'Standard deck, one layer 450 g',
  description: null,
  active: true,
  matGsm: '450',
  layers: '1',
  upstandM: '0.15',
  labourRate: '32.00',
  markupPct: '25',
  vatRatePct: '20',
};

export function estimate(overrides: Partial<Estimate> = {}): Estimate {
  return {
    id: 'est-2',
    jobId: JOB_ID,
    version: 2,
    accepted: false,
    acceptedAt: null,
    createdAt: '2026-05-03T10:00:00Z',
    createdBy: { id: 'user-estimator', name: 'Ravi Okafor' },
    note: null,
    buildUp: {
      id: 'bu-1',
      name: 'Standard deck, one layer 450 g',
      labourRate: '32.00',
      markupPct: '25',
      vatRatePct: '20',
    },
    pricedOn: '2026-05-03',
    costBasis: 'supplier',
    airC: '20',
    catalystPercent: '2',
    deckAreaM2: '44',
    upstandAreaM2: '0.45',
    laminatedAreaM2: '44.45',
    trimM: '30',
    corners: { external: 5, internal: 1, derived: false },
    pipes: 2,
    outlets: 1,
    lines: [
      {
        position: 1,
        role: 'mat',
        materialKind: 'mat',
        description: '450 g/m² chopped strand mat, 1 layer(s), 1 m rolls lapped 50 mm, 10 % wastage',
        unit: 'm2',
        quantity: '51.468421052631578947368421052631578947',
        lengths: null,
        metres: null,
        material: { id: 'mat-1', name: 'Chopped strand mat 450 g' },
      },
    ],
    materials: [
      {
        position: 1,
        roles: ['mat'],
        materialKind: 'mat',
        material: { id: 'mat-1', name: 'Chopped strand mat 450 g' },
        unit: 'm2',
        quantity: '51.468421052631578947368421052631578947',
        stockQuantity: '0',
        packs: [
          {
            source: 'supplier',
            lot: null,
            size: '30',
            label: '30 m² roll',
            count: 2,
            packPrice: '58.00',
            supplier: null,
            cost: '116.00',
          },
        ],
        packTotal: '60',
        leftover: '8.53',
        cost: '116.00',
        priced: true,
        problem: null,
      },
      {
        position: 2,
        roles: ['topcoat'],
        materialKind: 'topcoat',
        material: { id: 'mat-3', name: 'Topcoat, slate grey' },
        unit: 'kg',
        quantity: '22.225',
        stockQuantity: '0',
        packs: [
          {
            source: 'supplier',
            lot: null,
            size: '25',
            label: '25 kg tin',
            count: 1,
            packPrice: null,
            supplier: null,
            cost: null,
          },
        ],
        packTotal: '25',
        leftover: '2.775',
        cost: null,
        priced: false,
        problem: 'No price: Topcoat, slate grey has no current supplier price.',
      },
    ],
    labour: {
      laminatingHours: '15.5575',
      trimHours: '4.5',
      totalHours: '20.0575',
      rate: '32.00',
      cost: '641.84',
    },
    price: {
      materialCost: '116.00',
      labourCost: '641.84',
      markupPct: '25',
      markup: '189.46',
      net: '947.30',
      vatRatePct: '20',
      vat: '189.46',
      gross: '1136.76',
    },
    unpriced: 1,
    problems: ['No price: Topcoat, slate grey has no current supplier price.'],
    cautions: [
      { id: 'work-at-height', title: 'Work at height', text: 'Open roof edges need edge protection.' },
      {
        id: 'styrene-vapour',
        title: 'Styrene vapour',
        text: 'Ventilate and wear an organic-vapour respirator.',
      },
    ],
    ...overrides,
  };
}

export function summary(e: Estimate): EstimateSummary {
  return {
    id: e.id,
    version: e.version,
    accepted: e.accepted,
    createdAt: e.createdAt,
    createdBy: e.createdBy,
    buildUpName: e.buildUp.name,
    costBasis: e.costBasis,
    laminatedAreaM2: e.laminatedAreaM2,
    net: e.price.net,
    gross: e.price.gross,
    unpriced: e.unpriced,
  };
}

export function reservations(overrides: Partial<Reservations> = {}): Reservations {
  return {
    jobId: JOB_ID,
    jobDate: '2026-06-15',
    marginDays: 7,
    useBy: '2026-06-22',
    estimate: { id: 'est-2', version: 2 },
    state: 'short',
    flagged: 0,
    skipped: [],
    materials: [
      {
        material: { id: 'mat-2', code: 'RES-D', name: 'Deck base resin' },
        unit: 'kg',
        needed: '75',
        held: '50',
        issued: '0',
        outstanding: '25',
        reservations: [
          {
            id: 'res-1',
            lot: { id: 'lot-1', batchNumber: 'B2604-11', expiresOn: '2026-07-30' },
            status: 'held',
            reservedQuantity: '50',
            issuedQuantity: '0',
            heldQuantity: '50',
            flags: [],
            createdAt: '2026-05-04T08:00:00Z',
          },
        ],
        shortfall: {
          quantity: '25',
          neededBy: '2026-06-15',
          leadTimeDays: 5,
          supplier: { id: 'sup-1', name: 'Marsh End Resins' },
          toOrder: { packs: [{ size: '25', label: '25 kg drum', count: 1 }], total: '25' },
          checkedAt: '2026-05-04T08:00:00Z',
        },
      },
    ],
    ...overrides,
  };
}

export function pickList(overrides: Partial<PickList> = {}): PickList {
  return {
    jobId: JOB_ID,
    reference: 'J-0012',
    title: 'Rear extension flat roof',
    siteAddress: '3 Harrow Lane, Hollowmere HM2 7PD',
    jobDate: '2026-06-15',
    crew: 'Jonah and Bea',
    lines: [
      {
        material: { id: 'mat-2', code: 'RES-D', name: 'Deck base resin', kind: 'base-resin' },
        unit: 'kg',
        lot: { id: 'lot-1', batchNumber: 'B2604-11', expiresOn: '2026-07-30' },
        quantity: '50',
        places: [
          { locationId: 'loc-1', locationName: 'Flammables cabinet', quantity: '25' },
          { locationId: 'loc-2', locationName: 'Van 1', quantity: '25' },
        ],
        flags: [],
      },
    ],
    unreserved: [],
    issued: [],
    cautions: [{ id: 'flammable', title: 'Flammable', text: 'No smoking, no hot work.' }],
    ...overrides,
  };
}
