import { BadRequestException, Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { Decimal, roundMoney } from '@potlife/domain';
import { DataSource, EntityManager } from 'typeorm';
import type { AuthUser } from '../common/current-user';
import type { LotStatus } from './entities/lot.entity';
import { WRITE_OFF_REASONS, WriteOffReason } from './entities/stock-movement.entity';
import type { LotResponse } from './dto/lot.dto';
import { CreateMovementDto, MovementPageResponse, MovementResultResponse, MovementsQueryDto, ReverseMovementDto } from './dto/movement.dto';
import {
  LocationBalanceRow,
  LotBalanceRow,
  MaterialBalanceRow,
  StockBalancesResponse,
  StockOverviewResponse,
  StockQueryDto,
} from './dto/stock.dto';
import { IdempotencyService } from './idempotency.service';
import { LedgerService } from './ledger.service';
import { MovementsService, Posted } from './movements.service';
import { findSegregationProblems } from './placement';
import { EXPIRING_SOON_DAYS, expiryInfo, today } from './stock-dates';
import { lotIsUsable, money, shownStatus, StockReader } from './stock-reader.service';

/** Who is acting, as the jobs module passes it: at least the user's id. */
export type Actor = Pick<AuthUser, 'id'>;

/** A lot locked for a job's reservation or issue, with its balances (see lockLotsForMaterial). */
export interface LockedLot {
  id: string;
  materialId: string;
  batchNumber: string | null;
  expiresOn: string | null;
  /** expiresOn, or 9999-12-31 for a lot that never expires: pass it to the domain's allocateFefo */
  fefoExpiresOn: string;
  status: LotStatus;
  exposureFlagged: boolean;
  /** may be issued today: available, not flagged, in date */
  usable: boolean;
  unitCost: string;
  /** balance over all locations */
  quantity: string;
  /** balance per location, above zero */
  places: { locationId: string; locationName: string; quantity: string }[];
}

export interface LotBalanceSummary {
  lotId: string;
  quantity: string;
  places: { locationId: string; quantity: string }[];
}

export interface MaterialBalanceSummary {
  materialId: string;
  quantity: string;
  usableQuantity: string;
}

const d = (v: string) => new Decimal(v);
const qty = (v: Decimal) => v.toFixed(3);

interface BalanceRow {
  lotId: string;
  locationId: string;
  locationName: string;
  locationKind: string;
  quantity: string;
  unitCost: string;
  status: LotStatus;
  exposureFlagged: boolean;
  expiresOn: string | null;
  batchNumber: string | null;
  materialId: string;
  materialCode: string;
  materialName: string;
  stockUnit: string;
}

/**
 * The stock ledger for the routes and for other modules. Jobs call `issueToJob`,
 * `returnFromJob` and `lockLotsForMaterial` inside their own transaction (take the Idempotency
 * key first with IdempotencyService.runIn); purchasing will call ReceivingService.post.
 */
@Injectable()
export class StockService {
  constructor(
    @InjectDataSource() private readonly db: DataSource,
    private readonly ledger: LedgerService,
    private readonly movements: MovementsService,
    private readonly reader: StockReader,
    private readonly idempotency: IdempotencyService,
  ) {}

  // ── For the jobs module (inside the caller's transaction) ──────────────────

  /** Issues `quantity` of a lot from a location to a job: one `issue` movement. Refuses an unusable lot, or more than is there. */
  async issueToJob(
    m: EntityManager,
    companyId: string,
    user: Actor,
    input: { lotId: string; quantity: string; jobId: string; fromLocationId: string; note?: string },
  ): Promise<MovementResultResponse> {
    const posted = await this.movements.issue(m, { companyId, userId: user.id }, { ...input, quantity: decimalInput(input.quantity) });
    return this.result(m, companyId, posted);
  }

  /** Returns `quantity` of a lot from a job into a location: one `return` movement; no more than the job has out of the lot. */
  async returnFromJob(
    m: EntityManager,
    companyId: string,
    user: Actor,
    input: { lotId: string; quantity: string; jobId: string; toLocationId: string; note?: string },
  ): Promise<MovementResultResponse> {
    const posted = await this.movements.return(m, { companyId, userId: user.id }, { ...input, quantity: decimalInput(input.quantity) });
    return this.result(m, companyId, posted);
  }

  /**
   * Locks (FOR UPDATE, in id order) every lot of a material with stock, and their balances, for
   * FEFO: ordered by expiry (none last), then receipt date. Map to the domain's FefoLot with
   * `{id, quantity, expiresOn: fefoExpiresOn, usable}`.
   */
  async lockLotsForMaterial(m: EntityManager, companyId: string, materialId: string): Promise<LockedLot[]> {
    const ids: { id: string }[] = await m.query(`SELECT id FROM lots WHERE company_id = $1 AND material_id = $2 AND quantity > 0 ORDER BY id FOR UPDATE`, [
      companyId,
      materialId,
    ]);
    const lots = await this.ledger.lockLots(m, companyId, ids.map((r) => r.id));
    await this.ledger.lockBalances(m, [...lots.keys()]);
    const shown = await this.reader.lots(m, companyId, { ids: [...lots.keys()] });
    return shown
      .map((l) => {
        const row = lots.get(l.id)!;
        return {
          id: l.id,
          materialId: l.materialId,
          batchNumber: l.batchNumber,
          expiresOn: l.expiry.expiresOn,
          fefoExpiresOn: l.expiry.expiresOn ?? '9999-12-31',
          status: l.status,
          exposureFlagged: l.exposureFlagged,
          usable: l.usable,
          unitCost: l.unitCost,
          quantity: l.quantity,
          places: l.places,
          receivedOn: row.receivedOn,
        };
      })
      .sort((a, b) => a.fefoExpiresOn.localeCompare(b.fefoExpiresOn) || a.receivedOn.localeCompare(b.receivedOn) || a.id.localeCompare(b.id))
      .map(({ receivedOn: _r, ...lot }) => lot);
  }

  /**
   * When one transaction posts several movements (an issue of many lines), call this first with
   * every lot and location it will touch: it takes the locks in the ledger's one order (lots by
   * id, then locations by id, with the zone of each location stock goes into), so it can never
   * wait in a circle with another request. Later calls in the transaction find them held.
   */
  async lockForMovements(
    m: EntityManager,
    companyId: string,
    touch: { lotIds: readonly string[]; locationIds: readonly string[]; putInto?: readonly string[] },
  ): Promise<void> {
    await this.ledger.lockLots(m, companyId, touch.lotIds);
    await this.ledger.lockLocations(m, companyId, [...touch.locationIds, ...(touch.putInto ?? [])], touch.putInto ?? []);
  }

  /** Balances of lots (not locked): total and per location. */
  async lotBalances(m: EntityManager | null, companyId: string, lotIds: readonly string[]): Promise<LotBalanceSummary[]> {
    const rows: { lotId: string; quantity: string; places: { locationId: string; quantity: string }[] }[] = await (m ?? this.db.manager).query(
      `SELECT l.id AS "lotId", l.quantity::text AS quantity,
              coalesce((SELECT json_agg(json_build_object('locationId', b.location_id, 'quantity', b.quantity::text))
                          FROM lot_balances b WHERE b.lot_id = l.id AND b.quantity > 0), '[]'::json) AS places
         FROM lots l WHERE l.company_id = $1 AND l.id = ANY($2)`,
      [companyId, [...lotIds]],
    );
    return rows;
  }

  /** Balance per material (all of it, and what is usable today), for the given materials or all. */
  async materialBalances(m: EntityManager | null, companyId: string, materialIds?: readonly string[]): Promise<MaterialBalanceSummary[]> {
    const rows = await this.balanceRows(m ?? this.db.manager, companyId, materialIds ? { materialIds: [...materialIds] } : {});
    const by = new Map<string, { q: Decimal; u: Decimal }>();
    const day = today();
    for (const r of rows) {
      const t = by.get(r.materialId) ?? { q: new Decimal(0), u: new Decimal(0) };
      t.q = t.q.plus(r.quantity);
      if (lotIsUsable(r.status, r.exposureFlagged, r.expiresOn, day)) {
        t.u = t.u.plus(r.quantity);
      }
      by.set(r.materialId, t);
    }
    return (materialIds ?? [...by.keys()]).map((id) => ({
      materialId: id,
      quantity: qty(by.get(id)?.q ?? new Decimal(0)),
      usableQuantity: qty(by.get(id)?.u ?? new Decimal(0)),
    }));
  }

  // ── Routes ─────────────────────────────────────────────────────────────────

  listMovements(companyId: string, q: MovementsQueryDto): Promise<MovementPageResponse> {
    return this.reader.movements(this.db.manager, companyId, q);
  }

  /** POST /api/stock-movements: a transfer, adjustment or write-off. */
  post(user: AuthUser, dto: CreateMovementDto, key: string | undefined): Promise<MovementResultResponse> {
    const quantity = decimalInput(dto.quantity);
    if (dto.kind !== 'adjustment' && quantity.lte(0)) {
      throw new BadRequestException({ message: `quantity: must be more than 0 for a ${dto.kind}`, code: 'validation_failed' });
    }
    if (dto.kind === 'write-off' && !WRITE_OFF_REASONS.includes(dto.reason as WriteOffReason)) {
      throw new BadRequestException({ message: `reason: a write-off is for one of ${WRITE_OFF_REASONS.join(', ')}`, code: 'validation_failed' });
    }
    const ctx = { companyId: user.companyId, userId: user.id };
    return this.idempotency.run(
      { companyId: user.companyId, userId: user.id, key, route: 'POST /api/stock-movements', request: dto },
      async (m) => {
        let posted: Posted;
        switch (dto.kind) {
          case 'transfer':
            posted = await this.movements.transfer(m, ctx, {
              lotId: dto.lotId,
              fromLocationId: dto.fromLocationId!,
              toLocationId: dto.toLocationId!,
              quantity,
              note: dto.note,
            });
            break;
          case 'adjustment':
            posted = await this.movements.adjust(m, ctx, { lotId: dto.lotId, locationId: dto.locationId!, quantity, reason: dto.reason!, note: dto.note });
            break;
          case 'write-off':
            posted = await this.movements.writeOff(m, ctx, {
              lotId: dto.lotId,
              locationId: dto.locationId!,
              quantity,
              reason: dto.reason as WriteOffReason,
              note: dto.note,
            });
            break;
        }
        return this.result(m, user.companyId, posted);
      },
    );
  }

  /** POST /api/stock-movements/{id}/reverse */
  reverse(user: AuthUser, id: string, dto: ReverseMovementDto, key: string | undefined): Promise<MovementResultResponse> {
    return this.idempotency.run(
      { companyId: user.companyId, userId: user.id, key, route: 'POST /api/stock-movements/{id}/reverse', request: { id, ...dto } },
      async (m) => this.result(m, user.companyId, await this.movements.reverse(m, { companyId: user.companyId, userId: user.id }, id, dto.note)),
    );
  }

  /** What a stock-changing request answers. */
  async result(m: EntityManager, companyId: string, posted: Posted): Promise<MovementResultResponse> {
    return {
      operationId: posted.operationId,
      movements: await this.reader.movementsByIds(m, companyId, posted.ids),
      lot: await this.reader.lot(m, companyId, posted.lotId),
      warnings: posted.warnings,
    };
  }

  private async balanceRows(
    m: EntityManager,
    companyId: string,
    f: { materialIds?: string[]; materialId?: string; locationId?: string; kind?: string },
  ): Promise<BalanceRow[]> {
    const where = ['b.company_id = $1', 'b.quantity > 0'];
    const params: unknown[] = [companyId];
    const add = (sql: string, v: unknown) => {
      params.push(v);
      where.push(sql.replace('?', `$${params.length}`));
    };
    if (f.materialIds) {
      add('l.material_id = ANY(?)', f.materialIds);
    }
    if (f.materialId) {
      add('l.material_id = ?', f.materialId);
    }
    if (f.locationId) {
      add('b.location_id = ?', f.locationId);
    }
    if (f.kind) {
      add('mt.kind = ?', f.kind);
    }
    return m.query(
      `SELECT b.lot_id AS "lotId", b.location_id AS "locationId", loc.name AS "locationName", loc.kind AS "locationKind",
              b.quantity::text AS quantity, l.unit_cost::text AS "unitCost", l.status, l.exposure_flagged AS "exposureFlagged",
              l.expires_on::text AS "expiresOn", l.batch_number AS "batchNumber", l.material_id AS "materialId",
              mt.code AS "materialCode", mt.name AS "materialName", mt.stock_unit AS "stockUnit"
         FROM lot_balances b JOIN lots l ON l.id = b.lot_id JOIN materials mt ON mt.id = l.material_id JOIN locations loc ON loc.id = b.location_id
        WHERE ${where.join(' AND ')}
        ORDER BY mt.name, loc.name, l.expires_on NULLS LAST, l.id`,
      params,
    );
  }

  /** GET /api/stock: balances by material, by location or by lot (and location). */
  async balances(companyId: string, q: StockQueryDto): Promise<StockBalancesResponse> {
    const m = this.db.manager;
    const by = q.by ?? 'material';
    const rows = await this.balanceRows(m, companyId, q);
    const day = today();
    let total = new Decimal(0);
    const value = (r: BalanceRow) => d(r.quantity).times(r.unitCost);
    for (const r of rows) {
      total = total.plus(value(r));
    }
    const totalValue = roundMoney(total).toFixed(2);
    switch (by) {
      case 'lot':
        return {
          by,
          totalValue,
          rows: rows.map(
            (r): LotBalanceRow => ({
              lotId: r.lotId,
              batchNumber: r.batchNumber,
              materialId: r.materialId,
              materialName: r.materialName,
              stockUnit: r.stockUnit,
              locationId: r.locationId,
              locationName: r.locationName,
              quantity: r.quantity,
              unitCost: r.unitCost,
              value: money(r.quantity, r.unitCost),
              expiry: expiryInfo(r.expiresOn, day),
              status: shownStatus(r.status, r.expiresOn, day),
              usable: lotIsUsable(r.status, r.exposureFlagged, r.expiresOn, day),
              exposureFlagged: r.exposureFlagged,
            }),
          ),
        };
      case 'location': {
        const groups = new Map<string, { row: BalanceRow; q: Decimal; v: Decimal; lots: number }>();
        for (const r of rows) {
          const key = `${r.locationId}:${r.materialId}`;
          const g = groups.get(key) ?? { row: r, q: new Decimal(0), v: new Decimal(0), lots: 0 };
          g.q = g.q.plus(r.quantity);
          g.v = g.v.plus(value(r));
          g.lots += 1;
          groups.set(key, g);
        }
        return {
          by,
          totalValue,
          rows: [...groups.values()]
            .map(
              (g): LocationBalanceRow => ({
                locationId: g.row.locationId,
                locationName: g.row.locationName,
                locationKind: g.row.locationKind,
                materialId: g.row.materialId,
                materialCode: g.row.materialCode,
                materialName: g.row.materialName,
                stockUnit: g.row.stockUnit,
                quantity: qty(g.q),
                value: roundMoney(g.v).toFixed(2),
                lotCount: g.lots,
              }),
            )
            .sort((a, b) => a.locationName.localeCompare(b.locationName) || a.materialName.localeCompare(b.materialName)),
        };
      }
      case 'material':
        return { by, totalValue, rows: await this.byMaterial(m, companyId, q, rows, day) };
    }
  }

  private async byMaterial(m: EntityManager, companyId: string, q: StockQueryDto, rows: BalanceRow[], day: string): Promise<MaterialBalanceRow[]> {
    const where = ['company_id = $1', 'active'];
    const params: unknown[] = [companyId];
    if (q.materialId) {
      params.push(q.materialId);
      where.push(`id = $${params.length}`);
    }
    if (q.kind) {
      params.push(q.kind);
      where.push(`kind = $${params.length}`);
    }
    const materials: { id: string; code: string; name: string; kind: string; stockUnit: string; reorderLevel: string; reorderQuantity: string }[] =
      await m.query(
        `SELECT id, code, name, kind, stock_unit AS "stockUnit", reorder_level::text AS "reorderLevel", reorder_quantity::text AS "reorderQuantity"
           FROM materials WHERE ${where.join(' AND ')} ORDER BY name`,
        params,
      );
    const byMaterial = new Map<string, BalanceRow[]>();
    for (const r of rows) {
      byMaterial.set(r.materialId, [...(byMaterial.get(r.materialId) ?? []), r]);
    }
    return materials
      .filter((mt) => !q.locationId || byMaterial.has(mt.id))
      .map((mt) => {
        const mine = byMaterial.get(mt.id) ?? [];
        let total = new Decimal(0);
        let usable = new Decimal(0);
        let value = new Decimal(0);
        let next: string | null = null;
        for (const r of mine) {
          total = total.plus(r.quantity);
          value = value.plus(d(r.quantity).times(r.unitCost));
          if (lotIsUsable(r.status, r.exposureFlagged, r.expiresOn, day)) {
            usable = usable.plus(r.quantity);
            if (r.expiresOn && (!next || r.expiresOn < next)) {
              next = r.expiresOn;
            }
          }
        }
        const level = d(mt.reorderLevel);
        return {
          materialId: mt.id,
          materialCode: mt.code,
          materialName: mt.name,
          materialKind: mt.kind,
          stockUnit: mt.stockUnit,
          quantity: qty(total),
          usableQuantity: qty(usable),
          value: roundMoney(value).toFixed(2),
          lotCount: new Set(mine.map((r) => r.lotId)).size,
          nextExpiry: next ? expiryInfo(next, day) : null,
          reorderLevel: mt.reorderLevel,
          reorderQuantity: mt.reorderQuantity,
          belowReorder: level.gt(0) && usable.lte(level),
        };
      });
  }

  /** GET /api/stock/overview: the storeman's home. */
  async overview(companyId: string): Promise<StockOverviewResponse> {
    const m = this.db.manager;
    const day = today();
    const counts: { id: string; number: number; status: string; locationId: string | null; scopeName: string | null; openedAt: Date }[] = await m.query(
      `SELECT c.id, c.number, c.status, c.location_id AS "locationId", l.name AS "scopeName", c.opened_at AS "openedAt"
         FROM stock_counts c LEFT JOIN locations l ON l.id = c.location_id
        WHERE c.company_id = $1 AND c.status IN ('open', 'submitted') ORDER BY c.number`,
      [companyId],
    );
    const lots: LotResponse[] = await this.reader.lots(m, companyId, {});
    const inStock = lots.filter((l) => l.status !== 'written-off');
    const expiringSoon = inStock.filter((l) => l.expiry.badge === 'expiring' && l.status !== 'quarantined');
    const expiredInStock = inStock.filter((l) => l.expiry.badge === 'expired' && l.status !== 'quarantined');
    const temperatureAlerts = inStock
      .filter((l) => l.exposureFlagged && l.status !== 'quarantined')
      .map((l) => ({
        lotId: l.id,
        materialName: l.materialName,
        batchNumber: l.batchNumber,
        quantity: l.quantity,
        stockUnit: l.stockUnit,
        locationNames: l.places.map((p) => p.locationName),
        reason: l.exposureReason,
        flaggedAt: l.exposureFlaggedAt,
      }));
    const locations = await this.ledger.allLocations(m, companyId);
    const present = await this.ledger.presentAt(m, companyId, 'all');
    const segregationProblems = findSegregationProblems(present, locations);
    const materials = await this.byMaterial(m, companyId, {}, await this.balanceRows(m, companyId, {}), day);
    return {
      today: day,
      deliveriesDue: [],
      countsOpen: counts.map((c) => ({ ...c, scopeName: c.scopeName ?? 'Everything', openedAt: c.openedAt.toISOString() })),
      expiringSoon,
      expiredInStock,
      temperatureAlerts,
      segregationProblems,
      belowReorder: materials
        .filter((mt) => mt.belowReorder)
        .map((mt) => ({
          materialId: mt.materialId,
          materialCode: mt.materialCode,
          materialName: mt.materialName,
          stockUnit: mt.stockUnit,
          usableQuantity: mt.usableQuantity,
          reorderLevel: mt.reorderLevel,
          reorderQuantity: mt.reorderQuantity,
        })),
    };
  }
}

/** A decimal string from a caller as a Decimal; 400 if it is not one. */
export function decimalInput(value: string, field = 'quantity'): Decimal {
  try {
    const v = new Decimal(value);
    if (v.isFinite()) {
      return v;
    }
  } catch {
    // fall through
  }
  throw new BadRequestException({ message: `${field}: must be a decimal number written as a string`, code: 'validation_failed' });
}

export { EXPIRING_SOON_DAYS };
