import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { EntityManager, Repository } from 'typeorm';
import {
  CreateCustomerDto,
  CustomerPage,
  CustomerResponse,
  ListCustomersQuery,
  UpdateCustomerDto,
} from './dto/customer.dto';
import { Customer } from './entities/customer.entity';

@Injectable()
export class CustomersService {
  constructor(@InjectRepository(Customer) private readonly customers: Repository<Customer>) {}

  async list(companyId: string, query: ListCustomersQuery): Promise<CustomerPage> {
    const page = query.page ?? 1;
    const pageSize = query.pageSize ?? 50;
    const qb = this.customers.createQueryBuilder('c').where('c.company_id = :companyId', { companyId });
    if (query.q) {
      const like = `%${query.q.replace(/[\\%_]/g, (m) => `\\${m}`)}%`;
      qb.andWhere('(c.name ILIKE :like OR c.contact_name ILIKE :like OR c.email ILIKE :like)', { like });
    }
    const sort = query.sort ?? 'name';
    const direction = sort.startsWith('-') ? 'DESC' : 'ASC';
    const key = sort.replace('-', '') as 'name' | 'createdAt' | 'jobCount';
    if (key === 'jobCount') {
      qb.addSelect('(SELECT count(*) FROM jobs j WHERE j.customer_id = c.id)', 'job_count').orderBy(
        'job_count',
        direction,
      );
    } else {
      qb.orderBy(key === 'name' ? 'lower(c.name)' : 'c.created_at', direction);
    }
    const [rows, total] = await qb
      // Ties by name (orderBy keys are unique, so the tie-break spells it differently from the sort).
      .addOrderBy('c.name', 'ASC')
      .addOrderBy('c.id', 'ASC')
      .offset((page - 1) * pageSize)
      .limit(pageSize)
      .getManyAndCount();
    const counts = await this.jobCounts(
      companyId,
      rows.map((r) => r.id),
    );
    return { items: rows.map((r) => CustomerResponse.from(r, counts.get(r.id) ?? 0)), total, page, pageSize };
  }

  private async jobCounts(companyId: string, ids: string[]): Promise<Map<string, number>> {
    if (ids.length === 0) {
      return new Map();
    }
    const rows: { customer_id: string; n: number }[] = await this.customers.query(
      `SELECT customer_id, count(*)::int AS n FROM jobs WHERE company_id = $1 AND customer_id = ANY($2) GROUP BY customer_id`,
      [companyId, ids],
    );
    return new Map(rows.map((r) => [r.customer_id, r.n]));
  }

  /** A customer of the company, or 404. */
  async find(companyId: string, id: string, manager?: EntityManager): Promise<Customer> {
    const repo = manager ? manager.getRepository(Customer) : this.customers;
    const c = await repo.findOneBy({ id, companyId });
    if (!c) {
      throw new NotFoundException('Customer not found');
    }
    return c;
  }

  async get(companyId: string, id: string): Promise<CustomerResponse> {
    const c = await this.find(companyId, id);
    const counts = await this.jobCounts(companyId, [id]);
    return CustomerResponse.from(c, counts.get(id) ?? 0);
  }

  async create(companyId: string, dto: CreateCustomerDto): Promise<CustomerResponse> {
    const c = await this.customers.save(
      this.customers.create({
        companyId,
        name: dto.name,
        contactName: dto.contactName ?? null,
        email: dto.email?.toLowerCase() ?? null,
        phone: dto.phone ?? null,
        billingAddress: dto.billingAddress ?? null,
        notes: dto.notes ?? null,
      }),
    );
    return CustomerResponse.from(c, 0);
  }

  async update(companyId: string, id: string, dto: UpdateCustomerDto): Promise<CustomerResponse> {
    const c = await this.find(companyId, id);
    if (dto.name !== undefined) {
      c.name = dto.name;
    }
    for (const key of ['contactName', 'phone', 'billingAddress', 'notes'] as const) {
      if (dto[key] !== undefined) {
        c[key] = dto[key] ?? null;
      }
    }
    if (dto.email !== undefined) {
      c.email = dto.email?.toLowerCase() ?? null;
    }
    await this.customers.save(c);
    return this.get(companyId, id);
  }
}
