import { Injectable } from '@nestjs/common';
import { EntityManager } from 'typeorm';
import type { MaterialState } from './dto/job-response';

/**
 * The stock side of jobs at a glance, for the list and the calendar: no accepted estimate; short
 * (the last reservation found a shortfall); reserved (something held, nothing short); issued
 * (stock has gone to site, nothing held); not reserved.
 */
@Injectable()
export class MaterialStates {
  async of(
    m: EntityManager,
    companyId: string,
    jobs: readonly { id: string; accepted_estimate_id: string | null }[],
  ): Promise<Map<string, { state: MaterialState; shortfalls: number }>> {
    const ids = jobs.filter((j) => j.accepted_estimate_id).map((j) => j.id);
    const rows: { jobId: string; held: number; shortfalls: number; moved: number }[] = ids.length
      ? await m.query(
          `SELECT j.id AS "jobId",
                  (SELECT count(*)::int FROM reservations r WHERE r.job_id = j.id AND r.status = 'held') AS held,
                  (SELECT count(*)::int FROM reservation_shortfalls s WHERE s.job_id = j.id) AS shortfalls,
                  (SELECT count(*)::int FROM stock_movements sm WHERE sm.company_id = $1 AND sm.job_id = j.id AND sm.kind = 'issue') AS moved
             FROM jobs j WHERE j.company_id = $1 AND j.id = ANY($2)`,
          [companyId, ids],
        )
      : [];
    return new Map(
      jobs.map((j) => {
        const r = rows.find((x) => x.jobId === j.id);
        if (!j.accepted_estimate_id || !r) {
          return [j.id, { state: 'no-estimate' as MaterialState, shortfalls: 0 }];
        }
        const state: MaterialState =
          r.shortfalls > 0 ? 'short' : r.held > 0 ? 'reserved' : r.moved > 0 ? 'issued' : 'not-reserved';
        return [j.id, { state, shortfalls: r.shortfalls }];
      }),
    );
  }
}
