import { BadRequestException, ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource, EntityManager, In, QueryFailedError } from 'typeorm';
import { RuleViolation } from '../common/http-exception.filter';
import type { AuthUser } from '../common/current-user';
import { describeBadRows, parseCsv, toCsv } from './csv';
import { ImportMode, ImportResult } from './dto/import.dto';
import {
  CreateMaterialDto,
  MaterialFilterQuery,
  MaterialListQuery,
  MaterialPage,
  MaterialResponse,
  MaterialSort,
  UpdateMaterialDto,
} from './dto/material.dto';
import { pageOf } from './dto/page.dto';
import { likePattern } from './dto/validators';
import { Material } from './entities/material.entity';
import { CheckedMaterialRow, checkMaterialRows, MATERIAL_CSV_COLUMNS, MATERIAL_CSV_REQUIRED, materialCsvRow } from './material-csv';
import {
  FieldError,
  fieldsOf,
  MATERIAL_DEFAULTS,
  MaterialFields,
  materialRuleErrors,
  normaliseFields,
  toMaterialResponse,
} from './material-fields';

const SORT_COLUMNS: Record<MaterialSort, string> = {
  code: 'm.code',
  name: 'm.name',
  kind: 'm.kind',
  stockUnit: 'm.stockUnit',
  shelfLifeDays: 'm.shelfLifeDays',
  hazardClass: 'm.hazardClass',
  createdAt: 'm.createdAt',
  updatedAt: 'm.updatedAt',
};

/** Columns of `materials` written by an import, with the JSON key (field name) and the SQL type each is read as. */
const IMPORT_COLUMNS: readonly [column: string, field: keyof MaterialFields, type: string][] = [
  ['code', 'code', 'text'],
  ['name', 'name', 'text'],
  ['kind', 'kind', 'text'],
  ['stock_unit', 'stockUnit', 'text'],
  ['pack_sizes', 'packSizes', 'jsonb'],
  ['lot_tracked', 'lotTracked', 'boolean'],
  ['shelf_life_days', 'shelfLifeDays', 'int'],
  ['storage_min_c', 'storageMinC', 'numeric'],
  ['storage_max_c', 'storageMaxC', 'numeric'],
  ['hazard_class', 'hazardClass', 'text'],
  ['un_number', 'unNumber', 'text'],
  ['packing_group', 'packingGroup', 'text'],
  ['flash_point_c', 'flashPointC', 'numeric'],
  ['is_accelerator', 'isAccelerator', 'boolean'],
  ['reorder_level', 'reorderLevel', 'numeric'],
  ['reorder_quantity', 'reorderQuantity', 'numeric'],
  ['mat_gsm', 'matGsm', 'int'],
  ['roll_width_m', 'rollWidthM', 'numeric'],
  ['trim_kind', 'trimKind', 'text'],
  ['trim_length_m', 'trimLengthM', 'numeric'],
  ['trim_piece', 'trimPiece', 'text'],
  ['topcoat_colour', 'topcoatColour', 'text'],
  ['litres_per_kg', 'litresPerKg', 'numeric'],
  ['active', 'active', 'boolean'],
  ['notes', 'notes', 'text'],
];

const UPSERT_SQL = `
  INSERT INTO materials (company_id, ${IMPORT_COLUMNS.map(([c]) => c).join(', ')})
  SELECT $1, ${IMPORT_COLUMNS.map(([, f]) => `x."${f}"`).join(', ')}
  FROM jsonb_to_recordset($2::jsonb) AS x(${IMPORT_COLUMNS.map(([, f, t]) => `"${f}" ${t}`).join(', ')})
  ON CONFLICT (company_id, (lower(code))) DO UPDATE SET
    ${IMPORT_COLUMNS.map(([c]) => `${c} = EXCLUDED.${c}`).join(', ')}, updated_at = now()`;

/** Rows per INSERT of an import. */
const IMPORT_BATCH = 1000;

const TABLE_WORDS: Record<string, string> = { supplier_prices: 'supplier prices' };

function isUniqueViolation(e: unknown, constraint: string): boolean {
  const d = e instanceof QueryFailedError ? (e.driverError as { code?: string; constraint?: string }) : undefined;
  return d?.code === '23505' && d.constraint === constraint;
}

function fieldErrorsException(errors: FieldError[]): BadRequestException {
  return new BadRequestException({ message: errors.map((e) => `${e.field}: ${e.message}`).join('; '), code: 'validation_failed' });
}

function duplicateCode(code: string): ConflictException {
  return new ConflictException({ message: `The code ${code} is already used by another material; codes are unique in the company`, code: 'duplicate_code' });
}

/** Only the keys a request really sent (class-transformer leaves absent ones undefined). */
function given<T extends object>(dto: T): Partial<T> {
  return Object.fromEntries(Object.entries(dto).filter(([, v]) => v !== undefined)) as Partial<T>;
}

/**
 * The catalogue: the materials a company stocks. Other modules read materials through `get`,
 * `findByIds`, `findByCodes` and `all` (every one scoped by company).
 */
@Injectable()
export class CatalogueService {
  constructor(@InjectDataSource() private readonly db: DataSource) {}

  async list(companyId: string, query: MaterialListQuery): Promise<MaterialPage> {
    const { page, pageSize, offset } = pageOf(query);
    const qb = this.filtered(this.db.manager, companyId, query)
      .orderBy(SORT_COLUMNS[query.sort ?? 'code'], query.order === 'desc' ? 'DESC' : 'ASC')
      .addOrderBy('m.id', 'ASC')
      .offset(offset)
      .limit(pageSize);
    const [rows, total] = await qb.getManyAndCount();
    return { items: rows.map(toMaterialResponse), total, page, pageSize };
  }

  private filtered(manager: EntityManager, companyId: string, f: MaterialFilterQuery) {
    const qb = manager.getRepository(Material).createQueryBuilder('m').where('m.companyId = :companyId', { companyId });
    if (f.q) {
      qb.andWhere('(m.code ILIKE :q OR m.name ILIKE :q)', { q: likePattern(f.q) });
    }
    if (f.kind) {
      qb.andWhere('m.kind IN (:...kinds)', { kinds: f.kind.split(',') });
    }
    const active = f.active ?? 'true';
    if (active !== 'all') {
      qb.andWhere('m.active = :active', { active: active === 'true' });
    }
    return qb;
  }

  /** One material of the company; 404 when it is not the company's. */
  async get(companyId: string, id: string, manager: EntityManager = this.db.manager): Promise<MaterialResponse> {
    return toMaterialResponse(await this.load(manager, companyId, id));
  }

  /** The company's materials among `ids`, in no particular order; ids of other companies' materials are left out. */
  async findByIds(companyId: string, ids: readonly string[], manager: EntityManager = this.db.manager): Promise<MaterialResponse[]> {
    const uuids = [...new Set(ids)].filter((id) => /^[0-9a-f-]{36}$/i.test(id));
    if (uuids.length === 0) {
      return [];
    }
    const rows = await manager.getRepository(Material).findBy({ companyId, id: In(uuids) });
    return rows.map(toMaterialResponse);
  }

  /** The company's materials with these codes (case-insensitive). */
  async findByCodes(companyId: string, codes: readonly string[], manager: EntityManager = this.db.manager): Promise<MaterialResponse[]> {
    if (codes.length === 0) {
      return [];
    }
    const rows = await manager
      .getRepository(Material)
      .createQueryBuilder('m')
      .where('m.companyId = :companyId AND lower(m.code) IN (:...codes)', { companyId, codes: codes.map((c) => c.toLowerCase()) })
      .getMany();
    return rows.map(toMaterialResponse);
  }

  /** Every material of the company, archived ones too, by code. */
  async all(companyId: string, manager: EntityManager = this.db.manager): Promise<MaterialResponse[]> {
    const rows = await manager.getRepository(Material).find({ where: { companyId }, order: { code: 'ASC' } });
    return rows.map(toMaterialResponse);
  }

  private async load(manager: EntityManager, companyId: string, id: string, lock = false): Promise<Material> {
    const m = await manager
      .getRepository(Material)
      .findOne({ where: { id, companyId }, ...(lock ? { lock: { mode: 'pessimistic_write' as const } } : {}) });
    if (!m) {
      throw new NotFoundException('Material not found');
    }
    return m;
  }

  async create(user: AuthUser, dto: CreateMaterialDto): Promise<MaterialResponse> {
    const fields = normaliseFields({ ...MATERIAL_DEFAULTS, ...given(dto) } as MaterialFields);
    const errors = materialRuleErrors(fields);
    if (errors.length > 0) {
      throw fieldErrorsException(errors);
    }
    const repo = this.db.getRepository(Material);
    try {
      const saved = await repo.save(repo.create({ ...fields, companyId: user.companyId }));
      return toMaterialResponse(saved);
    } catch (e) {
      if (isUniqueViolation(e, 'materials_company_code_key')) {
        throw duplicateCode(fields.code);
      }
      throw e;
    }
  }

  async update(user: AuthUser, id: string, dto: UpdateMaterialDto): Promise<MaterialResponse> {
    try {
      return await this.db.transaction(async (manager) => {
        const m = await this.load(manager, user.companyId, id, true);
        const before = fieldsOf(m);
        const fields = normaliseFields({ ...before, ...given(dto) } as MaterialFields);
        const errors = materialRuleErrors(fields);
        if (errors.length > 0) {
          throw fieldErrorsException(errors);
        }
        if (fields.stockUnit !== before.stockUnit) {
          const used = (await this.usage(manager, [m.id])).get(m.id);
          if (used) {
            throw new RuleViolation(
              `stockUnit: ${m.code} is already used (${used.join(', ')}), so its stock unit cannot change from ${before.stockUnit}; archive it and add a new material instead`,
              'material_in_use',
            );
          }
        }
        Object.assign(m, fields);
        return toMaterialResponse(await manager.getRepository(Material).save(m));
      });
    } catch (e) {
      if (isUniqueViolation(e, 'materials_company_code_key')) {
        throw duplicateCode(dto.code ?? '');
      }
      throw e;
    }
  }

  /**
   * Which of these materials other records point at, with the words for those records. Looks up
   * every table with a foreign key to materials, so lots, movements and lines added by other
   * modules count without this module knowing them.
   */
  async usage(manager: EntityManager, ids: readonly string[]): Promise<Map<string, string[]>> {
    const out = new Map<string, string[]>();
    if (ids.length === 0) {
      return out;
    }
    const refs: { tbl: string; col: string; name: string }[] = await manager.query(`
      SELECT c.conrelid::regclass::text AS tbl, quote_ident(a.attname) AS col, cl.relname AS name
      FROM pg_constraint c
      JOIN pg_attribute a ON a.attrelid = c.conrelid AND a.attnum = ANY (c.conkey)
      JOIN pg_class cl ON cl.oid = c.conrelid
      WHERE c.contype = 'f' AND c.confrelid = 'materials'::regclass`);
    for (const ref of refs) {
      const rows: { id: string }[] = await manager.query(`SELECT DISTINCT ${ref.col} AS id FROM ${ref.tbl} WHERE ${ref.col} = ANY ($1::uuid[])`, [ids]);
      for (const r of rows) {
        out.set(r.id, [...(out.get(r.id) ?? []), TABLE_WORDS[ref.name] ?? ref.name.replace(/_/g, ' ')]);
      }
    }
    return out;
  }

  /** The catalogue as CSV under MATERIAL_CSV_COLUMNS, by code; the same filters as the list. */
  async exportCsv(companyId: string, filter: MaterialFilterQuery): Promise<string> {
    const rows = await this.filtered(this.db.manager, companyId, { ...filter, active: filter.active ?? 'all' })
      .orderBy('m.code', 'ASC')
      .getMany();
    return toCsv(MATERIAL_CSV_COLUMNS, rows.map((m) => materialCsvRow(fieldsOf(m))));
  }

  /**
   * Checks a catalogue CSV (preview) or writes it (commit). A commit writes every row or none: one
   * transaction, refused with 422 listing the bad rows when any row has an error. Imports of one
   * company run one at a time.
   */
  async importCsv(user: AuthUser, csv: string, mode: ImportMode): Promise<ImportResult> {
    const table = parseCsv(csv, MATERIAL_CSV_COLUMNS, MATERIAL_CSV_REQUIRED);
    if (mode === 'preview') {
      return this.result(await this.checkRows(this.db.manager, user.companyId, table), false);
    }
    return this.db.transaction(async (manager) => {
      await manager.query(`SELECT pg_advisory_xact_lock(hashtext('potlife:materials-import'), hashtext($1))`, [user.companyId]);
      const rows = await this.checkRows(manager, user.companyId, table);
      const bad = rows.filter((r) => r.errors.length > 0);
      if (bad.length > 0) {
        throw new RuleViolation(
          `Nothing was imported: ${bad.length} of ${rows.length} rows have errors. ${describeBadRows(rows)}`,
          'import_rejected',
          422,
        );
      }
      const writes = rows.filter((r) => r.action !== 'unchanged').map((r) => r.fields!);
      for (let i = 0; i < writes.length; i += IMPORT_BATCH) {
        await manager.query(UPSERT_SQL, [user.companyId, JSON.stringify(writes.slice(i, i + IMPORT_BATCH))]);
      }
      return this.result(rows, true);
    });
  }

  private async checkRows(manager: EntityManager, companyId: string, table: ReturnType<typeof parseCsv>): Promise<CheckedMaterialRow[]> {
    const existing = await manager.getRepository(Material).findBy({ companyId });
    const byCode = new Map(existing.map((m) => [m.code.toLowerCase(), { id: m.id, fields: fieldsOf(m) }]));
    const rows = checkMaterialRows(table, byCode);
    const changing = rows.filter((r) => r.stockUnitChangedFrom !== null && r.existingId !== null);
    if (changing.length > 0) {
      const used = await this.usage(manager, changing.map((r) => r.existingId!));
      for (const r of changing) {
        const what = used.get(r.existingId!);
        if (what) {
          r.errors.push({
            field: 'stock_unit',
            message: `${r.code} is already used (${what.join(', ')}), so its stock unit cannot change from ${r.stockUnitChangedFrom}`,
          });
          r.fields = null;
        }
      }
    }
    return rows;
  }

  private result(rows: CheckedMaterialRow[], committed: boolean): ImportResult {
    const valid = rows.filter((r) => r.errors.length === 0);
    return {
      rows: rows.map((r) => ({ row: r.row, action: r.action, code: r.code, name: r.name, errors: r.errors })),
      valid: valid.length,
      invalid: rows.length - valid.length,
      created: valid.filter((r) => r.action === 'create').length,
      updated: valid.filter((r) => r.action === 'update').length,
      unchanged: valid.filter((r) => r.action === 'unchanged').length,
      committed,
    };
  }
}
