import { HttpStatus, Injectable, NotFoundException } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { checkJobTransition, DomainError, JobStatus, JOB_STATUSES, nextJobStatuses } from '@potlife/domain';
import { DataSource, EntityManager } from 'typeorm';
import { toDomainBuildUp } from '../build-ups/build-ups.service';
import { BuildUpsService } from '../build-ups/build-ups.service';
import type { AuthUser } from '../common/current-user';
import { RuleViolation } from '../common/http-exception.filter';
import { CustomersService } from '../customers/customers.service';
import {
  CalendarQuery,
  ChangeStatusDto,
  CreateJobDto,
  ListJobsQuery,
  UpdateJobDto,
  UpdateSettingsDto,
} from './dto/job.dto';
import {
  CalendarEntry,
  JobDetailResponse,
  JobPage,
  JobResponse,
  JobSettingsResponse,
  MaterialState,
  RoofResponse,
} from './dto/job-response';
import { CompanySettings, DEFAULT_SETTINGS } from './entities/company-settings.entity';
import { Job, jobReference } from './entities/job.entity';
import { JobStatusChange } from './entities/job-status-change.entity';
import { MaterialStates } from './material-states';
import { normaliseRoof, summariseRoof } from './roof/roof';
import { PutRoofDto } from './roof/roof.dto';

/** Storemen see jobs but not what they are worth. */
export const seesMoney = (user: AuthUser): boolean => user.role !== 'storeman';

interface JobRow {
  id: string;
  number: number;
  title: string;
  status: JobStatus;
  status_changed_at: Date;
  customer_id: string;
  customer_name: string;
  site_address: string;
  substrate: Job['substrate'];
  scheduled_on: string | null;
  estimator_id: string | null;
  estimator_name: string | null;
  crew: string | null;
  topcoat_colour: string | null;
  build_up_id: string | null;
  build_up_name: string | null;
  has_roof: boolean;
  roof_updated_at: Date | null;
  accepted_estimate_id: string | null;
  accepted_version: number | null;
  value: string | null;
  notes: string | null;
  created_at: Date;
  updated_at: Date;
}

const SELECT_JOBS = `
  SELECT j.id, j.number, j.title, j.status, j.status_changed_at, j.customer_id, c.name AS customer_name,
         j.site_address, j.substrate, to_char(j.scheduled_on, 'YYYY-MM-DD') AS scheduled_on,
         j.estimator_id, u.name AS estimator_name, j.crew, j.topcoat_colour, j.build_up_id, b.name AS build_up_name,
         (j.roof IS NOT NULL) AS has_roof, j.roof_updated_at, j.accepted_estimate_id, e.version AS accepted_version,
         e.net::text AS value, j.notes, j.created_at, j.updated_at
    FROM jobs j
    JOIN customers c ON c.id = j.customer_id
    LEFT JOIN users u ON u.id = j.estimator_id
    LEFT JOIN build_ups b ON b.id = j.build_up_id
    LEFT JOIN estimates e ON e.id = j.accepted_estimate_id`;

const SORT_SQL: Record<string, string> = {
  number: 'j.number',
  scheduledOn: 'j.scheduled_on',
  createdAt: 'j.created_at',
  value: 'e.net',
  status: `array_position(ARRAY[${JOB_STATUSES.map((s) => `'${s}'`).join(',')}]::varchar[], j.status)`,
  customer: 'lower(c.name)',
};

function toResponse(r: JobRow, state: MaterialState, money: boolean): JobResponse {
  const res: JobResponse = {
    id: r.id,
    reference: jobReference(r.number),
    number: r.number,
    title: r.title,
    status: r.status,
    nextStatuses: nextJobStatuses(r.status),
    statusChangedAt: r.status_changed_at.toISOString(),
    customer: { id: r.customer_id, name: r.customer_name },
    siteAddress: r.site_address,
    substrate: r.substrate,
    scheduledOn: r.scheduled_on,
    estimator: r.estimator_id ? { id: r.estimator_id, name: r.estimator_name ?? '' } : null,
    crew: r.crew,
    topcoatColour: r.topcoat_colour,
    buildUp: r.build_up_id ? { id: r.build_up_id, name: r.build_up_name ?? '' } : null,
    hasRoof: r.has_roof,
    roofUpdatedAt: r.roof_updated_at ? r.roof_updated_at.toISOString() : null,
    acceptedEstimate: r.accepted_estimate_id
      ? { id: r.accepted_estimate_id, version: r.accepted_version ?? 0 }
      : null,
    materialState: state,
    notes: r.notes,
    createdAt: r.created_at.toISOString(),
    updatedAt: r.updated_at.toISOString(),
  };
  if (money) {
    res.value = r.value;
  }
  return res;
}

@Injectable()
export class JobsService {
  constructor(
    @InjectDataSource() private readonly db: DataSource,
    private readonly customers: CustomersService,
    private readonly buildUps: BuildUpsService,
    private readonly materialStates: MaterialStates,
  ) {}

  /** A job of the company, or 404; `lock` takes its row for the transaction. */
  async find(companyId: string, id: string, m: EntityManager = this.db.manager, lock = false): Promise<Job> {
    const qb = m
      .getRepository(Job)
      .createQueryBuilder('j')
      .where('j.id = :id AND j.company_id = :companyId', { id, companyId });
    if (lock) {
      qb.setLock('pessimistic_write');
    }
    const job = await qb.getOne();
    if (!job) {
      throw new NotFoundException('Job not found');
    }
    return job;
  }

  private async checkEstimator(m: EntityManager, companyId: string, userId: string): Promise<void> {
    const rows: { role: string }[] = await m.query(
      `SELECT role FROM users WHERE id = $1 AND company_id = $2 AND active`,
      [userId, companyId],
    );
    if (rows.length === 0) {
      throw new NotFoundException('Estimator not found: estimatorId must be an active user of this company');
    }
    if (rows[0]!.role === 'storeman') {
      throw new RuleViolation(
        'estimatorId: a job’s estimator must be an owner or an estimator, not a storeman',
        'not_an_estimator',
        HttpStatus.UNPROCESSABLE_ENTITY,
      );
    }
  }

  async create(user: AuthUser, dto: CreateJobDto): Promise<JobDetailResponse> {
    const id = await this.db.transaction(async (m) => {
      await this.customers.find(user.companyId, dto.customerId, m);
      if (dto.buildUpId) {
        await this.buildUps.find(user.companyId, dto.buildUpId, m);
      }
      const estimatorId =
        dto.estimatorId === undefined ? (user.role === 'storeman' ? null : user.id) : dto.estimatorId;
      if (estimatorId) {
        await this.checkEstimator(m, user.companyId, estimatorId);
      }
      // One job number at a time per company.
      await m.query(`SELECT pg_advisory_xact_lock(hashtext('potlife:job-number:' || $1))`, [user.companyId]);
      const [{ next }] = (await m.query(
        `SELECT coalesce(max(number), 0) + 1 AS next FROM jobs WHERE company_id = $1`,
        [user.companyId],
      )) as [{ next: number }];
      const title = dto.title ?? `Flat roof, ${dto.siteAddress.split(/[,\n]/)[0]!.trim()}`.slice(0, 160);
      const job = await m.getRepository(Job).save(
        m.getRepository(Job).create({
          companyId: user.companyId,
          number: next,
          customerId: dto.customerId,
          title,
          siteAddress: dto.siteAddress,
          substrate: dto.substrate,
          scheduledOn: dto.scheduledOn ?? null,
          estimatorId,
          crew: dto.crew ?? null,
          topcoatColour: dto.topcoatColour ?? null,
          buildUpId: dto.buildUpId ?? null,
          status: 'enquiry',
          statusChangedAt: new Date(),
          roof: null,
          roofUpdatedAt: null,
          acceptedEstimateId: null,
          notes: dto.notes ?? null,
          createdBy: user.id,
        }),
      );
      await m.getRepository(JobStatusChange).save({
        companyId: user.companyId,
        jobId: job.id,
        fromStatus: null,
        toStatus: 'enquiry',
        reason: null,
        changedBy: user.id,
      });
      return job.id;
    });
    return this.get(user, id);
  }

  async list(user: AuthUser, q: ListJobsQuery): Promise<JobPage> {
    const page = q.page ?? 1;
    const pageSize = q.pageSize ?? 25;
    const where: string[] = ['j.company_id = $1'];
    const params: unknown[] = [user.companyId];
    const add = (sql: string, value: unknown) => {
      params.push(value);
      where.push(sql.replace('?', `$${params.length}`));
    };
    if (q.status) {
      const statuses = q.status
        .split(',')
        .map((s) => s.trim())
        .filter(Boolean);
      const bad = statuses.filter((s) => !(JOB_STATUSES as readonly string[]).includes(s));
      if (bad.length > 0) {
        throw new RuleViolation(
          `status: ${bad.join(', ')} is not a job status; use ${JOB_STATUSES.join(', ')}`,
          'validation_failed',
          HttpStatus.BAD_REQUEST,
        );
      }
      add('j.status = ANY(?)', statuses);
    }
    if (q.customerId) {
      add('j.customer_id = ?', q.customerId);
    }
    if (q.from) {
      add('j.scheduled_on >= ?', q.from);
    }
    if (q.to) {
      add('j.scheduled_on <= ?', q.to);
    }
    if (q.q) {
      const like = `%${q.q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
      params.push(like);
      const p = `$${params.length}`;
      where.push(
        `(j.title ILIKE ${p} OR j.site_address ILIKE ${p} OR c.name ILIKE ${p} OR ('J-' || lpad(j.number::text, 4, '0')) ILIKE ${p})`,
      );
    }
    if (q.sort?.replace('-', '') === 'value' && !seesMoney(user)) {
      throw new RuleViolation(
        'sort: a storeman cannot sort by value',
        'validation_failed',
        HttpStatus.BAD_REQUEST,
      );
    }
    const sort = q.sort ?? '-number';
    const desc = sort.startsWith('-');
    const expr = SORT_SQL[sort.replace('-', '')]!;
    const order = `${expr} ${desc ? 'DESC' : 'ASC'} NULLS LAST, j.number DESC`;
    const whereSql = where.join(' AND ');
    const [{ total }] = (await this.db.query(
      `SELECT count(*)::int AS total FROM jobs j JOIN customers c ON c.id = j.customer_id WHERE ${whereSql}`,
      params,
    )) as [{ total: number }];
    const rows: JobRow[] = await this.db.query(
      `${SELECT_JOBS} WHERE ${whereSql} ORDER BY ${order} LIMIT ${pageSize} OFFSET ${(page - 1) * pageSize}`,
      params,
    );
    const states = await this.materialStates.of(this.db.manager, user.companyId, rows);
    return {
      items: rows.map((r) => toResponse(r, states.get(r.id)?.state ?? 'no-estimate', seesMoney(user))),
      total,
      page,
      pageSize,
    };
  }

  async get(user: AuthUser, id: string): Promise<JobDetailResponse> {
    const rows: (JobRow & { contact_name: string | null; phone: string | null; email: string | null })[] =
      await this.db.query(
        `${SELECT_JOBS.replace('c.name AS customer_name,', 'c.name AS customer_name, c.contact_name, c.phone, c.email,')} WHERE j.id = $1 AND j.company_id = $2`,
        [id, user.companyId],
      );
    const r = rows[0];
    if (!r) {
      throw new NotFoundException('Job not found');
    }
    const history: {
      from_status: JobStatus | null;
      to_status: JobStatus;
      reason: string | null;
      changed_by: string | null;
      name: string | null;
      changed_at: Date;
    }[] = await this.db.query(
      `SELECT h.from_status, h.to_status, h.reason, h.changed_by, u.name, h.changed_at
           FROM job_status_changes h LEFT JOIN users u ON u.id = h.changed_by
          WHERE h.job_id = $1 AND h.company_id = $2 ORDER BY h.changed_at, h.id`,
      [id, user.companyId],
    );
    const states = await this.materialStates.of(this.db.manager, user.companyId, [r]);
    return {
      ...toResponse(r, states.get(r.id)?.state ?? 'no-estimate', seesMoney(user)),
      customerContact: { contactName: r.contact_name, phone: r.phone, email: r.email },
      statusHistory: history.map((h) => ({
        from: h.from_status,
        to: h.to_status,
        reason: h.reason,
        changedBy: h.changed_by ? { id: h.changed_by, name: h.name ?? '' } : null,
        changedAt: h.changed_at.toISOString(),
      })),
    };
  }

  async update(user: AuthUser, id: string, dto: UpdateJobDto): Promise<JobDetailResponse> {
    await this.db.transaction(async (m) => {
      const job = await this.find(user.companyId, id, m, true);
      if (dto.customerId !== undefined) {
        await this.customers.find(user.companyId, dto.customerId, m);
        job.customerId = dto.customerId;
      }
      if (dto.buildUpId) {
        await this.buildUps.find(user.companyId, dto.buildUpId, m);
      }
      if (dto.estimatorId) {
        await this.checkEstimator(m, user.companyId, dto.estimatorId);
      }
      if (dto.scheduledOn === null && job.status === 'scheduled') {
        throw new RuleViolation(
          'A scheduled job needs its date: move it back to won before clearing the date',
          'job_needs_date',
        );
      }
      for (const key of ['title', 'siteAddress', 'substrate'] as const) {
        if (dto[key] !== undefined) {
          (job as unknown as Record<string, unknown>)[key] = dto[key];
        }
      }
      for (const key of [
        'scheduledOn',
        'estimatorId',
        'crew',
        'topcoatColour',
        'buildUpId',
        'notes',
      ] as const) {
        if (dto[key] !== undefined) {
          (job as unknown as Record<string, unknown>)[key] = dto[key] ?? null;
        }
      }
      await m.getRepository(Job).save(job);
    });
    return this.get(user, id);
  }

  /**
   * Moves a job along its status machine (domain checkJobTransition): an illegal move answers 409
   * naming both states and the allowed next ones. Lost or cancelled releases its reservations.
   */
  async changeStatus(
    user: AuthUser,
    id: string,
    dto: ChangeStatusDto,
    onLeave?: (m: EntityManager, job: Job) => Promise<void>,
  ): Promise<JobDetailResponse> {
    await this.db.transaction(async (m) => {
      const job = await this.find(user.companyId, id, m, true);
      try {
        checkJobTransition(job.status, dto.status, {
          hasAcceptedEstimate: job.acceptedEstimateId !== null,
          hasScheduledDate: job.scheduledOn !== null,
        });
      } catch (e) {
        if (e instanceof DomainError) {
          throw new RuleViolation(e.message, 'illegal_transition');
        }
        throw e;
      }
      const from = job.status;
      job.status = dto.status;
      job.statusChangedAt = new Date();
      await m.getRepository(Job).save(job);
      await m.getRepository(JobStatusChange).save({
        companyId: user.companyId,
        jobId: job.id,
        fromStatus: from,
        toStatus: dto.status,
        reason: dto.reason ?? null,
        changedBy: user.id,
      });
      if (onLeave) {
        await onLeave(m, job);
      }
    });
    return this.get(user, id);
  }

  private async buildUpRates(companyId: string, job: Job, m: EntityManager) {
    if (!job.buildUpId) {
      return {};
    }
    return toDomainBuildUp((await this.buildUps.find(companyId, job.buildUpId, m)).rates);
  }

  async getRoof(user: AuthUser, id: string): Promise<RoofResponse> {
    const job = await this.find(user.companyId, id);
    if (!job.roof) {
      return { jobId: job.id, updatedAt: null, roof: null, summary: null };
    }
    return {
      jobId: job.id,
      updatedAt: job.roofUpdatedAt ? job.roofUpdatedAt.toISOString() : null,
      roof: job.roof,
      summary: summariseRoof(job.roof, await this.buildUpRates(user.companyId, job, this.db.manager)),
    };
  }

  /** Replaces the roof after the domain has checked every area; bad geometry answers 422 naming the area. */
  async putRoof(user: AuthUser, id: string, dto: PutRoofDto): Promise<RoofResponse> {
    return this.db.transaction(async (m) => {
      const job = await this.find(user.companyId, id, m, true);
      if (['complete', 'invoiced', 'lost', 'cancelled'].includes(job.status)) {
        throw new RuleViolation(`The roof of a ${job.status} job cannot be changed`, 'job_closed');
      }
      const roof = normaliseRoof(dto);
      const summary = summariseRoof(roof, await this.buildUpRates(user.companyId, job, m));
      job.roof = roof;
      job.roofUpdatedAt = new Date();
      await m.getRepository(Job).save(job);
      return { jobId: job.id, updatedAt: job.roofUpdatedAt.toISOString(), roof, summary };
    });
  }

  async calendar(user: AuthUser, q: CalendarQuery): Promise<CalendarEntry[]> {
    if (q.to < q.from) {
      throw new RuleViolation('to: must be on or after from', 'validation_failed', HttpStatus.BAD_REQUEST);
    }
    const days = (Date.parse(q.to) - Date.parse(q.from)) / 86_400_000;
    if (days > 400) {
      throw new RuleViolation(
        'to: a calendar spans at most 400 days',
        'validation_failed',
        HttpStatus.BAD_REQUEST,
      );
    }
    const rows: JobRow[] = await this.db.query(
      `${SELECT_JOBS} WHERE j.company_id = $1 AND j.scheduled_on BETWEEN $2 AND $3 AND j.status NOT IN ('lost', 'cancelled')
        ORDER BY j.scheduled_on, j.number`,
      [user.companyId, q.from, q.to],
    );
    const states = await this.materialStates.of(this.db.manager, user.companyId, rows);
    return rows.map((r) => ({
      id: r.id,
      reference: jobReference(r.number),
      title: r.title,
      status: r.status,
      scheduledOn: r.scheduled_on as string,
      customer: { id: r.customer_id, name: r.customer_name },
      siteAddress: r.site_address,
      crew: r.crew,
      materialState: states.get(r.id)?.state ?? 'no-estimate',
      shortfalls: states.get(r.id)?.shortfalls ?? 0,
    }));
  }

  settings(companyId: string, m: EntityManager = this.db.manager): Promise<JobSettingsResponse> {
    return readJobSettings(m, companyId);
  }

  async updateSettings(user: AuthUser, dto: UpdateSettingsDto): Promise<JobSettingsResponse> {
    const current = await this.settings(user.companyId);
    await this.db.query(
      `INSERT INTO company_settings (company_id, reservation_margin_days, quote_validity_days, updated_by, updated_at)
       VALUES ($1, $2, $3, $4, now())
       ON CONFLICT (company_id) DO UPDATE SET reservation_margin_days = $2, quote_validity_days = $3, updated_by = $4, updated_at = now()`,
      [
        user.companyId,
        dto.reservationMarginDays ?? current.reservationMarginDays,
        dto.quoteValidityDays ?? current.quoteValidityDays,
        user.id,
      ],
    );
    return this.settings(user.companyId);
  }
}

/** The owner's job settings, or the defaults when none are saved. */
export async function readJobSettings(m: EntityManager, companyId: string): Promise<JobSettingsResponse> {
  const s = await m.getRepository(CompanySettings).findOneBy({ companyId });
  return s
    ? {
        reservationMarginDays: s.reservationMarginDays,
        quoteValidityDays: s.quoteValidityDays,
        updatedAt: s.updatedAt.toISOString(),
      }
    : { ...DEFAULT_SETTINGS, updatedAt: null };
}
