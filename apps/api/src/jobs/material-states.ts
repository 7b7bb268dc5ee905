import { Injectable } from '@nestjs/common';
import { jobHoldsStock, JobStatus } from '@potlife/domain';
import { EntityManager } from 'typeorm';
import type { MaterialState } from './dto/job-response';

/**
 * The stock side of jobs at a glance, for the list and the calendar: no accepted estimate; short
 * (the last reservation found a shortfall); not reserved (some material of the accepted estimate
 * is neither held nor out on the job: a reservation would look for it); reserved (every material
 * held or out, something still held); issued (everything out, nothing held).
 */
@Injectable()
export class MaterialStates {
  async of(
    m: EntityManager,
    companyId: string,
    jobs: readonly { id: string; accepted_estimate_id: string | null }[],
  ): Promise<Map<string, { state: MaterialState; shortfalls: number }>> {
    const ids = jobs.filter((j) => j.accepted_estimate_id).map((j) => j.id);
    const rows: {
      jobId: string;
      status: JobStatus;
      held: number;
      shortfalls: number;
      moved: number;
      open: number;
    }[] = ids.length
      ? await m.query(
          `SELECT j.id AS "jobId", j.status,
                  (SELECT count(*)::int FROM reservations r WHERE r.job_id = j.id AND r.status = 'held') AS held,
                  (SELECT count(*)::int FROM reservation_shortfalls s WHERE s.job_id = j.id) AS shortfalls,
                  (SELECT count(*)::int FROM stock_movements sm WHERE sm.company_id = $1 AND sm.job_id = j.id AND sm.kind = 'issue') AS moved,
                  (SELECT count(*)::int FROM estimate_materials em
                    WHERE em.estimate_id = j.accepted_estimate_id AND em.material_id IS NOT NULL AND em.pack_total > 0
                      AND em.pack_total > coalesce((SELECT sum(r.quantity - r.issued_quantity) FROM reservations r
                                                     WHERE r.job_id = j.id AND r.status = 'held' AND r.material_id = em.material_id), 0)
                                        + coalesce((SELECT -sum(sm.quantity) FROM stock_movements sm
                                                     WHERE sm.company_id = $1 AND sm.job_id = j.id AND sm.material_id = em.material_id
                                                       AND sm.kind IN ('issue', 'return')), 0)) AS open
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
          r.shortfalls > 0
            ? 'short'
            : r.open > 0 && jobHoldsStock(r.status) // what came back from a finished job is not missing
              ? 'not-reserved'
              : r.held > 0
                ? 'reserved'
                : r.moved > 0
                  ? 'issued'
                  : 'not-reserved';
        return [j.id, { state, shortfalls: r.shortfalls }];
      }),
    );
  }
}
