import { Injectable } from '@nestjs/common';
import { EntityManager } from 'typeorm';
import type { MaterialState } from './dto/job-response';

/** The stock side of jobs at a glance, for the list and the calendar. */
@Injectable()
export class MaterialStates {
  async of(
    _m: EntityManager,
    _companyId: string,
    jobs: readonly { id: string; accepted_estimate_id: string | null }[],
  ): Promise<Map<string, { state: MaterialState; shortfalls: number }>> {
    return new Map(jobs.map((j) => [j.id, { state: j.accepted_estimate_id ? 'not-reserved' : 'no-estimate', shortfalls: 0 }]));
  }
}
