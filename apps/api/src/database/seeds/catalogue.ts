import { EntityManager } from 'typeorm';
import { checkMaterialFields } from '../../catalogue/material-csv';
import { MATERIAL_DEFAULTS, MaterialFields, normaliseFields } from '../../catalogue/material-fields';
import type { SeedContext } from './demo-company';

type DemoMaterial = Partial<MaterialFields> & Pick<MaterialFields, 'code' | 'name' | 'kind' | 'stockUnit' | 'packSizes'>;

/**
 * What a small GRP flat-roofing firm keeps. Names are plain trade words (no real products); packs
 * and storage figures are common trade practice, no source, unless labelled ([pub], [memory]).
 */
const RESIN_HAZARD = {
  hazardClass: '3', // resin solution: UN1866, class 3 [pub] dangerous-goods list (TRADE.md)
  unNumber: '1866',
  packingGroup: 'III',
  flashPointC: '32', // styrene-based resins flash at about 31–32 °C [memory], verify on the safety data sheet
  storageMinC: '5',
  storageMaxC: '25', // ≤ 20–25 °C [practice]
  shelfLifeDays: 180, // 3–6 months [practice]
} as const;

// Chopped strand mat, 1.04 m wide rolls of about 30 kg [practice]: roll area = length × 1.04 m,
// e.g. 450 g/m² × 1.04 m × 64 m = 29.95 kg (arithmetic). Stocked in m².
const matRoll = (gsm: number, lengthM: number) => ({
  size: (1.04 * lengthM).toFixed(2),
  label: `1.04 m × ${lengthM} m roll (about ${((gsm / 1000) * 1.04 * lengthM).toFixed(0)} kg)`,
});

const topcoat = (code: string, colour: string): DemoMaterial => ({
  code,
  name: `Topcoat, ${colour.toLowerCase()}`,
  kind: 'topcoat',
  stockUnit: 'kg',
  packSizes: [
    { size: '5', label: '5 kg tin' },
    { size: '10', label: '10 kg tin' },
    { size: '20', label: '20 kg drum' },
  ], // topcoat 5/10/20 kg [practice]
  ...RESIN_HAZARD,
  topcoatColour: colour,
  litresPerKg: '0.8', // about 1.25 kg/L pigmented [memory]
  reorderLevel: '20',
  reorderQuantity: '40',
});

const trim = (code: string, name: string, trimKind: 'drip' | 'kerb' | 'wall' | 'angle'): DemoMaterial => ({
  code,
  name,
  kind: 'trim',
  stockUnit: 'each',
  packSizes: [{ size: '1', label: '3 m length' }],
  trimKind,
  trimLengthM: '3', // standard 3 m lengths [practice]
  trimPiece: 'length',
  lotTracked: false,
  reorderLevel: '10',
  reorderQuantity: '20',
});

export const DEMO_MATERIALS: DemoMaterial[] = [
  {
    code: 'RES-GP',
    name: 'Base resin, roofing grade',
    kind: 'base-resin',
    stockUnit: 'kg',
    packSizes: [
      { size: '20', label: '20 kg drum' },
      { size: '25', label: '25 kg drum' },
    ], // 5/10/20/25 kg [practice]
    ...RESIN_HAZARD,
    litresPerKg: '0.91', // about 1.1 kg/L [memory]
    reorderLevel: '100',
    reorderQuantity: '200',
  },
  topcoat('TOP-GRY', 'Slate grey'),
  topcoat('TOP-CHR', 'Charcoal'),
  topcoat('TOP-GRN', 'Moss green'),
  {
    code: 'CAT-MEKP',
    name: 'Catalyst (MEKP hardener)',
    kind: 'catalyst',
    stockUnit: 'kg',
    packSizes: [
      { size: '1', label: '1 kg bottle' },
      { size: '5', label: '5 kg bottle' },
    ], // 0.5/1/5 kg [practice]
    // Organic peroxide, class 5.2, commonly UN3105 (type D, liquid) [memory]: verify against
    // ADR 2.2.52.4 and the label. No packing group for class 5.2. Kept in its own store (HSE CS21).
    hazardClass: '5.2',
    unNumber: '3105',
    storageMinC: '0',
    storageMaxC: '25', // ≤ 25 °C [practice]
    shelfLifeDays: 365, // 6–12 months [practice]
    litresPerKg: '0.89', // about 1.12 kg/L [memory]
    reorderLevel: '5',
    reorderQuantity: '10',
  },
  {
    code: 'MAT-300',
    name: 'Chopped strand mat 300 g/m²',
    kind: 'mat',
    stockUnit: 'm2',
    packSizes: [matRoll(300, 96)],
    matGsm: 300,
    rollWidthM: '1.04',
    reorderLevel: '100',
    reorderQuantity: '200',
  },
  {
    code: 'MAT-450',
    name: 'Chopped strand mat 450 g/m²',
    kind: 'mat',
    stockUnit: 'm2',
    packSizes: [matRoll(450, 64)],
    matGsm: 450, // 450 g most common on decks [practice]
    rollWidthM: '1.04',
    reorderLevel: '130',
    reorderQuantity: '266',
  },
  {
    code: 'MAT-600',
    name: 'Chopped strand mat 600 g/m²',
    kind: 'mat',
    stockUnit: 'm2',
    packSizes: [matRoll(600, 48)],
    matGsm: 600,
    rollWidthM: '1.04',
    reorderLevel: '50',
    reorderQuantity: '100',
  },
  ...([75, 100, 150] as const).map(
    (mm): DemoMaterial => ({
      code: `BND-${mm}`,
      name: `Glass bandage tape ${mm} mm`,
      kind: 'bandage',
      stockUnit: 'm',
      packSizes: [{ size: '50', label: '50 m roll' }], // 75/100/150 mm tapes [practice]; 50 m rolls Potlife's own demo figure
      matGsm: 450,
      rollWidthM: (mm / 1000).toFixed(3),
      lotTracked: false,
      reorderLevel: '50',
      reorderQuantity: '100',
    }),
  ),
  {
    code: 'ACE',
    name: 'Acetone',
    kind: 'acetone',
    stockUnit: 'L',
    packSizes: [
      { size: '5', label: '5 L can' },
      { size: '25', label: '25 L drum' },
    ],
    hazardClass: '3', // UN1090, class 3, PG II; flash point about −20 °C [pub] ILO ICSC 0087
    unNumber: '1090',
    packingGroup: 'II',
    flashPointC: '-20',
    lotTracked: false,
    reorderLevel: '25',
    reorderQuantity: '50',
  },
  {
    code: 'ADH-PU',
    name: 'PU trim adhesive, 310 ml cartridge',
    kind: 'adhesive',
    stockUnit: 'each',
    packSizes: [
      { size: '1', label: 'cartridge' },
      { size: '12', label: 'box of 12' },
    ],
    shelfLifeDays: 365, // Potlife's own demo figure
    storageMinC: '5',
    storageMaxC: '25',
    reorderLevel: '12',
    reorderQuantity: '24',
  },
  {
    code: 'BAT-47',
    name: 'Treated timber batten 47 × 22 mm',
    kind: 'batten',
    stockUnit: 'm',
    packSizes: [{ size: '4.8', label: '4.8 m length' }],
    lotTracked: false,
    reorderLevel: '48',
    reorderQuantity: '96',
  },
  {
    code: 'FIX-CLT30',
    name: 'Galvanised clout nails 30 mm',
    kind: 'fixing',
    stockUnit: 'each',
    packSizes: [{ size: '500', label: 'box of 500' }],
    lotTracked: false,
    reorderLevel: '1000',
    reorderQuantity: '2000',
  },
  trim('TRM-DRIP', 'Drip trim, 3 m', 'drip'),
  trim('TRM-KERB', 'Raised kerb trim, 3 m', 'kerb'),
  trim('TRM-WALL', 'Wall (upstand) trim, 3 m', 'wall'),
  trim('TRM-ANGLE', 'Angle trim, 3 m', 'angle'),
  // Corner pieces are trims (domain README); trimLengthM is each leg, Potlife's own demo figure.
  { ...trim('CRN-EXT', 'External drip corner piece', 'drip'), packSizes: [{ size: '1', label: 'corner piece' }], trimLengthM: '0.3', trimPiece: 'external-corner' },
  { ...trim('CRN-INT', 'Internal drip corner piece', 'drip'), packSizes: [{ size: '1', label: 'corner piece' }], trimLengthM: '0.3', trimPiece: 'internal-corner' },
  {
    code: 'OUT-110',
    name: 'Pre-formed outlet, 110 mm',
    kind: 'outlet',
    stockUnit: 'each',
    packSizes: [{ size: '1', label: 'outlet piece' }],
    lotTracked: false,
    reorderLevel: '2',
    reorderQuantity: '4',
  },
];

interface DemoSupplier {
  name: string;
  orderEmail: string;
  phone: string;
  address: string;
  leadTimeDays: number;
  contacts: { name: string; email: string | null; phone: string | null; role: string }[];
  /** [material code, pack size, pack price (£ net of VAT), valid from, supplier's code] */
  prices: [string, string, string, string, string | null][];
}

// Invented firms in and around the invented town of Hollowmere; 01632 numbers are set aside for drama.
export const DEMO_SUPPLIERS: DemoSupplier[] = [
  {
    name: 'Brackenfield Resin Supply',
    orderEmail: 'orders@brackenfield-resins.test',
    phone: '01632 960 118',
    address: '3 Kiln Row, Brackenfield Trading Estate, Hollowmere HM7 1BX',
    leadTimeDays: 2,
    contacts: [
      { name: 'Nell Farrow', email: 'nell.farrow@brackenfield-resins.test', phone: '01632 960 119', role: 'Trade counter' },
      { name: 'Amos Lind', email: 'accounts@brackenfield-resins.test', phone: null, role: 'Accounts' },
    ],
    prices: [
      ['RES-GP', '20', '68.00', '2025-01-06', 'BRS-R20'],
      ['RES-GP', '25', '82.00', '2025-01-06', 'BRS-R25'],
      // The one price change in the demo history: the 25 kg drum went up from 1 September 2025.
      ['RES-GP', '25', '86.40', '2025-09-01', 'BRS-R25'],
      ...['TOP-GRY', 'TOP-CHR', 'TOP-GRN'].flatMap((code): [string, string, string, string, string | null][] => [
        [code, '5', '32.50', '2025-01-06', null],
        [code, '10', '61.00', '2025-01-06', null],
        [code, '20', '118.00', '2025-01-06', null],
      ]),
      ['CAT-MEKP', '1', '9.80', '2025-01-06', 'BRS-C1'],
      ['CAT-MEKP', '5', '41.50', '2025-01-06', 'BRS-C5'],
      ['ACE', '5', '14.20', '2025-01-06', null],
      ['ACE', '25', '58.00', '2025-01-06', null],
      ['MAT-300', '99.84', '96.00', '2025-01-06', null],
      ['MAT-450', '66.56', '98.00', '2025-01-06', 'BRS-M450'],
      ['MAT-600', '49.92', '99.00', '2025-01-06', null],
      ['BND-75', '50', '11.50', '2025-01-06', null],
      ['BND-100', '50', '14.00', '2025-01-06', null],
      ['BND-150', '50', '19.50', '2025-01-06', null],
    ],
  },
  {
    name: 'Orchard Lane Roofing Supplies',
    orderEmail: 'sales@orchardlane-roofing.test',
    phone: '01632 960 274',
    address: 'Orchard Lane Depot, Sallow Green, Hollowmere HM2 6PL',
    leadTimeDays: 4,
    contacts: [
      { name: 'Priya Danecourt', email: 'priya@orchardlane-roofing.test', phone: '01632 960 275', role: 'Sales' },
      { name: 'Tom Herrick', email: null, phone: '01632 960 276', role: 'Deliveries' },
    ],
    prices: [
      ['RES-GP', '25', '84.50', '2025-02-03', 'OL-4410'],
      ['MAT-450', '66.56', '101.00', '2025-02-03', 'OL-2045'],
      ['BND-100', '50', '14.60', '2025-02-03', null],
      ['TRM-DRIP', '1', '11.20', '2025-02-03', 'OL-T100'],
      ['TRM-KERB', '1', '10.80', '2025-02-03', 'OL-T200'],
      ['TRM-WALL', '1', '12.40', '2025-02-03', 'OL-T300'],
      ['TRM-ANGLE', '1', '9.60', '2025-02-03', 'OL-T400'],
      ['CRN-EXT', '1', '6.50', '2025-02-03', null],
      ['CRN-INT', '1', '6.50', '2025-02-03', null],
      ['OUT-110', '1', '18.75', '2025-02-03', null],
      ['ADH-PU', '1', '6.90', '2025-02-03', null],
      ['ADH-PU', '12', '74.00', '2025-02-03', null],
      ['BAT-47', '4.8', '5.40', '2025-02-03', null],
      ['FIX-CLT30', '500', '12.60', '2025-02-03', null],
    ],
  },
];

const COLUMNS: [string, keyof MaterialFields][] = [
  ['code', 'code'],
  ['name', 'name'],
  ['kind', 'kind'],
  ['stock_unit', 'stockUnit'],
  ['pack_sizes', 'packSizes'],
  ['lot_tracked', 'lotTracked'],
  ['shelf_life_days', 'shelfLifeDays'],
  ['storage_min_c', 'storageMinC'],
  ['storage_max_c', 'storageMaxC'],
  ['hazard_class', 'hazardClass'],
  ['un_number', 'unNumber'],
  ['packing_group', 'packingGroup'],
  ['flash_point_c', 'flashPointC'],
  ['is_accelerator', 'isAccelerator'],
  ['reorder_level', 'reorderLevel'],
  ['reorder_quantity', 'reorderQuantity'],
  ['mat_gsm', 'matGsm'],
  ['roll_width_m', 'rollWidthM'],
  ['trim_kind', 'trimKind'],
  ['trim_length_m', 'trimLengthM'],
  ['trim_piece', 'trimPiece'],
  ['topcoat_colour', 'topcoatColour'],
  ['litres_per_kg', 'litresPerKg'],
  ['active', 'active'],
  ['notes', 'notes'],
];

/**
 * The demo company's catalogue, two suppliers with contacts, and their prices (one price change
 * in the history). Safe to run twice: materials, suppliers, contacts and price rows already there
 * are found and left alone.
 */
export async function seedCatalogue(m: EntityManager, ctx: SeedContext): Promise<void> {
  for (const demo of DEMO_MATERIALS) {
    const fields = normaliseFields({ ...MATERIAL_DEFAULTS, ...demo } as MaterialFields);
    const problems = checkMaterialFields(fields);
    if (problems.length > 0) {
      throw new Error(`Demo material ${demo.code}: ${problems.map((p) => `${p.field}: ${p.message}`).join('; ')}`);
    }
    await m.query(
      `INSERT INTO materials (company_id, ${COLUMNS.map(([c]) => c).join(', ')})
       VALUES ($1, ${COLUMNS.map((_, i) => `$${i + 2}`).join(', ')})
       ON CONFLICT (company_id, (lower(code))) DO NOTHING`,
      [ctx.companyId, ...COLUMNS.map(([, f]) => (f === 'packSizes' ? JSON.stringify(fields.packSizes) : fields[f]))],
    );
  }
  const rows: { id: string; code: string }[] = await m.query(`SELECT id, lower(code) AS code FROM materials WHERE company_id = $1`, [ctx.companyId]);
  const materialId = new Map(rows.map((r) => [r.code, r.id]));

  for (const s of DEMO_SUPPLIERS) {
    const found: { id: string }[] = await m.query(`SELECT id FROM suppliers WHERE company_id = $1 AND lower(name) = lower($2)`, [ctx.companyId, s.name]);
    let supplierId = found[0]?.id;
    if (!supplierId) {
      const [row] = (await m.query(
        `INSERT INTO suppliers (company_id, name, order_email, phone, address, lead_time_days) VALUES ($1, $2, $3, $4, $5, $6) RETURNING id`,
        [ctx.companyId, s.name, s.orderEmail, s.phone, s.address, s.leadTimeDays],
      )) as [{ id: string }];
      supplierId = row.id;
    }
    for (const c of s.contacts) {
      await m.query(
        `INSERT INTO supplier_contacts (company_id, supplier_id, name, email, phone, role)
         SELECT $1::uuid, $2::uuid, $3::text, $4::text, $5::text, $6::text
         WHERE NOT EXISTS (SELECT 1 FROM supplier_contacts WHERE supplier_id = $2::uuid AND name = $3::text)`,
        [ctx.companyId, supplierId, c.name, c.email, c.phone, c.role],
      );
    }
    for (const [code, packSize, packPrice, validFrom, supplierCode] of s.prices) {
      const id = materialId.get(code.toLowerCase());
      if (!id) {
        throw new Error(`Demo price for unknown material ${code}`);
      }
      await m.query(
        `INSERT INTO supplier_prices (company_id, supplier_id, material_id, pack_size, pack_price, valid_from, supplier_code, created_by)
         VALUES ($1, $2, $3, $4, $5, $6, $7, $8)
         ON CONFLICT (supplier_id, material_id, pack_size, valid_from) DO NOTHING`,
        [ctx.companyId, supplierId, id, packSize, packPrice, validFrom, supplierCode, ctx.userIds.owner],
      );
    }
  }
}
