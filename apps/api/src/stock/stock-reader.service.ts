import { Injectable, NotFoundException } from '@nestjs/common';
import { Decimal, lotUsableOn, roundMoney } from '@potlife/domain';
import dayjs from 'dayjs';
import { EntityManager } from 'typeorm';
import type { LotStatus } from './entities/lot.entity';
import { LotDetailResponse, LotEventResponse, LotResponse, LotsQueryDto } from './dto/lot.dto';
import { MovementResponse, MovementsQueryDto } from './dto/movement.dto';
import { expiryInfo, today } from './stock-dates';

interface LotQueryRow {
  id: string;
  materialId: string;
  materialCode: string;
  materialName: string;
  materialKind: string;
  stockUnit: string;
  hazardClass: string;
  batchNumber: string | null;
  receivedOn: string;
  expiresOn: string | null;
  status: LotStatus;
  quantity: string;
  unitCost: string;
  locationId: string;
  locationName: string;
  receiptId: string | null;
  receiptNumber: number | null;
  exposureFlagged: boolean;
  exposureReason: string | null;
  exposureFlaggedAt: Date | null;
  createdAt: Date;
  places: { locationId: string; locationName: string; quantity: string }[];
}

/** The status a lot shows: an available lot past its expiry date is expired (domain isExpired). */
export function shownStatus(stored: LotStatus, expiresOn: string | null, onDate = today()): LotStatus {
  return stored === 'available' && expiryInfo(expiresOn, onDate).badge === 'expired' ? 'expired' : stored;
}

/** Whether a lot may be issued today: available, not exposure-flagged, in date (domain lotUsableOn). */
export function lotIsUsable(stored: LotStatus, exposureFlagged: boolean, expiresOn: string | null, onDate = today()): boolean {
  const usable = stored === 'available' && !exposureFlagged;
  return expiresOn ? lotUsableOn({ expiresOn, usable }, onDate) : usable;
}

export const money = (quantity: string, unitCost: string) => roundMoney(new Decimal(quantity).times(unitCost)).toFixed(2);

/** Read models of lots and movements, mapped to their response shapes. */
@Injectable()
export class StockReader {
  async lots(m: EntityManager, companyId: string, q: LotsQueryDto & { ids?: string[] } = {}): Promise<LotResponse[]> {
    const where = ['l.company_id = $1'];
    const params: unknown[] = [companyId];
    const add = (sql: string, value: unknown) => {
      params.push(value);
      where.push(sql.replace('?', `$${params.length}`));
    };
    const day = today();
    if (q.ids) {
      add('l.id = ANY(?)', q.ids);
    }
    if (q.materialId) {
      add('l.material_id = ?', q.materialId);
    }
    if (q.receiptId) {
      add('l.receipt_id = ?', q.receiptId);
    }
    if (q.locationId) {
      add('EXISTS (SELECT 1 FROM lot_balances b WHERE b.lot_id = l.id AND b.quantity > 0 AND b.location_id = ?)', q.locationId);
    }
    if (q.status === 'expired') {
      add(`(l.status = 'expired' OR (l.status = 'available' AND l.expires_on < ?::date))`, day);
    } else if (q.status === 'available') {
      add(`l.status = 'available' AND (l.expires_on IS NULL OR l.expires_on >= ?::date)`, day);
    } else if (q.status) {
      add('l.status = ?', q.status);
    }
    if (q.expiringWithinDays !== undefined) {
      add('l.expires_on <= ?::date', dayjs(day).add(q.expiringWithinDays, 'day').format('YYYY-MM-DD'));
    }
    if (q.flagged !== undefined) {
      add('l.exposure_flagged = ?', q.flagged);
    }
    if (!q.includeEmpty && !q.ids) {
      where.push('l.quantity > 0');
    }
    if (q.q) {
      add(`(l.batch_number ILIKE ? OR m.name ILIKE $${params.length} OR m.code ILIKE $${params.length})`, `%${q.q.replace(/[%_\\]/g, '\\$&')}%`);
    }
    const rows: LotQueryRow[] = await m.query(
      `SELECT l.id, l.material_id AS "materialId", m.code AS "materialCode", m.name AS "materialName", m.kind AS "materialKind",
              m.stock_unit AS "stockUnit", m.hazard_class AS "hazardClass", l.batch_number AS "batchNumber",
              l.received_on::text AS "receivedOn", l.expires_on::text AS "expiresOn", l.status, l.quantity::text AS quantity,
              l.unit_cost::text AS "unitCost", l.location_id AS "locationId", loc.name AS "locationName", l.receipt_id AS "receiptId",
              r.number AS "receiptNumber", l.exposure_flagged AS "exposureFlagged", l.exposure_reason AS "exposureReason",
              l.exposure_flagged_at AS "exposureFlaggedAt", l.created_at AS "createdAt",
              coalesce((SELECT json_agg(json_build_object('locationId', b.location_id, 'locationName', bl.name, 'quantity', b.quantity::text) ORDER BY bl.name)
                          FROM lot_balances b JOIN locations bl ON bl.id = b.location_id WHERE b.lot_id = l.id AND b.quantity > 0), '[]'::json) AS places
         FROM lots l
         JOIN materials m ON m.id = l.material_id
         JOIN locations loc ON loc.id = l.location_id
         LEFT JOIN receipts r ON r.id = l.receipt_id
        WHERE ${where.join(' AND ')}
        ORDER BY l.expires_on ASC NULLS LAST, m.name, l.created_at, l.id`,
      params,
    );
    return rows.map((r) => this.toLot(r, day));
  }

  private toLot(r: LotQueryRow, day: string): LotResponse {
    return {
      id: r.id,
      materialId: r.materialId,
      materialCode: r.materialCode,
      materialName: r.materialName,
      materialKind: r.materialKind,
      stockUnit: r.stockUnit,
      hazardClass: r.hazardClass,
      batchNumber: r.batchNumber,
      receivedOn: r.receivedOn,
      expiry: expiryInfo(r.expiresOn, day),
      status: shownStatus(r.status, r.expiresOn, day),
      usable: lotIsUsable(r.status, r.exposureFlagged, r.expiresOn, day),
      quantity: r.quantity,
      unitCost: r.unitCost,
      value: money(r.quantity, r.unitCost),
      locationId: r.locationId,
      locationName: r.locationName,
      places: r.places.map((p) => ({ locationId: p.locationId, locationName: p.locationName, quantity: new Decimal(p.quantity).toFixed(3) })),
      receiptId: r.receiptId,
      receiptNumber: r.receiptNumber,
      exposureFlagged: r.exposureFlagged,
      exposureReason: r.exposureReason,
      exposureFlaggedAt: r.exposureFlaggedAt ? r.exposureFlaggedAt.toISOString() : null,
      labelUrl: `/api/lots/${r.id}/label.pdf`,
      createdAt: r.createdAt.toISOString(),
    };
  }

  async lot(m: EntityManager, companyId: string, id: string): Promise<LotResponse> {
    const [lot] = await this.lots(m, companyId, { ids: [id] });
    if (!lot) {
      throw new NotFoundException('Lot not found');
    }
    return lot;
  }

  async lotDetail(m: EntityManager, companyId: string, id: string): Promise<LotDetailResponse> {
    const lot = await this.lot(m, companyId, id);
    const events: (Omit<LotEventResponse, 'createdAt'> & { createdAt: Date })[] = await m.query(
      `SELECT e.id, e.kind, e.note, e.reading_id AS "readingId", u.name AS "userName", e.created_at AS "createdAt"
         FROM lot_events e LEFT JOIN users u ON u.id = e.user_id
        WHERE e.company_id = $1 AND e.lot_id = $2 ORDER BY e.created_at, e.id`,
      [companyId, id],
    );
    return { ...lot, events: events.map((e) => ({ ...e, createdAt: e.createdAt.toISOString() })) };
  }

  async movements(m: EntityManager, companyId: string, q: MovementsQueryDto & { ids?: string[] } = {}): Promise<{ items: MovementResponse[]; total: number }> {
    const where = ['mv.company_id = $1'];
    const params: unknown[] = [companyId];
    const add = (sql: string, value: unknown) => {
      params.push(value);
      where.push(sql.replace('?', `$${params.length}`));
    };
    if (q.ids) {
      add('mv.id = ANY(?)', q.ids);
    }
    if (q.lotId) {
      add('mv.lot_id = ?', q.lotId);
    }
    if (q.materialId) {
      add('mv.material_id = ?', q.materialId);
    }
    if (q.locationId) {
      add('mv.location_id = ?', q.locationId);
    }
    if (q.jobId) {
      add('mv.job_id = ?', q.jobId);
    }
    if (q.countId) {
      add('mv.count_id = ?', q.countId);
    }
    if (q.receiptId) {
      add('rl.receipt_id = ?', q.receiptId);
    }
    if (q.kind) {
      add('mv.kind = ?', q.kind);
    }
    if (q.from) {
      add(`mv.created_at >= ?::date`, q.from);
    }
    if (q.to) {
      add(`mv.created_at < (?::date + 1)`, q.to);
    }
    const from = `FROM stock_movements mv
         JOIN lots l ON l.id = mv.lot_id
         JOIN materials mt ON mt.id = mv.material_id
         JOIN locations loc ON loc.id = mv.location_id
         LEFT JOIN locations fl ON fl.id = mv.from_location_id
         LEFT JOIN locations tl ON tl.id = mv.to_location_id
         LEFT JOIN users u ON u.id = mv.user_id
         LEFT JOIN receipt_lines rl ON rl.id = mv.receipt_line_id
        WHERE ${where.join(' AND ')}`;
    const [{ total }] = (await m.query(`SELECT count(*)::int AS total ${from}`, params)) as [{ total: number }];
    const limit = q.ids ? 10_000 : (q.limit ?? 100);
    const offset = q.ids ? 0 : (q.offset ?? 0);
    const rows: (Omit<MovementResponse, 'createdAt' | 'value'> & { createdAt: Date })[] = await m.query(
      `SELECT mv.id, mv.operation_id AS "operationId", mv.kind, mv.lot_id AS "lotId", l.batch_number AS "batchNumber",
              mv.material_id AS "materialId", mt.name AS "materialName", mt.stock_unit AS "stockUnit",
              mv.location_id AS "locationId", loc.name AS "locationName",
              mv.from_location_id AS "fromLocationId", fl.name AS "fromLocationName",
              mv.to_location_id AS "toLocationId", tl.name AS "toLocationName",
              mv.quantity::text AS quantity, mv.unit_cost::text AS "unitCost", mv.reason, mv.note,
              mv.user_id AS "userId", coalesce(u.name, '') AS "userName", mv.created_at AS "createdAt",
              mv.job_id AS "jobId", mv.receipt_line_id AS "receiptLineId", rl.receipt_id AS "receiptId", mv.count_id AS "countId",
              mv.reverses_movement_id AS "reversesMovementId",
              (SELECT r.id FROM stock_movements r WHERE r.reverses_movement_id = mv.id) AS "reversedByMovementId"
         ${from}
        ORDER BY mv.created_at DESC, mv.id DESC
        LIMIT ${limit} OFFSET ${offset}`,
      params,
    );
    return {
      total,
      items: rows.map((r) => ({ ...r, value: money(r.quantity, r.unitCost), createdAt: r.createdAt.toISOString() })),
    };
  }

  /** Movements by id, in the order given. */
  async movementsByIds(m: EntityManager, companyId: string, ids: readonly string[]): Promise<MovementResponse[]> {
    if (ids.length === 0) {
      return [];
    }
    const { items } = await this.movements(m, companyId, { ids: [...ids] });
    const byId = new Map(items.map((i) => [i.id, i]));
    return ids.map((id) => byId.get(id)!).filter(Boolean);
  }
}
