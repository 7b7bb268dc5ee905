import { BadRequestException, ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { Decimal } from '@potlife/domain';
import { DataSource, EntityManager, QueryFailedError } from 'typeorm';
import { CatalogueService } from '../catalogue/catalogue.service';
import { csvFileError, describeBadRows, parseCsv, toCsv } from '../catalogue/csv';
import { ImportMode } from '../catalogue/dto/import.dto';
import { pageOf } from '../catalogue/dto/page.dto';
import { likePattern, today } from '../catalogue/dto/validators';
import type { PackSize, StockUnit } from '../catalogue/entities/material.entity';
import type { AuthUser } from '../common/current-user';
import { RuleViolation } from '../common/http-exception.filter';
import type { MaterialKind } from '@potlife/domain';
import {
  CreatePriceDto,
  MaterialPricesQuery,
  MaterialPricesResponse,
  PackPrices,
  PriceHistoryEntry,
  PriceImportResult,
  PriceSort,
  SupplierPriceListQuery,
  SupplierPricePage,
  SupplierPriceResponse,
} from './dto/price.dto';
import { Supplier } from './entities/supplier.entity';
import { CheckedPriceRow, checkPriceRows, PRICE_CSV_COLUMNS, PRICE_CSV_REQUIRED, priceKey, PriceLookups, PriceMaterial } from './price-csv';

/** A supplier's price in force on a date, as other modules get it. */
export type CurrentPrice = Omit<SupplierPriceResponse, 'history'>;

interface PriceRow {
  id: string;
  supplier_id: string;
  supplier_name: string;
  supplier_active: boolean;
  material_id: string;
  material_code: string;
  material_name: string;
  material_kind: MaterialKind;
  material_active: boolean;
  stock_unit: StockUnit;
  pack_sizes: PackSize[];
  pack_size: string;
  pack_price: string;
  valid_from: string;
  supplier_code: string | null;
  created_at: Date;
  prev_id: string | null;
  prev_price: string | null;
  prev_valid_from: string | null;
  next_id: string | null;
  next_price: string | null;
  next_valid_from: string | null;
  total: string;
}

const SORT_SQL: Record<PriceSort, string> = {
  materialCode: 'lower(m.code)',
  materialName: 'lower(m.name)',
  packSize: 'p.pack_size',
  packPrice: 'p.pack_price',
  unitPrice: 'p.pack_price / p.pack_size',
  validFrom: 'p.valid_from',
};

/**
 * Price rows `p` (chosen by `rowsSql`, which has $1 = company id) with their material, supplier,
 * the price each replaced and the one that replaces it. `tail` adds filters, order and paging.
 */
function pricesSql(rowsSql: string, tail: string): string {
  return `
    WITH p AS (${rowsSql})
    SELECT p.id, p.supplier_id, s.name AS supplier_name, s.active AS supplier_active,
           p.material_id, m.code AS material_code, m.name AS material_name, m.kind AS material_kind,
           m.active AS material_active, m.stock_unit, m.pack_sizes,
           p.pack_size, p.pack_price, p.valid_from::text AS valid_from, p.supplier_code, p.created_at,
           prev.id AS prev_id, prev.pack_price AS prev_price, prev.valid_from::text AS prev_valid_from,
           nxt.id AS next_id, nxt.pack_price AS next_price, nxt.valid_from::text AS next_valid_from,
           count(*) OVER () AS total
    FROM p
    JOIN materials m ON m.id = p.material_id AND m.company_id = $1
    JOIN suppliers s ON s.id = p.supplier_id AND s.company_id = $1
    LEFT JOIN LATERAL (
      SELECT q.id, q.pack_price, q.valid_from FROM supplier_prices q
      WHERE q.supplier_id = p.supplier_id AND q.material_id = p.material_id AND q.pack_size = p.pack_size AND q.valid_from < p.valid_from
      ORDER BY q.valid_from DESC LIMIT 1) prev ON true
    LEFT JOIN LATERAL (
      SELECT q.id, q.pack_price, q.valid_from FROM supplier_prices q
      WHERE q.supplier_id = p.supplier_id AND q.material_id = p.material_id AND q.pack_size = p.pack_size AND q.valid_from > p.valid_from
      ORDER BY q.valid_from ASC LIMIT 1) nxt ON true
    ${tail}`;
}

/** The latest row per supplier, material and pack with valid_from ≤ $2, among rows matching `where`. */
const currentRowsSql = (where: string) => `
  SELECT DISTINCT ON (supplier_id, material_id, pack_size) *
  FROM supplier_prices
  WHERE company_id = $1 AND valid_from <= $2::date AND ${where}
  ORDER BY supplier_id, material_id, pack_size, valid_from DESC`;

function toPrice(r: PriceRow): CurrentPrice {
  const size = new Decimal(r.pack_size);
  return {
    id: r.id,
    supplierId: r.supplier_id,
    supplierName: r.supplier_name,
    supplierActive: r.supplier_active,
    materialId: r.material_id,
    materialCode: r.material_code,
    materialName: r.material_name,
    materialKind: r.material_kind,
    materialActive: r.material_active,
    stockUnit: r.stock_unit,
    packSize: size.toString(),
    packLabel: r.pack_sizes.find((p) => size.equals(p.size))?.label ?? null,
    packPrice: new Decimal(r.pack_price).toFixed(2),
    unitPrice: new Decimal(r.pack_price).dividedBy(size).toFixed(4),
    validFrom: r.valid_from,
    supplierCode: r.supplier_code,
    previous: r.prev_id ? { id: r.prev_id, packPrice: new Decimal(r.prev_price!).toFixed(2), validFrom: r.prev_valid_from! } : null,
    next: r.next_id ? { id: r.next_id, packPrice: new Decimal(r.next_price!).toFixed(2), validFrom: r.next_valid_from! } : null,
    createdAt: r.created_at.toISOString(),
  };
}

/** Rows per INSERT of a price list import. */
const IMPORT_BATCH = 1000;

const INSERT_SQL = `
  INSERT INTO supplier_prices (company_id, supplier_id, material_id, pack_size, pack_price, valid_from, supplier_code, created_by)
  SELECT $1, $2, x."materialId", x."packSize", x."packPrice", x."validFrom", x."supplierCode", $3
  FROM jsonb_to_recordset($4::jsonb) AS x("materialId" uuid, "packSize" numeric, "packPrice" numeric, "validFrom" date, "supplierCode" text)`;

function isDuplicatePrice(e: unknown): boolean {
  const d = e instanceof QueryFailedError ? (e.driverError as { code?: string; table?: string }) : undefined;
  return d?.code === '23505' && d.table === 'supplier_prices';
}

/** Supplier prices: a new price is a new row from its valid-from date; rows are never updated. */
@Injectable()
export class SupplierPricesService {
  constructor(
    @InjectDataSource() private readonly db: DataSource,
    private readonly catalogue: CatalogueService,
  ) {}

  private async supplier(manager: EntityManager, companyId: string, id: string, lock = false): Promise<Supplier> {
    const s = await manager
      .getRepository(Supplier)
      .findOne({ where: { id, companyId }, ...(lock ? { lock: { mode: 'pessimistic_write' as const } } : {}) });
    if (!s) {
      throw new NotFoundException('Supplier not found');
    }
    return s;
  }

  /** One supplier's prices in force on `on` (default today), each with the price it replaced. */
  async listForSupplier(companyId: string, supplierId: string, query: SupplierPriceListQuery): Promise<SupplierPricePage> {
    await this.supplier(this.db.manager, companyId, supplierId);
    const { page, pageSize, offset } = pageOf(query);
    const on = query.on ?? today();
    const params: unknown[] = [companyId, on, supplierId];
    const filters: string[] = [];
    if (query.q) {
      params.push(likePattern(query.q));
      filters.push(`(m.code ILIKE $${params.length} OR m.name ILIKE $${params.length} OR p.supplier_code ILIKE $${params.length})`);
    }
    if (query.kind) {
      params.push(query.kind.split(','));
      filters.push(`m.kind = ANY ($${params.length}::text[])`);
    }
    params.push(pageSize, offset);
    const order = query.order === 'desc' ? 'DESC' : 'ASC';
    const rows: PriceRow[] = await this.db.query(
      pricesSql(
        currentRowsSql('supplier_id = $3'),
        `${filters.length ? `WHERE ${filters.join(' AND ')}` : ''}
         ORDER BY ${SORT_SQL[query.sort ?? 'materialCode']} ${order}, lower(m.code), p.pack_size, p.id
         LIMIT $${params.length - 1} OFFSET $${params.length}`,
      ),
      params,
    );
    return { items: rows.map(toPrice), total: Number(rows[0]?.total ?? 0), page, pageSize, on };
  }

  /** Every supplier's price of a material in force on `on`, by pack (smallest first), cheapest first. */
  async listForMaterial(companyId: string, materialId: string, query: MaterialPricesQuery): Promise<MaterialPricesResponse> {
    const material = await this.catalogue.get(companyId, materialId);
    const on = query.on ?? today();
    const prices: SupplierPriceResponse[] = await this.currentPrices(companyId, [materialId], on);
    if (query.history) {
      const rows: { id: string; supplier_id: string; pack_size: string; pack_price: string; valid_from: string; supplier_code: string | null; created_at: Date }[] =
        await this.db.query(
          `SELECT id, supplier_id, pack_size, pack_price, valid_from::text AS valid_from, supplier_code, created_at
           FROM supplier_prices WHERE company_id = $1 AND material_id = $2 ORDER BY valid_from DESC, created_at DESC`,
          [companyId, materialId],
        );
      const byKey = new Map<string, PriceHistoryEntry[]>();
      for (const r of rows) {
        const key = `${r.supplier_id}|${new Decimal(r.pack_size).toString()}`;
        byKey.set(key, [
          ...(byKey.get(key) ?? []),
          { id: r.id, packPrice: new Decimal(r.pack_price).toFixed(2), validFrom: r.valid_from, supplierCode: r.supplier_code, createdAt: r.created_at.toISOString() },
        ]);
      }
      for (const p of prices) {
        p.history = byKey.get(`${p.supplierId}|${p.packSize}`) ?? [];
      }
    }
    const packs = new Map<string, PackPrices>();
    for (const p of prices) {
      const pack = packs.get(p.packSize) ?? { packSize: p.packSize, packLabel: p.packLabel, prices: [] };
      pack.prices.push(p);
      packs.set(p.packSize, pack);
    }
    return {
      material: { id: material.id, code: material.code, name: material.name, stockUnit: material.stockUnit },
      on,
      packs: [...packs.values()].sort((a, b) => new Decimal(a.packSize).comparedTo(b.packSize)),
    };
  }

  /** Every supplier's price in force on `onDate` for these materials, cheapest first per material and pack. */
  async currentPrices(companyId: string, materialIds: readonly string[], onDate: string, manager: EntityManager = this.db.manager): Promise<CurrentPrice[]> {
    if (materialIds.length === 0) {
      return [];
    }
    const rows: PriceRow[] = await manager.query(
      pricesSql(
        currentRowsSql('material_id = ANY ($3::uuid[])'),
        'ORDER BY lower(m.code), p.material_id, p.pack_size, p.pack_price, lower(s.name), p.id',
      ),
      [companyId, onDate, [...new Set(materialIds)]],
    );
    return rows.map(toPrice);
  }

  async currentPrice(
    companyId: string,
    materialId: string,
    packSize: string,
    onDate: string,
    opts: { supplierId?: string; manager?: EntityManager } = {},
  ): Promise<CurrentPrice | null> {
    const params: unknown[] = [companyId, onDate, materialId, packSize];
    let where = 'material_id = $3 AND pack_size = $4::numeric';
    if (opts.supplierId) {
      params.push(opts.supplierId);
      where += ` AND supplier_id = $5`;
    }
    const rows: PriceRow[] = await (opts.manager ?? this.db.manager).query(
      pricesSql(currentRowsSql(where), `${opts.supplierId ? '' : 'WHERE s.active'} ORDER BY p.pack_price, s.lead_time_days, lower(s.name) LIMIT 1`),
      params,
    );
    return rows[0] ? toPrice(rows[0]) : null;
  }

  /** A new price row. 409 when the supplier already has a price for this pack from that date. */
  async create(user: AuthUser, supplierId: string, dto: CreatePriceDto): Promise<SupplierPriceResponse> {
    await this.supplier(this.db.manager, user.companyId, supplierId);
    const material = await this.catalogue.get(user.companyId, dto.materialId).catch((e: unknown) => {
      if (e instanceof NotFoundException) {
        throw new BadRequestException({ message: 'materialId: no such material in the catalogue', code: 'validation_failed' });
      }
      throw e;
    });
    const size = new Decimal(dto.packSize);
    if (!material.packSizes.some((p) => size.equals(p.size))) {
      throw new RuleViolation(
        `packSize: ${material.code} comes in ${material.packSizes.map((p) => p.size).join(', ')} ${material.stockUnit}; add the ${size.toString()} pack to the material first`,
        'unknown_pack',
        422,
      );
    }
    let id: string;
    try {
      const [row] = (await this.db.query(
        `INSERT INTO supplier_prices (company_id, supplier_id, material_id, pack_size, pack_price, valid_from, supplier_code, created_by)
         VALUES ($1, $2, $3, $4, $5, $6, $7, $8) RETURNING id`,
        [user.companyId, supplierId, material.id, size.toString(), dto.packPrice, dto.validFrom, dto.supplierCode ?? null, user.id],
      )) as [{ id: string }];
      id = row.id;
    } catch (e) {
      if (isDuplicatePrice(e)) {
        throw new ConflictException({
          message: `This supplier already has a price for ${material.code} (${size.toString()} ${material.stockUnit}) from ${dto.validFrom}; prices are never changed: give a later validFrom`,
          code: 'duplicate_price',
        });
      }
      throw e;
    }
    const rows: PriceRow[] = await this.db.query(pricesSql(`SELECT * FROM supplier_prices WHERE company_id = $1 AND id = $2`, ''), [user.companyId, id]);
    return toPrice(rows[0]!);
  }

  /** The supplier's prices in force on `on` as a price list CSV; re-imports as unchanged rows. */
  async exportCsv(companyId: string, supplierId: string, on = today()): Promise<{ csv: string; supplierName: string }> {
    const s = await this.supplier(this.db.manager, companyId, supplierId);
    const rows: PriceRow[] = await this.db.query(
      pricesSql(currentRowsSql('supplier_id = $3'), 'ORDER BY lower(m.code), p.pack_size'),
      [companyId, on, supplierId],
    );
    const csv = toCsv(
      PRICE_CSV_COLUMNS,
      rows.map(toPrice).map((p) => ({
        material_code: p.materialCode,
        supplier_code: p.supplierCode ?? '',
        material_name: p.materialName,
        pack_size: p.packSize,
        pack_label: p.packLabel ?? '',
        pack_price: p.packPrice,
        valid_from: p.validFrom,
      })),
    );
    return { csv, supplierName: s.name };
  }

  /**
   * Checks a price list CSV (preview) or writes it (commit): every new row or none, in one
   * transaction; refused with 422 listing the bad rows when any row has an error.
   */
  async importCsv(user: AuthUser, supplierId: string, csv: string, mode: ImportMode, validFrom: string | null): Promise<PriceImportResult> {
    const table = parseCsv(csv, PRICE_CSV_COLUMNS, PRICE_CSV_REQUIRED);
    if (!table.columns.includes('material_code') && !table.columns.includes('supplier_code')) {
      throw csvFileError('the first row needs the column material_code or supplier_code');
    }
    if (!table.columns.includes('valid_from') && validFrom === null) {
      throw csvFileError('the first row lacks the column valid_from; add it, or give validFrom for the whole file');
    }
    if (mode === 'preview') {
      await this.supplier(this.db.manager, user.companyId, supplierId);
      return this.result(checkPriceRows(table, await this.lookups(this.db.manager, user.companyId, supplierId), validFrom), false);
    }
    return this.db.transaction(async (manager) => {
      // Imports for one supplier run one at a time.
      await this.supplier(manager, user.companyId, supplierId, true);
      const rows = checkPriceRows(table, await this.lookups(manager, user.companyId, supplierId), validFrom);
      const bad = rows.filter((r) => r.errors.length > 0);
      if (bad.length > 0) {
        throw new RuleViolation(`Nothing was imported: ${bad.length} of ${rows.length} rows have errors. ${describeBadRows(rows)}`, 'import_rejected', 422);
      }
      const writes = rows.flatMap((r) => (r.write ? [r.write] : []));
      for (let i = 0; i < writes.length; i += IMPORT_BATCH) {
        await manager.query(INSERT_SQL, [user.companyId, supplierId, user.id, JSON.stringify(writes.slice(i, i + IMPORT_BATCH))]);
      }
      return this.result(rows, true);
    });
  }

  private async lookups(manager: EntityManager, companyId: string, supplierId: string): Promise<PriceLookups> {
    const materials: PriceMaterial[] = (await this.catalogue.all(companyId, manager)).map((m) => ({
      id: m.id,
      code: m.code,
      name: m.name,
      packSizes: m.packSizes,
    }));
    const rows: { material_id: string; pack_size: string; pack_price: string; valid_from: string; supplier_code: string | null }[] = await manager.query(
      `SELECT material_id, pack_size, pack_price, valid_from::text AS valid_from, supplier_code
       FROM supplier_prices WHERE company_id = $1 AND supplier_id = $2 ORDER BY valid_from, created_at`,
      [companyId, supplierId],
    );
    const history = new Map<string, { validFrom: string; packPrice: string }[]>();
    const bySupplierCode = new Map<string, string>();
    for (const r of rows) {
      const key = priceKey(r.material_id, r.pack_size);
      history.set(key, [...(history.get(key) ?? []), { validFrom: r.valid_from, packPrice: r.pack_price }]);
      if (r.supplier_code) {
        // Oldest first, so the latest row with a code wins.
        bySupplierCode.set(r.supplier_code.toLowerCase(), r.material_id);
      }
    }
    return {
      materialsByCode: new Map(materials.map((m) => [m.code.toLowerCase(), m])),
      materialsById: new Map(materials.map((m) => [m.id, m])),
      materialBySupplierCode: bySupplierCode,
      history,
    };
  }

  private result(rows: CheckedPriceRow[], committed: boolean): PriceImportResult {
    const valid = rows.filter((r) => r.errors.length === 0);
    return {
      rows: rows.map((r) => ({
        row: r.row,
        action: r.action,
        code: r.code,
        name: r.name,
        errors: r.errors,
        packSize: r.packSize,
        packPrice: r.packPrice,
        validFrom: r.validFrom,
        previousPrice: r.previousPrice,
      })),
      valid: valid.length,
      invalid: rows.length - valid.length,
      created: valid.filter((r) => r.action === 'create').length,
      updated: 0,
      unchanged: valid.filter((r) => r.action === 'unchanged').length,
      committed,
    };
  }
}
