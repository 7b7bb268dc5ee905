import { HttpStatus, Injectable, NotFoundException } from '@nestjs/common';
import { Decimal, DomainError, HazardClass, ledgerBalance, MovementKind } from '@potlife/domain';
import { randomUUID } from 'node:crypto';
import { EntityManager } from 'typeorm';
import { RuleViolation } from '../common/http-exception.filter';
import type { StockUnit } from '../catalogue/entities/material.entity';
import type { LocationKind } from './entities/location.entity';
import type { LotStatus } from './entities/lot.entity';
import { checkPlacement, PlacedMaterial, PlaceNode, Present, Put, zoneMembers, zoneRoot } from './placement';

/** A lot as the ledger works with it, with its material; read `FOR UPDATE`. */
export interface LotRow {
  id: string;
  companyId: string;
  materialId: string;
  materialCode: string;
  materialName: string;
  materialKind: string;
  stockUnit: StockUnit;
  hazardClass: HazardClass;
  isAccelerator: boolean;
  litresPerKg: string | null;
  storageMinC: string | null;
  storageMaxC: string | null;
  batchNumber: string | null;
  receivedOn: string;
  expiresOn: string | null;
  locationId: string;
  status: LotStatus;
  unitCost: string;
  quantity: string;
  exposureFlagged: boolean;
  receiptId: string | null;
}

/** A location as the ledger works with it. */
export interface LocationRow extends PlaceNode {
  companyId: string;
}

/** One movement to append. `quantity` is signed: + into `locationId`, − out of it. */
export interface NewMovement {
  kind: MovementKind;
  lotId: string;
  locationId: string;
  fromLocationId?: string | null;
  toLocationId?: string | null;
  quantity: Decimal;
  reason?: string | null;
  note?: string | null;
  jobId?: string | null;
  receiptLineId?: string | null;
  countId?: string | null;
  reversesMovementId?: string | null;
}

/** Who is posting, and (for the demo seed only) when it happened. */
export interface LedgerContext {
  companyId: string;
  userId: string;
  operationId?: string;
  /** backdates the movements (demo data); live requests leave it out and get the clock time */
  at?: Date;
}

/** Balances of locked lots, keyed `${lotId}:${locationId}`. */
export type Balances = Map<string, Decimal>;

export const balanceKey = (lotId: string, locationId: string) => `${lotId}:${locationId}`;

const LOT_SELECT = `
  SELECT l.id, l.company_id AS "companyId", l.material_id AS "materialId", m.code AS "materialCode", m.name AS "materialName",
         m.kind AS "materialKind", m.stock_unit AS "stockUnit", m.hazard_class AS "hazardClass", m.is_accelerator AS "isAccelerator",
         m.litres_per_kg::text AS "litresPerKg", m.storage_min_c::text AS "storageMinC", m.storage_max_c::text AS "storageMaxC",
         l.batch_number AS "batchNumber", l.received_on::text AS "receivedOn", l.expires_on::text AS "expiresOn",
         l.location_id AS "locationId", l.status, l.unit_cost::text AS "unitCost", l.quantity::text AS quantity,
         l.exposure_flagged AS "exposureFlagged", l.receipt_id AS "receiptId"
    FROM lots l JOIN materials m ON m.id = l.material_id`;

export function placedMaterial(lot: Pick<LotRow, 'materialName' | 'hazardClass' | 'isAccelerator' | 'stockUnit' | 'litresPerKg'>): PlacedMaterial {
  return { name: lot.materialName, hazardClass: lot.hazardClass, isAccelerator: lot.isAccelerator, stockUnit: lot.stockUnit, litresPerKg: lot.litresPerKg };
}

export function lotLabel(lot: Pick<LotRow, 'materialName' | 'batchNumber'>): string {
  return lot.batchNumber ? `${lot.materialName}, batch ${lot.batchNumber}` : lot.materialName;
}

const unitLabel = (u: string) => (u === 'm2' ? 'm²' : u);

/**
 * The stock ledger's writing side, for one transaction at a time: every method takes the
 * caller's EntityManager. No constructor dependencies, so the demo seed can use it too.
 *
 * Locks are always taken in one order — lots (by id), then locations (by id), then balance rows —
 * so two requests never wait on each other in a circle. Every movement locks the locations it
 * touches (and, for stock put somewhere, the zone that location belongs to), which serialises
 * segregation and capacity checks and makes a count's snapshot exact.
 */
@Injectable()
export class LedgerService {
  /** Locks lots of the company, in id order; 404 if any is missing. */
  async lockLots(m: EntityManager, companyId: string, lotIds: readonly string[]): Promise<Map<string, LotRow>> {
    const ids = [...new Set(lotIds)].sort();
    if (ids.length === 0) {
      return new Map();
    }
    const rows: LotRow[] = await m.query(`${LOT_SELECT} WHERE l.company_id = $1 AND l.id = ANY($2) ORDER BY l.id FOR UPDATE OF l`, [companyId, ids]);
    if (rows.length !== ids.length) {
      throw new NotFoundException('Lot not found');
    }
    return new Map(rows.map((r) => [r.id, r]));
  }

  /** Reads lots without locking (for responses). */
  async readLots(m: EntityManager, companyId: string, lotIds: readonly string[]): Promise<LotRow[]> {
    if (lotIds.length === 0) {
      return [];
    }
    return m.query(`${LOT_SELECT} WHERE l.company_id = $1 AND l.id = ANY($2)`, [companyId, [...new Set(lotIds)]]);
  }

  /** Every location of the company (not locked): the tree that zones are worked out from. */
  async allLocations(m: EntityManager, companyId: string): Promise<Map<string, LocationRow>> {
    const rows: LocationRow[] = await m.query(
      `SELECT id, company_id AS "companyId", name, kind, parent_id AS "parentId", capacity_litres::text AS "capacityLitres",
              allowed_hazard_classes AS "allowedHazardClasses", active
         FROM locations WHERE company_id = $1`,
      [companyId],
    );
    return new Map(rows.map((r) => [r.id, r]));
  }

  /**
   * Locks the locations touched and, for those stock is put into, the root of their zone (so
   * two requests putting stock into one zone are checked one after the other). 404 if any
   * touched location is not the company's.
   */
  async lockLocations(
    m: EntityManager,
    companyId: string,
    touched: readonly string[],
    putInto: readonly string[] = [],
  ): Promise<Map<string, LocationRow>> {
    const all = await this.allLocations(m, companyId);
    for (const id of touched) {
      if (!all.has(id)) {
        throw new NotFoundException('Location not found');
      }
    }
    const ids = new Set(touched);
    for (const id of putInto) {
      ids.add(zoneRoot(id, all).id);
    }
    await m.query(`SELECT id FROM locations WHERE company_id = $1 AND id = ANY($2) ORDER BY id FOR UPDATE`, [companyId, [...ids].sort()]);
    // Re-read what was locked: a location edited meanwhile is seen as it is now.
    return this.allLocations(m, companyId);
  }

  /** Refuses movements at a location while a count of it is open (between opening and submitting). */
  async assertNotBeingCounted(m: EntityManager, companyId: string, locationIds: readonly string[]): Promise<void> {
    if (locationIds.length === 0) {
      return;
    }
    const rows: { number: number; name: string }[] = await m.query(
      `SELECT c.number, l.name FROM stock_count_locations scl
         JOIN stock_counts c ON c.id = scl.count_id
         JOIN locations l ON l.id = scl.location_id
        WHERE c.company_id = $1 AND c.status = 'open' AND scl.location_id = ANY($2)
        ORDER BY c.number LIMIT 1`,
      [companyId, [...new Set(locationIds)]],
    );
    if (rows[0]) {
      throw new RuleViolation(
        `${rows[0].name} is being counted (count ${rows[0].number}): stock there cannot move until the count is submitted.`,
        'count_in_progress',
      );
    }
  }

  /** Locks the balance rows of locked lots and reads them. */
  async lockBalances(m: EntityManager, lotIds: readonly string[]): Promise<Balances> {
    const rows: { lotId: string; locationId: string; quantity: string }[] = await m.query(
      `SELECT lot_id AS "lotId", location_id AS "locationId", quantity::text AS quantity FROM lot_balances
        WHERE lot_id = ANY($1) ORDER BY lot_id, location_id FOR UPDATE`,
      [[...new Set(lotIds)].sort()],
    );
    return new Map(rows.map((r) => [balanceKey(r.lotId, r.locationId), new Decimal(r.quantity)]));
  }

  /**
   * Checks stock being put into locations (segregation, allowed classes, cabinet capacity) against
   * what is there now, after `deltas` (the same operation's stock leaving). Throws the refusal
   * (409, citing the rule); returns the warnings.
   */
  async checkPuts(
    m: EntityManager,
    companyId: string,
    puts: readonly Put[],
    locations: ReadonlyMap<string, LocationRow>,
    deltas: readonly { lotId: string; locationId: string; delta: Decimal }[] = [],
  ): Promise<string[]> {
    if (puts.length === 0) {
      return [];
    }
    const zoneIds = new Set<string>();
    for (const p of puts) {
      for (const id of zoneMembers(zoneRoot(p.locationId, locations), locations)) {
        zoneIds.add(id);
      }
    }
    const present = await this.presentAt(m, companyId, [...zoneIds]);
    for (const d of deltas) {
      const row = present.find((p) => p.lotId === d.lotId && p.locationId === d.locationId);
      if (row) {
        row.quantity = row.quantity.plus(d.delta);
      }
    }
    const outcome = checkPlacement(puts, present, locations);
    if (!outcome.ok) {
      throw new RuleViolation(outcome.message, outcome.code, outcome.code === 'not_found' ? HttpStatus.NOT_FOUND : HttpStatus.CONFLICT);
    }
    return outcome.warnings;
  }

  /** What is stored at the locations now (balances above zero), with the materials' hazard data. */
  async presentAt(m: EntityManager, companyId: string, locationIds: readonly string[] | 'all'): Promise<Present[]> {
    const rows: {
      lotId: string;
      locationId: string;
      quantity: string;
      name: string;
      hazardClass: HazardClass;
      isAccelerator: boolean;
      stockUnit: string;
      litresPerKg: string | null;
    }[] = await m.query(
      `SELECT b.lot_id AS "lotId", b.location_id AS "locationId", b.quantity::text AS quantity, mt.name, mt.hazard_class AS "hazardClass",
              mt.is_accelerator AS "isAccelerator", mt.stock_unit AS "stockUnit", mt.litres_per_kg::text AS "litresPerKg"
         FROM lot_balances b JOIN lots l ON l.id = b.lot_id JOIN materials mt ON mt.id = l.material_id
        WHERE b.company_id = $1 AND b.quantity > 0 ${locationIds === 'all' ? '' : 'AND b.location_id = ANY($2)'}`,
      locationIds === 'all' ? [companyId] : [companyId, locationIds],
    );
    return rows.map((r) => ({
      lotId: r.lotId,
      locationId: r.locationId,
      quantity: new Decimal(r.quantity),
      material: { name: r.name, hazardClass: r.hazardClass, isAccelerator: r.isAccelerator, stockUnit: r.stockUnit, litresPerKg: r.litresPerKg },
    }));
  }

  /** Checks movements against the balances (as `append` will) without writing anything. */
  validate(lots: ReadonlyMap<string, LotRow>, balances: Balances, locations: ReadonlyMap<string, { name: string }>, rows: readonly NewMovement[]): void {
    const copy: Balances = new Map(balances);
    for (const row of rows) {
      this.step(lots, copy, locations, row);
    }
  }

  private step(lots: ReadonlyMap<string, LotRow>, balances: Balances, locations: ReadonlyMap<string, { name: string }>, row: NewMovement): Decimal {
    const lot = lots.get(row.lotId);
    if (!lot) {
      throw new Error(`lot ${row.lotId} was not locked`);
    }
    const key = balanceKey(row.lotId, row.locationId);
    const before = balances.get(key) ?? new Decimal(0);
    let after: Decimal;
    try {
      after = ledgerBalance(before.gt(0) ? [{ kind: 'adjustment', quantity: before }, { kind: row.kind, quantity: row.quantity }] : [{ kind: row.kind, quantity: row.quantity }]);
    } catch (err) {
      if (err instanceof DomainError && err.code === 'negative-balance') {
        const where = locations.get(row.locationId)?.name ?? 'that location';
        throw new RuleViolation(
          `${lotLabel(lot)} has ${before.toString()} ${unitLabel(lot.stockUnit)} at ${where}: a ${row.kind} of ${row.quantity.abs().toString()} ${unitLabel(lot.stockUnit)} would take it below nothing.`,
          'negative_balance',
        );
      }
      if (err instanceof DomainError) {
        throw new RuleViolation(err.message, 'invalid_movement');
      }
      throw err;
    }
    balances.set(key, after);
    return after;
  }

  /**
   * Appends movements to locked lots: each is checked with the domain's ledgerBalance against the
   * balance it changes (never below zero, sign fitting its kind), then the rows are inserted and
   * the cached balances (per location and per lot) written. Returns the new movements' ids in order.
   */
  async append(
    m: EntityManager,
    ctx: LedgerContext,
    lots: ReadonlyMap<string, LotRow>,
    balances: Balances,
    locations: ReadonlyMap<string, { name: string }>,
    rows: readonly NewMovement[],
  ): Promise<{ operationId: string; ids: string[] }> {
    const operationId = ctx.operationId ?? randomUUID();
    const totals = new Map<string, Decimal>();
    const touched = new Set<string>();
    for (const row of rows) {
      const lot = lots.get(row.lotId)!;
      const key = balanceKey(row.lotId, row.locationId);
      this.step(lots, balances, locations, row);
      touched.add(key);
      totals.set(row.lotId, (totals.get(row.lotId) ?? new Decimal(lot.quantity)).plus(row.quantity));
    }

    const values: unknown[] = [];
    const tuples = rows.map((row) => {
      const lot = lots.get(row.lotId)!;
      const base = values.length;
      values.push(
        ctx.companyId,
        operationId,
        row.kind,
        row.lotId,
        lot.materialId,
        row.locationId,
        row.fromLocationId ?? null,
        row.toLocationId ?? null,
        row.quantity.toString(),
        lot.unitCost,
        row.reason ?? null,
        row.note ?? null,
        ctx.userId,
        ctx.at ?? null,
        row.jobId ?? null,
        row.receiptLineId ?? null,
        row.countId ?? null,
        row.reversesMovementId ?? null,
      );
      const p = (i: number) => `$${base + i}`;
      return `(${p(1)}, ${p(2)}, ${p(3)}, ${p(4)}, ${p(5)}, ${p(6)}, ${p(7)}, ${p(8)}, ${p(9)}::numeric, ${p(10)}::numeric, ${p(11)}, ${p(12)}, ${p(13)}, coalesce(${p(14)}::timestamptz, clock_timestamp()), ${p(15)}::uuid, ${p(16)}::uuid, ${p(17)}::uuid, ${p(18)}::uuid)`;
    });
    const inserted: { id: string }[] = await m.query(
      `INSERT INTO stock_movements (company_id, operation_id, kind, lot_id, material_id, location_id, from_location_id, to_location_id,
                                    quantity, unit_cost, reason, note, user_id, created_at, job_id, receipt_line_id, count_id, reverses_movement_id)
       VALUES ${tuples.join(', ')} RETURNING id`,
      values,
    );

    for (const key of touched) {
      const [lotId, locationId] = key.split(':') as [string, string];
      await m.query(
        `INSERT INTO lot_balances (company_id, lot_id, location_id, quantity, updated_at) VALUES ($1, $2, $3, $4, now())
         ON CONFLICT (lot_id, location_id) DO UPDATE SET quantity = EXCLUDED.quantity, updated_at = now()`,
        [ctx.companyId, lotId, locationId, balances.get(key)!.toString()],
      );
    }
    for (const [lotId, total] of totals) {
      const lot = lots.get(lotId)!;
      // A lot written off to nothing that gets stock back (a reversal, a return) is available again.
      const status = lot.status === 'written-off' && total.gt(0) ? 'available' : lot.status;
      await m.query(`UPDATE lots SET quantity = $2, status = $3, updated_at = now() WHERE id = $1`, [lotId, total.toString(), status]);
      (lot as { quantity: string }).quantity = total.toString();
      (lot as { status: LotStatus }).status = status;
    }
    return { operationId, ids: inserted.map((r) => r.id) };
  }

  /** When the whole of a lot has left the location it is recorded at, it is recorded where it went. */
  async followLot(m: EntityManager, lot: LotRow, balances: Balances, from: string, to: string): Promise<void> {
    if (lot.locationId === from && (balances.get(balanceKey(lot.id, from)) ?? new Decimal(0)).isZero()) {
      await m.query(`UPDATE lots SET location_id = $2 WHERE id = $1`, [lot.id, to]);
      (lot as { locationId: string }).locationId = to;
    }
  }
}

export type { LocationKind };
