import { Decimal } from '@potlife/domain';
import dayjs from 'dayjs';
import { EntityManager } from 'typeorm';
import type { LocationKind } from '../../stock/entities/location.entity';
import { ExposureService, ReadingInput } from '../../stock/exposure.service';
import { LedgerService } from '../../stock/ledger.service';
import { DEFAULT_ALLOWED_CLASSES } from '../../stock/locations.service';
import { MovementsService } from '../../stock/movements.service';
import { ReceivingService } from '../../stock/receiving.service';
import type { SeedContext } from './demo-company';

/**
 * Demo stock for Tamsin Vale Roofing Ltd (invented): the main store with bays, a shelf and a
 * flammables cabinet, a peroxide store, a van and an outdoor compound; lots of the catalogue's
 * materials received through demo receipts (so the ledger is real) with staggered expiry dates —
 * one expired batch still on the shelf, two expiring within 30 days, the rest well in date — a
 * transfer to the van, and three weeks of temperature readings with one warm afternoon in the
 * peroxide store that flags the catalyst there "check before use".
 *
 * Safe to run twice: locations are found by name, receipts by delivery note number, transfers by
 * their note, and readings only seeded while the company has none.
 */

interface DemoLocation {
  key: string;
  name: string;
  kind: LocationKind;
  parent?: string;
  capacityLitres?: string;
  allowed?: string[];
  notes?: string;
}

const LOCATIONS: DemoLocation[] = [
  { key: 'store', name: 'Main store', kind: 'store', notes: 'Unit 4, Coppice Yard: the lock-up behind the office' },
  { key: 'bayA', name: 'Bay A (resins and topcoats)', kind: 'bay', parent: 'store' },
  { key: 'bayB', name: 'Bay B (mat and tape)', kind: 'bay', parent: 'store', allowed: ['none'] },
  { key: 'shelfB1', name: 'Shelf B1 (trims, adhesive, fixings)', kind: 'shelf', parent: 'bayB', allowed: ['none'] },
  { key: 'cabinet', name: 'Flammables cabinet', kind: 'flammables-cabinet', parent: 'store', capacityLitres: '50', notes: 'Fire-resisting cabinet by the door: acetone and part-used tins only' },
  { key: 'peroxide', name: 'Peroxide store', kind: 'peroxide-store', notes: 'Vented steel locker on the far wall of the yard, away from the resin bay' },
  { key: 'van', name: 'Van 1', kind: 'van', notes: 'Crew van, kept on the yard overnight' },
  { key: 'outdoor', name: 'Outdoor compound', kind: 'outdoor', notes: 'Fenced yard for battens and offcuts' },
];

interface DemoLine {
  /** catalogue code first, else the first material of the kind */
  code: string;
  kind: string;
  packs: number;
  packSize: string;
  /** cost per stock unit, £ */
  unitCost: string;
  to: string;
  batch?: string;
  /** days from today, as printed on the packs; left out, received date + shelf life */
  expiresInDays?: number;
  refused?: number;
  refusedReason?: string;
}

interface DemoReceipt {
  deliveryNote: string;
  supplier: number;
  daysAgo: number;
  note?: string;
  lines: DemoLine[];
}

const RECEIPTS: DemoReceipt[] = [
  {
    deliveryNote: 'TV-DEMO-0001',
    supplier: 0,
    daysAgo: 150,
    lines: [
      // a batch past its date still on the shelf: the storeman's home shows it
      { code: 'RES-GP', kind: 'base-resin', packs: 2, packSize: '25', unitCost: '3.1200', to: 'bayA', batch: 'HR-2406-118', expiresInDays: -5 },
      { code: 'TOP-GRY', kind: 'topcoat', packs: 2, packSize: '20', unitCost: '4.4500', to: 'bayA', batch: 'TC-2406-044', expiresInDays: 12 },
    ],
  },
  {
    deliveryNote: 'TV-DEMO-0002',
    supplier: 0,
    daysAgo: 60,
    lines: [
      { code: 'RES-GP', kind: 'base-resin', packs: 6, packSize: '25', unitCost: '3.2400', to: 'bayA', batch: 'HR-2409-031' },
      { code: 'MAT-450', kind: 'mat', packs: 3, packSize: '66.56', unitCost: '1.9500', to: 'bayB', batch: 'CS45-0912' },
      { code: 'MAT-300', kind: 'mat', packs: 2, packSize: '99.84', unitCost: '1.4200', to: 'bayB', batch: 'CS30-0907' },
      { code: 'BND-100', kind: 'bandage', packs: 4, packSize: '50', unitCost: '0.8600', to: 'bayB' },
      { code: 'CAT-MEKP', kind: 'catalyst', packs: 6, packSize: '1', unitCost: '8.9000', to: 'peroxide', batch: 'PX-2409-207' },
      { code: 'CAT-MEKP', kind: 'catalyst', packs: 2, packSize: '5', unitCost: '7.6000', to: 'peroxide', batch: 'PX-2405-112', expiresInDays: 20 },
    ],
  },
  {
    deliveryNote: 'TV-DEMO-0003',
    supplier: 1,
    daysAgo: 30,
    note: 'One drum split at the seam: refused at the door',
    lines: [
      { code: 'ACE', kind: 'acetone', packs: 4, packSize: '5', unitCost: '2.3000', to: 'cabinet' },
      { code: 'TOP-CHR', kind: 'topcoat', packs: 2, packSize: '5', unitCost: '5.1000', to: 'cabinet', batch: 'TC-2410-090' },
      { code: 'RES-GP', kind: 'base-resin', packs: 2, packSize: '25', unitCost: '3.2400', to: 'bayA', batch: 'HR-2410-077', refused: 1, refusedReason: 'Drum split at the seam' },
      { code: 'TRM-DRIP', kind: 'trim', packs: 20, packSize: '1', unitCost: '11.5000', to: 'shelfB1' },
      { code: 'TRM-KERB', kind: 'trim', packs: 10, packSize: '1', unitCost: '12.2500', to: 'shelfB1' },
      { code: 'ADH-PU', kind: 'adhesive', packs: 12, packSize: '1', unitCost: '6.4000', to: 'shelfB1', batch: 'PU-2410-5' },
      { code: 'FIX-CLT30', kind: 'fixing', packs: 4, packSize: '500', unitCost: '0.0120', to: 'shelfB1' },
      { code: 'BAT-47', kind: 'batten', packs: 20, packSize: '4.8', unitCost: '0.9500', to: 'outdoor' },
    ],
  },
  {
    deliveryNote: 'TV-DEMO-0004',
    supplier: 0,
    daysAgo: 10,
    lines: [
      { code: 'TOP-GRN', kind: 'topcoat', packs: 3, packSize: '10', unitCost: '4.6000', to: 'bayA', batch: 'TC-2411-015' },
      { code: 'MAT-450', kind: 'mat', packs: 2, packSize: '66.56', unitCost: '1.9500', to: 'bayB', batch: 'CS45-1102' },
    ],
  },
  {
    // After the warm afternoon in the peroxide store: this catalyst is not flagged, so the
    // nearer demo jobs can hold all they need. The walkway job stays short on purpose.
    deliveryNote: 'TV-DEMO-0005',
    supplier: 1,
    daysAgo: 2,
    lines: [
      { code: 'CAT-MEKP', kind: 'catalyst', packs: 12, packSize: '1', unitCost: '9.1000', to: 'peroxide', batch: 'PX-2411-318' },
      { code: 'TOP-GRY', kind: 'topcoat', packs: 3, packSize: '20', unitCost: '4.5000', to: 'bayA', batch: 'TC-2411-061' },
      { code: 'CRN-EXT', kind: 'trim', packs: 16, packSize: '1', unitCost: '6.8000', to: 'shelfB1' },
      { code: 'CRN-INT', kind: 'trim', packs: 4, packSize: '1', unitCost: '6.8000', to: 'shelfB1' },
      { code: 'TRM-WALL', kind: 'trim', packs: 10, packSize: '1', unitCost: '13.4000', to: 'shelfB1' },
      { code: 'TRM-KERB', kind: 'trim', packs: 10, packSize: '1', unitCost: '12.2500', to: 'shelfB1' },
      { code: 'OUT-110', kind: 'outlet', packs: 4, packSize: '1', unitCost: '14.9000', to: 'shelfB1' },
      { code: 'ADH-PU', kind: 'adhesive', packs: 6, packSize: '1', unitCost: '6.4000', to: 'shelfB1', batch: 'PU-2411-2' },
      { code: 'BAT-47', kind: 'batten', packs: 10, packSize: '4.8', unitCost: '0.9500', to: 'outdoor' },
    ],
  },
];

/** Base temperature and daily swing per location, °C: an unheated UK lock-up in autumn (invented). */
const CLIMATE: Record<string, { base: number; swing: number }> = {
  store: { base: 13, swing: 2.5 },
  cabinet: { base: 13.5, swing: 2 },
  peroxide: { base: 12, swing: 3 },
  van: { base: 10, swing: 6 },
  outdoor: { base: 9, swing: 5 },
};

/** A small fixed pseudo-random sequence, so the demo readings are the same on every run. */
function wobble(i: number): number {
  const x = Math.sin(i * 12.9898) * 43758.5453;
  return x - Math.floor(x) - 0.5;
}

export async function seedStock(m: EntityManager, ctx: SeedContext): Promise<void> {
  const companyId = ctx.companyId;
  const userId = ctx.userIds.storeman ?? ctx.userIds.owner;
  const today = dayjs().startOf('day');
  const ledger = new LedgerService();
  const receiving = new ReceivingService(ledger);
  const movements = new MovementsService(ledger);
  const exposure = new ExposureService();

  const materials: { id: string; code: string; kind: string; lotTracked: boolean }[] = await m.query(
    `SELECT id, code, kind, lot_tracked AS "lotTracked" FROM materials WHERE company_id = $1 AND active ORDER BY code`,
    [companyId],
  );
  if (materials.length === 0) {
    console.log('demo stock: no catalogue materials, skipped');
    return;
  }
  const material = (code: string, kind: string) => materials.find((x) => x.code === code) ?? materials.find((x) => x.kind === kind);

  // Locations, found by name.
  const loc: Record<string, string> = {};
  for (const l of LOCATIONS) {
    const [found] = (await m.query(`SELECT id FROM locations WHERE company_id = $1 AND lower(name) = lower($2)`, [companyId, l.name])) as { id: string }[];
    if (found) {
      loc[l.key] = found.id;
      continue;
    }
    const [row] = (await m.query(
      `INSERT INTO locations (company_id, name, kind, parent_id, capacity_litres, allowed_hazard_classes, notes)
       VALUES ($1, $2, $3, $4, $5, $6, $7) RETURNING id`,
      [companyId, l.name, l.kind, l.parent ? loc[l.parent] : null, l.capacityLitres ?? null, l.allowed ?? DEFAULT_ALLOWED_CLASSES[l.kind], l.notes ?? null],
    )) as [{ id: string }];
    loc[l.key] = row.id;
  }

  const suppliers: { id: string; name: string }[] = await m.query(`SELECT id, name FROM suppliers WHERE company_id = $1 AND active ORDER BY name`, [companyId]);

  // Receipts, found by delivery note number; each one in a savepoint so one the rules refuse
  // (a catalogue edited since) is left out without spoiling the rest.
  for (const r of RECEIPTS) {
    const taken: unknown[] = await m.query(`SELECT 1 FROM receipts WHERE company_id = $1 AND delivery_note_number = $2`, [companyId, r.deliveryNote]);
    if (taken.length > 0) {
      continue;
    }
    const receivedOn = today.subtract(r.daysAgo, 'day');
    const lines = r.lines.flatMap((l) => {
      const mt = material(l.code, l.kind);
      if (!mt) {
        return [];
      }
      return [
        {
          materialId: mt.id,
          locationId: loc[l.to],
          packsReceived: l.packs,
          packSize: l.packSize,
          packsRefused: l.refused,
          refusedReason: l.refusedReason,
          unitCost: l.unitCost,
          batchNumber: l.batch ?? (mt.lotTracked ? `${l.code}-${receivedOn.format('YYMMDD')}` : undefined),
          expiresOn: l.expiresInDays === undefined ? undefined : today.add(l.expiresInDays, 'day').format('YYYY-MM-DD'),
        },
      ];
    });
    if (lines.length === 0) {
      continue;
    }
    const supplier = suppliers[r.supplier] ?? suppliers[0];
    await m.query('SAVEPOINT demo_receipt');
    try {
      await receiving.post(
        m,
        companyId,
        { id: userId, role: 'storeman' },
        {
          supplierId: supplier?.id,
          supplierName: supplier ? undefined : 'Brackwater Composite Supplies',
          deliveryNoteNumber: r.deliveryNote,
          receivedOn: receivedOn.format('YYYY-MM-DD'),
          note: r.note,
          lines,
        },
        { at: receivedOn.hour(9).minute(30).toDate() },
      );
      await m.query('RELEASE SAVEPOINT demo_receipt');
    } catch (err) {
      await m.query('ROLLBACK TO SAVEPOINT demo_receipt');
      console.log(`demo stock: receipt ${r.deliveryNote} left out: ${err instanceof Error ? err.message : String(err)}`);
    }
  }

  // Van stock for the week: a roll of 450 mat and a can of acetone.
  const VAN_NOTE = 'Demo: van stock for the week';
  const moved: unknown[] = await m.query(`SELECT 1 FROM stock_movements WHERE company_id = $1 AND note = $2`, [companyId, VAN_NOTE]);
  if (moved.length === 0) {
    for (const [code, kind, from, qty] of [
      ['MAT-450', 'mat', 'bayB', '66.56'],
      ['ACE', 'acetone', 'cabinet', '5'],
    ] as const) {
      const mt = material(code, kind);
      const [lot] = mt
        ? ((await m.query(
            `SELECT l.id FROM lots l JOIN lot_balances b ON b.lot_id = l.id AND b.location_id = $3
              WHERE l.company_id = $1 AND l.material_id = $2 AND b.quantity >= $4::numeric ORDER BY l.received_on LIMIT 1`,
            [companyId, mt.id, loc[from], qty],
          )) as { id: string }[])
        : [];
      if (!lot) {
        continue;
      }
      await m.query('SAVEPOINT demo_move');
      try {
        await movements.transfer(
          m,
          { companyId, userId, at: today.subtract(9, 'day').hour(7).minute(45).toDate() },
          { lotId: lot.id, fromLocationId: loc[from]!, toLocationId: loc.van!, quantity: new Decimal(qty), note: VAN_NOTE },
        );
        await m.query('RELEASE SAVEPOINT demo_move');
      } catch (err) {
        await m.query('ROLLBACK TO SAVEPOINT demo_move');
        console.log(`demo stock: transfer left out: ${err instanceof Error ? err.message : String(err)}`);
      }
    }
  }

  // Three weeks of logger readings, every six hours, per location with a logger; one warm
  // afternoon (27.5 °C) in the peroxide store four days ago, above the catalyst's 25 °C.
  const [{ n }] = (await m.query(`SELECT count(*)::int AS n FROM temperature_readings WHERE company_id = $1`, [companyId])) as [{ n: number }];
  if (n > 0) {
    return;
  }
  const start = today.subtract(21, 'day');
  let i = 0;
  for (const [key, climate] of Object.entries(CLIMATE)) {
    const readings: ReadingInput[] = [];
    for (let h = 0; h < 21 * 24; h += 6) {
      const at = start.add(h, 'hour');
      const daily = Math.sin(((at.hour() - 9) / 24) * 2 * Math.PI) * climate.swing;
      const t = climate.base + daily + wobble(i++) * 1.5;
      readings.push({ takenAt: at.toDate(), temperatureC: t.toFixed(1), source: 'import' });
    }
    if (key === 'peroxide') {
      readings.push({
        takenAt: today.subtract(4, 'day').hour(15).toDate(),
        temperatureC: '27.5',
        source: 'manual',
        note: 'Sun on the locker door all afternoon; door propped open to cool it',
      });
    }
    await exposure.record(m, { companyId, userId }, loc[key]!, readings);
  }
}
