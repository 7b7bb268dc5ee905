import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource, EntityManager, QueryFailedError } from 'typeorm';
import { pageOf } from '../catalogue/dto/page.dto';
import { likePattern } from '../catalogue/dto/validators';
import type { AuthUser } from '../common/current-user';
import {
  ContactResponse,
  CreateContactDto,
  CreateSupplierDto,
  SupplierListQuery,
  SupplierPage,
  SupplierResponse,
  SupplierSort,
  UpdateContactDto,
  UpdateSupplierDto,
} from './dto/supplier.dto';
import { Supplier } from './entities/supplier.entity';
import { SupplierContact } from './entities/supplier-contact.entity';
import { CurrentPrice, SupplierPricesService } from './supplier-prices.service';

const SORT_COLUMNS: Record<SupplierSort, string> = {
  name: 's.name',
  leadTimeDays: 's.leadTimeDays',
  createdAt: 's.createdAt',
  updatedAt: 's.updatedAt',
};

function given<T extends object>(dto: T): Partial<T> {
  return Object.fromEntries(Object.entries(dto).filter(([, v]) => v !== undefined)) as Partial<T>;
}

function toContact(c: SupplierContact): ContactResponse {
  return { id: c.id, name: c.name, email: c.email, phone: c.phone, role: c.role, createdAt: c.createdAt.toISOString() };
}

function toSupplier(s: Supplier, contacts: SupplierContact[]): SupplierResponse {
  return {
    id: s.id,
    name: s.name,
    orderEmail: s.orderEmail,
    phone: s.phone,
    address: s.address,
    leadTimeDays: s.leadTimeDays,
    active: s.active,
    notes: s.notes,
    contacts: contacts
      .filter((c) => c.supplierId === s.id)
      .sort((a, b) => a.name.localeCompare(b.name))
      .map(toContact),
    createdAt: s.createdAt.toISOString(),
    updatedAt: s.updatedAt.toISOString(),
  };
}

function duplicateName(e: unknown, name: string | undefined): unknown {
  const d = e instanceof QueryFailedError ? (e.driverError as { code?: string; constraint?: string }) : undefined;
  if (d?.code === '23505' && d.constraint === 'suppliers_company_name_key') {
    return new ConflictException({ message: `A supplier called ${name ?? 'that'} already exists`, code: 'duplicate_name' });
  }
  return e;
}

/**
 * Suppliers, their contacts and (through SupplierPricesService) their prices. Other modules call
 * `get`, `currentPrice` and `currentPrices`; every call is scoped by company.
 */
@Injectable()
export class SuppliersService {
  constructor(
    @InjectDataSource() private readonly db: DataSource,
    private readonly prices: SupplierPricesService,
  ) {}

  async list(companyId: string, query: SupplierListQuery): Promise<SupplierPage> {
    const { page, pageSize, offset } = pageOf(query);
    const qb = this.db.getRepository(Supplier).createQueryBuilder('s').where('s.companyId = :companyId', { companyId });
    if (query.q) {
      qb.andWhere(
        `(s.name ILIKE :q OR s.orderEmail ILIKE :q OR EXISTS (SELECT 1 FROM supplier_contacts c WHERE c.supplier_id = s.id AND (c.name ILIKE :q OR c.email ILIKE :q)))`,
        { q: likePattern(query.q) },
      );
    }
    const active = query.active ?? 'true';
    if (active !== 'all') {
      qb.andWhere('s.active = :active', { active: active === 'true' });
    }
    qb.orderBy(SORT_COLUMNS[query.sort ?? 'name'], query.order === 'desc' ? 'DESC' : 'ASC')
      .addOrderBy('s.id', 'ASC')
      .offset(offset)
      .limit(pageSize);
    const [rows, total] = await qb.getManyAndCount();
    const contacts =
      rows.length === 0
        ? []
        : await this.db
            .getRepository(SupplierContact)
            .createQueryBuilder('c')
            .where('c.companyId = :companyId AND c.supplierId IN (:...ids)', { companyId, ids: rows.map((r) => r.id) })
            .getMany();
    return { items: rows.map((s) => toSupplier(s, contacts)), total, page, pageSize };
  }

  /** One supplier of the company with its contacts; 404 when it is not the company's. */
  async get(companyId: string, id: string, manager: EntityManager = this.db.manager): Promise<SupplierResponse> {
    const s = await this.load(manager, companyId, id);
    const contacts = await manager.getRepository(SupplierContact).findBy({ companyId, supplierId: s.id });
    return toSupplier(s, contacts);
  }

  private async load(manager: EntityManager, companyId: string, id: string, lock = false): Promise<Supplier> {
    const s = await manager
      .getRepository(Supplier)
      .findOne({ where: { id, companyId }, ...(lock ? { lock: { mode: 'pessimistic_write' as const } } : {}) });
    if (!s) {
      throw new NotFoundException('Supplier not found');
    }
    return s;
  }

  async create(user: AuthUser, dto: CreateSupplierDto): Promise<SupplierResponse> {
    const { contacts = [], ...fields } = given(dto);
    try {
      return await this.db.transaction(async (m) => {
        const s = await m.getRepository(Supplier).save(m.getRepository(Supplier).create({ ...fields, companyId: user.companyId }));
        const repo = m.getRepository(SupplierContact);
        const saved = await repo.save(contacts.map((c) => repo.create({ ...given(c), companyId: user.companyId, supplierId: s.id })));
        return toSupplier(s, saved);
      });
    } catch (e) {
      throw duplicateName(e, dto.name);
    }
  }

  async update(user: AuthUser, id: string, dto: UpdateSupplierDto): Promise<SupplierResponse> {
    try {
      return await this.db.transaction(async (m) => {
        const s = await this.load(m, user.companyId, id, true);
        Object.assign(s, given(dto));
        await m.getRepository(Supplier).save(s);
        return this.get(user.companyId, id, m);
      });
    } catch (e) {
      throw duplicateName(e, dto.name);
    }
  }

  async addContact(user: AuthUser, supplierId: string, dto: CreateContactDto): Promise<ContactResponse> {
    await this.load(this.db.manager, user.companyId, supplierId);
    const repo = this.db.getRepository(SupplierContact);
    return toContact(await repo.save(repo.create({ ...given(dto), companyId: user.companyId, supplierId })));
  }

  private async loadContact(companyId: string, supplierId: string, contactId: string): Promise<SupplierContact> {
    const c = await this.db.getRepository(SupplierContact).findOneBy({ id: contactId, supplierId, companyId });
    if (!c) {
      throw new NotFoundException('Contact not found');
    }
    return c;
  }

  async updateContact(user: AuthUser, supplierId: string, contactId: string, dto: UpdateContactDto): Promise<ContactResponse> {
    const c = await this.loadContact(user.companyId, supplierId, contactId);
    Object.assign(c, given(dto));
    return toContact(await this.db.getRepository(SupplierContact).save(c));
  }

  /** Deletes the contact row (the screen asks first). */
  async deleteContact(user: AuthUser, supplierId: string, contactId: string): Promise<void> {
    const c = await this.loadContact(user.companyId, supplierId, contactId);
    await this.db.getRepository(SupplierContact).delete({ id: c.id, companyId: user.companyId });
  }

  /**
   * The price of one pack of a material on a date: the cheapest current price among the company's
   * active suppliers, or that supplier's with `opts.supplierId`; null when none is known.
   */
  currentPrice(
    companyId: string,
    materialId: string,
    packSize: string,
    onDate: string,
    opts: { supplierId?: string; manager?: EntityManager } = {},
  ): Promise<CurrentPrice | null> {
    return this.prices.currentPrice(companyId, materialId, packSize, onDate, opts);
  }

  /** Every supplier's current price on a date for these materials (all packs), cheapest first per material and pack. */
  currentPrices(companyId: string, materialIds: readonly string[], onDate: string, manager?: EntityManager): Promise<CurrentPrice[]> {
    return this.prices.currentPrices(companyId, materialIds, onDate, manager);
  }
}
