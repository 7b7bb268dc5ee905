import { HttpStatus, Injectable, NotFoundException } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { Decimal } from '@potlife/domain';
import { DataSource, EntityManager } from 'typeorm';
import type { AuthUser } from '../../common/current-user';
import { RuleViolation } from '../../common/http-exception.filter';
import { today } from '../../stock/stock-dates';
import { Job, jobReference } from '../entities/job.entity';
import { JobsService } from '../jobs.service';
import { LabourEntry } from './labour-entry.entity';
import { CreateLabourEntryDto, JobLabourResponse, LabourEntryResponse, RemoveLabourEntryQuery } from './labour.dto';

/** Hours are booked while the crew is on the job: from scheduled, through in progress, to complete. */
export const LABOUR_OPEN: readonly string[] = ['scheduled', 'in-progress', 'complete'];

/** Why a job's time sheet cannot change now, or null when it can. */
export function labourClosedReason(job: Pick<Job, 'status' | 'number'>): string | null {
  if (LABOUR_OPEN.includes(job.status)) {
    return null;
  }
  const ref = jobReference(job.number);
  if (job.status === 'invoiced') {
    return `${ref} is invoiced: its hours are closed and can only be read`;
  }
  return `Hours are recorded once a job is scheduled, until it is complete; ${ref} is ${job.status}`;
}

interface EntryRow {
  id: string;
  worked_on: string;
  hours: string;
  crew_member: string;
  note: string | null;
  created_by: string | null;
  created_by_name: string | null;
  created_at: Date;
  removed_at: Date | null;
  removed_by: string | null;
  removed_by_name: string | null;
  remove_reason: string | null;
}

@Injectable()
export class LabourService {
  constructor(
    @InjectDataSource() private readonly db: DataSource,
    private readonly jobs: JobsService,
  ) {}

  async list(user: AuthUser, jobId: string, m: EntityManager = this.db.manager): Promise<JobLabourResponse> {
    const job = await this.jobs.find(user.companyId, jobId, m);
    const rows: EntryRow[] = await m.query(
      `SELECT e.id, to_char(e.worked_on, 'YYYY-MM-DD') AS worked_on, e.hours::text AS hours, e.crew_member, e.note,
              e.created_by, cu.name AS created_by_name, e.created_at,
              e.removed_at, e.removed_by, ru.name AS removed_by_name, e.remove_reason
         FROM job_labour_entries e
         LEFT JOIN users cu ON cu.id = e.created_by
         LEFT JOIN users ru ON ru.id = e.removed_by
        WHERE e.company_id = $1 AND e.job_id = $2
        ORDER BY e.worked_on DESC, e.created_at DESC, e.id`,
      [user.companyId, job.id],
    );
    const estimated: { hours: string }[] = job.acceptedEstimateId
      ? await m.query(`SELECT labour_hours::text AS hours FROM estimates WHERE id = $1 AND company_id = $2`, [
          job.acceptedEstimateId,
          user.companyId,
        ])
      : [];
    let total = new Decimal(0);
    const byCrew = new Map<string, { crewMember: string; hours: Decimal }>();
    // Oldest first, so a person's name is spelt as it was first typed.
    for (const r of [...rows].reverse()) {
      if (r.removed_at) {
        continue;
      }
      total = total.plus(r.hours);
      // One person typed two ways ("jonah pell ", "Jonah Pell") is one person.
      const key = r.crew_member.trim().toLowerCase();
      const seen = byCrew.get(key);
      byCrew.set(key, { crewMember: seen?.crewMember ?? r.crew_member, hours: (seen?.hours ?? new Decimal(0)).plus(r.hours) });
    }
    const closedReason = labourClosedReason(job);
    return {
      jobId: job.id,
      open: closedReason === null,
      closedReason,
      estimatedHours: estimated[0] ? new Decimal(estimated[0].hours).toString() : null,
      recordedHours: total.toString(),
      byCrewMember: [...byCrew.values()]
        .sort((a, b) => a.crewMember.localeCompare(b.crewMember))
        .map((c) => ({ crewMember: c.crewMember, hours: c.hours.toString() })),
      entries: rows.map(toEntry),
    };
  }

  async record(user: AuthUser, jobId: string, dto: CreateLabourEntryDto): Promise<JobLabourResponse> {
    if (dto.workedOn > today()) {
      throw new RuleViolation(
        'workedOn: hours are recorded for a day already worked, not a future date',
        'validation_failed',
        HttpStatus.BAD_REQUEST,
      );
    }
    return this.db.transaction(async (m) => {
      // The job's row is held so a status change cannot slip between the check and the entry.
      const job = await this.jobs.find(user.companyId, jobId, m, true);
      const closed = labourClosedReason(job);
      if (closed) {
        throw new RuleViolation(closed, 'labour_closed');
      }
      await m.getRepository(LabourEntry).save(
        m.getRepository(LabourEntry).create({
          companyId: user.companyId,
          jobId: job.id,
          workedOn: dto.workedOn,
          hours: new Decimal(dto.hours).toFixed(2),
          crewMember: dto.crewMember,
          note: dto.note ?? null,
          createdBy: user.id,
          removedAt: null,
          removedBy: null,
          removeReason: null,
        }),
      );
      return this.list(user, job.id, m);
    });
  }

  /** Strikes an entry out: it stops counting, and the sheet keeps it with who removed it and why. */
  async remove(
    user: AuthUser,
    jobId: string,
    entryId: string,
    q: RemoveLabourEntryQuery,
  ): Promise<JobLabourResponse> {
    return this.db.transaction(async (m) => {
      const job = await this.jobs.find(user.companyId, jobId, m, true);
      const entry = await m
        .getRepository(LabourEntry)
        .createQueryBuilder('e')
        .where('e.id = :entryId AND e.job_id = :jobId AND e.company_id = :companyId', {
          entryId,
          jobId: job.id,
          companyId: user.companyId,
        })
        .setLock('pessimistic_write')
        .getOne();
      if (!entry) {
        throw new NotFoundException('Labour entry not found');
      }
      const closed = labourClosedReason(job);
      if (closed) {
        throw new RuleViolation(closed, 'labour_closed');
      }
      if (entry.removedAt) {
        throw new RuleViolation('This entry is already struck out', 'labour_entry_removed');
      }
      entry.removedAt = new Date();
      entry.removedBy = user.id;
      entry.removeReason = q.reason ?? null;
      await m.getRepository(LabourEntry).save(entry);
      return this.list(user, job.id, m);
    });
  }
}

function toEntry(r: EntryRow): LabourEntryResponse {
  return {
    id: r.id,
    workedOn: r.worked_on,
    hours: new Decimal(r.hours).toString(),
    crewMember: r.crew_member,
    note: r.note,
    createdBy: r.created_by ? { id: r.created_by, name: r.created_by_name ?? '' } : null,
    createdAt: r.created_at.toISOString(),
    removed: r.removed_at
      ? {
          at: r.removed_at.toISOString(),
          by: r.removed_by ? { id: r.removed_by, name: r.removed_by_name ?? '' } : null,
          reason: r.remove_reason,
        }
      : null,
  };
}
