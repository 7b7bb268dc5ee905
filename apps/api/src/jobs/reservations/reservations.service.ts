import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import {
  allocateFefo,
  Decimal,
  FefoLot,
  jobHoldsStock,
  lotUsableOn,
  shortfallToOrder,
} from '@potlife/domain';
import dayjs from 'dayjs';
import { DataSource, EntityManager } from 'typeorm';
import type { AuthUser } from '../../common/current-user';
import { RuleViolation } from '../../common/http-exception.filter';
import { CostingService } from '../../costing/costing.service';
import { StockService } from '../../stock/stock.service';
import { shownStatus } from '../../stock/stock-reader.service';
import type { Estimate } from '../entities/estimate.entity';
import { Job, jobReference } from '../entities/job.entity';
import { JobsService, readJobSettings } from '../jobs.service';
import { ReservationFlagCode, ReservationMaterialResponse, ReservationsResponse } from './reservation.dto';

/** A job may hold stock for its date from quoted until the crew has finished. */
export const RESERVABLE: readonly string[] = ['quoted', 'won', 'scheduled', 'in-progress'];

const ZERO = new Decimal(0);
/** Lots hold quantities to 3 decimal places; a need is rounded up to them. */
const LOT_PLACES = 3;
const fmt = (d: Decimal) => d.toDecimalPlaces(LOT_PLACES).toString();
const addDays = (date: string, days: number) => dayjs(date).add(days, 'day').format('YYYY-MM-DD');

/** What the accepted estimate asks of one material. */
export interface NeededMaterial {
  materialId: string;
  code: string;
  name: string;
  kind: string;
  unit: string;
  needed: Decimal;
  packSizes: { size: string; label: string }[];
  reorderQuantity: string;
  leadTimeDays: number | null;
  supplier: { id: string; name: string } | null;
}

/** A lot as offerLots needs it (a LockedLot, or a lot read without a lock). */
export interface OfferableLot {
  id: string;
  quantity: string;
  fefoExpiresOn: string;
  status: string;
  exposureFlagged: boolean;
}

/** A lot offered to a job, with its cost and batch: what the estimate on stock cost takes. */
export interface OfferedLot extends FefoLot {
  quantity: Decimal;
  unitCost: string;
  batchNumber: string | null;
}

/**
 * The lots of one material as a job is offered them, in allocateFefo's terms: what is left of
 * each lot after the holds given, usable only when available and not exposure-flagged. The one
 * definition behind the reservation (reserveIn) and the estimate on stock cost (offeredLots).
 */
export function offerLots(
  lots: readonly OfferableLot[],
  holds: readonly { lotId: string; held: string }[],
): FefoLot[] {
  return lots.map((l) => ({
    id: l.id,
    quantity: Decimal.max(
      ZERO,
      holds.filter((h) => h.lotId === l.id).reduce((q, h) => q.minus(h.held), new Decimal(l.quantity)),
    ),
    expiresOn: l.fefoExpiresOn,
    usable: l.status === 'available' && !l.exposureFlagged,
  }));
}

/** The last day a lot must be in date for a job on `jobDate`: the date plus the owner's margin. */
export const useByFor = (jobDate: string, marginDays: number): string => addDays(jobDate, marginDays);

interface HeldRow {
  id: string;
  materialId: string;
  lotId: string;
  estimateId: string;
  quantity: string;
  issuedQuantity: string;
  status: 'held' | 'issued';
  createdAt: Date;
  batchNumber: string | null;
  expiresOn: string | null;
  lotStatus: string;
  exposureFlagged: boolean;
  lotQuantity: string;
}

/**
 * Stock held for a job's date. Every reservation locks the lots of each material (in material,
 * then lot id order, through StockService.lockLotsForMaterial) for the whole transaction, reads
 * what other jobs hold after the lock is granted, then allocates with the domain's allocateFefo:
 * two estimators reserving the last drum at once are served one after the other.
 */
@Injectable()
export class ReservationsService {
  constructor(
    @InjectDataSource() private readonly db: DataSource,
    private readonly jobs: JobsService,
    private readonly stock: StockService,
    private readonly costing: CostingService,
  ) {}

  /** The materials of an estimate that can be reserved, with their packs in the stock unit; and those that cannot. */
  async neededFor(
    m: EntityManager,
    companyId: string,
    estimateId: string,
  ): Promise<{ needed: NeededMaterial[]; skipped: ReservationsResponse['skipped'] }> {
    const rows: {
      materialId: string | null;
      roles: string[];
      materialKind: string;
      packTotal: string | null;
      problem: string | null;
      code: string | null;
      name: string | null;
      unit: string | null;
      packSizes: { size: string; label: string }[] | null;
      reorderQuantity: string | null;
      leadTimeDays: number | null;
      supplierId: string | null;
      supplierName: string | null;
    }[] = await m.query(
      `SELECT em.material_id AS "materialId", em.roles, em.material_kind AS "materialKind", em.pack_total::text AS "packTotal", em.problem,
              mt.code, mt.name, mt.stock_unit AS unit, mt.pack_sizes AS "packSizes", mt.reorder_quantity::text AS "reorderQuantity",
              p.lead_time_days AS "leadTimeDays", p.supplier_id AS "supplierId", p.supplier_name AS "supplierName"
         FROM estimate_materials em
         LEFT JOIN materials mt ON mt.id = em.material_id
         LEFT JOIN LATERAL (SELECT lead_time_days, supplier_id, supplier_name FROM estimate_packs
                             WHERE estimate_material_id = em.id AND supplier_id IS NOT NULL
                             ORDER BY lead_time_days DESC NULLS LAST LIMIT 1) p ON true
        WHERE em.estimate_id = $1 AND em.company_id = $2
        ORDER BY em.position`,
      [estimateId, companyId],
    );
    const needed: NeededMaterial[] = [];
    const skipped: ReservationsResponse['skipped'] = [];
    for (const r of rows) {
      if (!r.materialId || !r.name) {
        skipped.push({
          roles: r.roles,
          materialKind: r.materialKind,
          reason: r.problem ?? 'No catalogue material for this line.',
        });
      } else if (!r.packTotal || new Decimal(r.packTotal).isZero()) {
        skipped.push({
          roles: r.roles,
          materialKind: r.materialKind,
          reason: r.problem ?? `${r.name}: nothing to reserve.`,
        });
      } else {
        needed.push({
          materialId: r.materialId,
          code: r.code ?? '',
          name: r.name,
          kind: r.materialKind,
          unit: r.unit ?? '',
          needed: new Decimal(r.packTotal).toDecimalPlaces(LOT_PLACES, Decimal.ROUND_UP),
          packSizes: r.packSizes ?? [],
          reorderQuantity: r.reorderQuantity ?? '0',
          leadTimeDays: r.leadTimeDays,
          supplier: r.supplierId ? { id: r.supplierId, name: r.supplierName ?? '' } : null,
        });
      }
    }
    // Unpriced materials have no supplier on their packs: the cheapest current supplier's lead time then.
    const unknown = needed.filter((n) => n.leadTimeDays === null);
    if (unknown.length) {
      const prices = await this.costing.currentPrices(
        companyId,
        unknown.map((n) => n.materialId),
        dayjs().format('YYYY-MM-DD'),
        m,
      );
      for (const n of unknown) {
        const p = [...prices.entries()].find(([k]) => k.startsWith(`${n.materialId}|`))?.[1];
        if (p) {
          n.leadTimeDays = p.leadTimeDays;
          n.supplier = { id: p.supplierId, name: p.supplierName };
        }
      }
    }
    return { needed, skipped };
  }

  /** Issued less returned, per material, for a job (from the ledger). */
  async netOut(m: EntityManager, companyId: string, jobId: string): Promise<Map<string, Decimal>> {
    const rows: { materialId: string; out: string }[] = await m.query(
      `SELECT material_id AS "materialId", (-sum(quantity))::text AS out FROM stock_movements
        WHERE company_id = $1 AND job_id = $2 AND kind IN ('issue', 'return') GROUP BY material_id`,
      [companyId, jobId],
    );
    return new Map(rows.map((r) => [r.materialId, new Decimal(r.out)]));
  }

  private async settings(m: EntityManager, companyId: string): Promise<number> {
    return (await readJobSettings(m, companyId)).reservationMarginDays;
  }

  /**
   * Reserves the accepted estimate's packs for the job date: for each material, what is still
   * needed (packs − held − already out on the job) by allocateFefo from lots that are available,
   * not exposure-flagged, and in date on the job date + the owner's margin, less what other jobs
   * hold. What cannot be found is the shortfall, needed by the job date less the supplier's lead time.
   */
  async reserve(user: AuthUser, jobId: string): Promise<ReservationsResponse> {
    await this.db.transaction(async (m) =>
      this.reserveIn(m, user, await this.jobs.find(user.companyId, jobId, m, true)),
    );
    return this.view(user.companyId, jobId);
  }

  /** The reservation in the caller's transaction, the job's row already locked (the route, the demo seed). */
  async reserveIn(m: EntityManager, user: Pick<AuthUser, 'companyId' | 'id'>, job: Job): Promise<void> {
    if (!RESERVABLE.includes(job.status)) {
      throw new RuleViolation(
        `A ${job.status} job cannot hold stock: reservations are for jobs from quoted to in-progress`,
        'job_cannot_reserve',
      );
    }
    if (!job.scheduledOn) {
      throw new RuleViolation(
        'Give the job a scheduled date first: stock is reserved for the job date',
        'job_needs_date',
      );
    }
    if (!job.acceptedEstimateId) {
      throw new RuleViolation(
        'Accept an estimate first: its packs are what is reserved',
        'no_accepted_estimate',
      );
    }
    const margin = await this.settings(m, user.companyId);
    const jobDate = job.scheduledOn;
    const estimateId = job.acceptedEstimateId;
    const useBy = useByFor(jobDate, margin);
    const { needed } = await this.neededFor(m, user.companyId, estimateId);
    const out = await this.netOut(m, user.companyId, job.id);
    const ids = needed.map((n) => n.materialId);
    // What this job holds now (its row lock keeps it still), and which materials have stock at
    // all: only those are locked. Stock that arrives meanwhile is found by the next reservation.
    const [mine, stocked] = await Promise.all([
      m.query(
        `SELECT id, material_id AS "materialId", lot_id AS "lotId", (quantity - issued_quantity)::text AS held
           FROM reservations WHERE job_id = $1 AND status = 'held'`,
        [job.id],
      ) as Promise<{ id: string; materialId: string; lotId: string; held: string }[]>,
      m.query(
        `SELECT DISTINCT material_id AS id FROM lots WHERE company_id = $1 AND material_id = ANY($2) AND quantity > 0`,
        [user.companyId, ids],
      ) as Promise<{ id: string }[]>,
    ]);
    const withStock = new Set(stocked.map((r) => r.id));
    const stale: string[] = [];
    const holds: unknown[][] = [];
    const shortfalls: unknown[][] = [];
    for (const n of [...needed].sort((a, b) => a.materialId.localeCompare(b.materialId))) {
      const lots = withStock.has(n.materialId)
        ? await this.stock.lockLotsForMaterial(m, user.companyId, n.materialId)
        : [];
      // Holds of this job that no longer fit the job date (lot expired for it, quarantined,
      // flagged, gone) are let go and found again.
      const mineRows = mine.filter((r) => r.materialId === n.materialId);
      const kept = new Set<string>();
      for (const r of mineRows) {
        const lot = lots.find((l) => l.id === r.lotId);
        const fits =
          !!lot &&
          lot.status === 'available' &&
          !lot.exposureFlagged &&
          !new Decimal(r.held).gt(lot.quantity) &&
          lotUsableOn({ expiresOn: lot.fefoExpiresOn, usable: true }, jobDate, margin);
        if (fits) {
          kept.add(r.id);
        } else {
          stale.push(r.id);
        }
      }
      const held: { lotId: string; jobId: string; held: string }[] = lots.length
        ? await m.query(
            `SELECT lot_id AS "lotId", job_id AS "jobId", sum(quantity - issued_quantity)::text AS held FROM reservations
              WHERE status = 'held' AND lot_id = ANY($1) AND NOT (id = ANY($2)) GROUP BY lot_id, job_id`,
            [lots.map((l) => l.id), mineRows.filter((r) => !kept.has(r.id)).map((r) => r.id)],
          )
        : [];
      const heldBy = (lotId: string, mineOnly: boolean) =>
        held
          .filter((h) => h.lotId === lotId && (h.jobId === job.id) === mineOnly)
          .reduce((sum, h) => sum.plus(h.held), ZERO);
      const mineHeld = lots.reduce((sum, l) => sum.plus(heldBy(l.id, true)), ZERO);
      const need = Decimal.max(ZERO, n.needed.minus(mineHeld).minus(out.get(n.materialId) ?? ZERO));
      // less what every job holds, this one's kept holds too (they already count against the need)
      const offered = offerLots(lots, held);
      const result = allocateFefo(offered, need, useBy);
      for (const a of result.allocations) {
        holds.push([
          user.companyId,
          job.id,
          estimateId,
          n.materialId,
          a.lotId,
          fmt(a.quantity),
          jobDate,
          useBy,
          user.id,
        ]);
      }
      if (result.shortfall.gt(0)) {
        const lead = n.leadTimeDays;
        shortfalls.push([
          user.companyId,
          job.id,
          estimateId,
          n.materialId,
          fmt(result.shortfall),
          jobDate,
          addDays(jobDate, -(lead ?? 0)),
          lead,
          n.supplier?.id ?? null,
          n.supplier?.name ?? null,
        ]);
      }
    }
    if (stale.length) {
      await m.query(
        `UPDATE reservations SET status = 'released', released_at = now(), released_by = $2,
                release_reason = 'No longer usable for the job date: reserved again' WHERE id = ANY($1)`,
        [stale, user.id],
      );
    }
    await m.query(`DELETE FROM reservation_shortfalls WHERE job_id = $1`, [job.id]);
    await insertRows(
      m,
      'reservations (company_id, job_id, estimate_id, material_id, lot_id, quantity, job_date, use_by, created_by)',
      holds,
    );
    await insertRows(
      m,
      'reservation_shortfalls (company_id, job_id, estimate_id, material_id, quantity, job_date, needed_by, lead_time_days, supplier_id, supplier_name)',
      shortfalls,
    );
  }

  /**
   * What a job could reserve of each material for its scheduled date, read without locks (for an
   * estimate on stock cost; nothing is held): the lots with stock, offered as reserveIn offers
   * them (offerLots), less what other jobs hold — this job's own holds stay offered to it. The
   * lots come in FEFO order with their unit cost; allocate them with the use-by date returned.
   */
  async offeredLots(
    m: EntityManager,
    companyId: string,
    job: Pick<Job, 'id' | 'scheduledOn'>,
    materialIds: readonly string[],
  ): Promise<{ useBy: string; lots: Map<string, OfferedLot[]> }> {
    if (!job.scheduledOn) {
      throw new RuleViolation(
        'Give the job a scheduled date first: stock is offered for the job date',
        'job_needs_date',
      );
    }
    const margin = await this.settings(m, companyId);
    const useBy = useByFor(job.scheduledOn, margin);
    const out = new Map<string, OfferedLot[]>(materialIds.map((id) => [id, []]));
    if (materialIds.length === 0) {
      return { useBy, lots: out };
    }
    const rows: {
      id: string;
      materialId: string;
      batchNumber: string | null;
      expiresOn: string | null;
      status: 'available' | 'quarantined' | 'expired' | 'written-off';
      exposureFlagged: boolean;
      unitCost: string;
      quantity: string;
    }[] = await m.query(
      `SELECT l.id, l.material_id AS "materialId", l.batch_number AS "batchNumber", l.expires_on::text AS "expiresOn",
              l.status, l.exposure_flagged AS "exposureFlagged", l.unit_cost::text AS "unitCost", l.quantity::text AS quantity
         FROM lots l WHERE l.company_id = $1 AND l.material_id = ANY($2) AND l.quantity > 0
        ORDER BY l.material_id, l.expires_on NULLS LAST, l.received_on, l.id`,
      [companyId, [...materialIds]],
    );
    const held: { lotId: string; held: string }[] = rows.length
      ? await m.query(
          `SELECT lot_id AS "lotId", sum(quantity - issued_quantity)::text AS held FROM reservations
            WHERE status = 'held' AND lot_id = ANY($1) AND job_id <> $2 GROUP BY lot_id`,
          [rows.map((r) => r.id), job.id],
        )
      : [];
    const lots = rows.map((r) => ({
      ...r,
      fefoExpiresOn: r.expiresOn ?? '9999-12-31',
      status: shownStatus(r.status, r.expiresOn),
    }));
    const offered = offerLots(lots, held);
    lots.forEach((l, i) => {
      out.get(l.materialId)?.push({
        ...offered[i]!,
        quantity: new Decimal(offered[i]!.quantity),
        unitCost: l.unitCost,
        batchNumber: l.batchNumber,
      });
    });
    return { useBy, lots: out };
  }

  /** Releases everything the job holds (on DELETE, and when it is lost or cancelled). */
  async releaseIn(
    m: EntityManager,
    companyId: string,
    jobId: string,
    userId: string | null,
    reason: string,
  ): Promise<number> {
    const released: unknown[] = await m.query(
      `UPDATE reservations SET status = 'released', released_at = now(), released_by = $3, release_reason = $4
        WHERE company_id = $1 AND job_id = $2 AND status = 'held' RETURNING id`,
      [companyId, jobId, userId, reason],
    );
    await m.query(`DELETE FROM reservation_shortfalls WHERE company_id = $1 AND job_id = $2`, [
      companyId,
      jobId,
    ]);
    return released.length;
  }

  async release(user: AuthUser, jobId: string): Promise<ReservationsResponse> {
    await this.db.transaction(async (m) => {
      const job = await this.jobs.find(user.companyId, jobId, m, true);
      await this.releaseIn(m, user.companyId, job.id, user.id, `Released by ${user.name}`);
    });
    return this.view(user.companyId, jobId);
  }

  /** Inside a status change: a job lost, cancelled or invoiced lets go of its stock. */
  async onStatusChange(m: EntityManager, job: Job, userId: string): Promise<void> {
    if (!jobHoldsStock(job.status)) {
      await this.releaseIn(m, job.companyId, job.id, userId, `Job ${jobReference(job.number)} ${job.status}`);
    }
  }

  /** Inside an acceptance: stock held for another version must be released first. */
  async beforeAccept(m: EntityManager, job: Job, e: Estimate): Promise<void> {
    const other: { version: number }[] = await m.query(
      `SELECT DISTINCT e.version FROM reservations r JOIN estimates e ON e.id = r.estimate_id
        WHERE r.job_id = $1 AND r.status = 'held' AND r.estimate_id <> $2`,
      [job.id, e.id],
    );
    if (other.length > 0) {
      throw new RuleViolation(
        `Stock is reserved for estimate version ${other.map((o) => o.version).join(', ')}: release the reservations before accepting version ${e.version}`,
        'reserved_for_other_version',
      );
    }
  }

  /** Held and issued reservations of a job, with their lots as they are now. */
  async heldRows(m: EntityManager, companyId: string, jobId: string): Promise<HeldRow[]> {
    return m.query(
      `SELECT r.id, r.material_id AS "materialId", r.lot_id AS "lotId", r.estimate_id AS "estimateId", r.quantity::text AS quantity,
              r.issued_quantity::text AS "issuedQuantity", r.status, r.created_at AS "createdAt",
              l.batch_number AS "batchNumber", l.expires_on::text AS "expiresOn", l.status AS "lotStatus",
              l.exposure_flagged AS "exposureFlagged", l.quantity::text AS "lotQuantity"
         FROM reservations r JOIN lots l ON l.id = r.lot_id
        WHERE r.company_id = $1 AND r.job_id = $2 AND r.status <> 'released'
        ORDER BY r.material_id, l.expires_on NULLS LAST, r.created_at, r.id`,
      [companyId, jobId],
    );
  }

  /** What is wrong now with a held lot for the job date (domain lotUsableOn). */
  flags(
    r: Pick<
      HeldRow,
      'expiresOn' | 'lotStatus' | 'exposureFlagged' | 'lotQuantity' | 'quantity' | 'issuedQuantity'
    >,
    jobDate: string | null,
    margin: number,
  ) {
    const out: { code: ReservationFlagCode; message: string }[] = [];
    if (r.lotStatus === 'quarantined' || r.lotStatus === 'written-off') {
      out.push({
        code: 'quarantined',
        message: `The lot is ${r.lotStatus}: it cannot go to the job; release it and reserve again.`,
      });
    }
    if (r.exposureFlagged) {
      out.push({
        code: 'exposure-flagged',
        message:
          'The lot is flagged “check before use” (stored outside its temperature range): check it and clear the flag, or reserve another lot.',
      });
    }
    if (jobDate && r.expiresOn) {
      if (!lotUsableOn({ expiresOn: r.expiresOn, usable: true }, jobDate)) {
        out.push({
          code: 'expires-before-job',
          message: `The lot expires on ${r.expiresOn}, before the job date ${jobDate}: release it and reserve again.`,
        });
      } else if (!lotUsableOn({ expiresOn: r.expiresOn, usable: true }, jobDate, margin)) {
        out.push({
          code: 'expires-within-margin',
          message: `The lot expires on ${r.expiresOn}, within the ${margin}-day margin after the job date ${jobDate}.`,
        });
      }
    }
    const held = new Decimal(r.quantity).minus(r.issuedQuantity);
    if (held.gt(r.lotQuantity)) {
      out.push({
        code: 'not-in-stock',
        message: `Only ${new Decimal(r.lotQuantity).toString()} of the lot is left in stock.`,
      });
    }
    return out;
  }

  /** The job's reservations, shortfalls and flags as they stand. */
  async view(
    companyId: string,
    jobId: string,
    m: EntityManager = this.db.manager,
  ): Promise<ReservationsResponse> {
    const job = await this.jobs.find(companyId, jobId, m);
    const margin = await this.settings(m, companyId);
    const useBy = job.scheduledOn ? addDays(job.scheduledOn, margin) : null;
    if (!job.acceptedEstimateId) {
      return {
        jobId: job.id,
        jobDate: job.scheduledOn,
        marginDays: margin,
        useBy,
        estimate: null,
        state: 'no-estimate',
        materials: [],
        skipped: [],
        flagged: 0,
      };
    }
    const [{ version }] = (await m.query(`SELECT version FROM estimates WHERE id = $1`, [
      job.acceptedEstimateId,
    ])) as [{ version: number }];
    const { needed, skipped } = await this.neededFor(m, companyId, job.acceptedEstimateId);
    const rows = await this.heldRows(m, companyId, job.id);
    const out = await this.netOut(m, companyId, job.id);
    const shortfalls: {
      materialId: string;
      quantity: string;
      neededBy: string;
      leadTimeDays: number | null;
      supplierId: string | null;
      supplierName: string | null;
      createdAt: Date;
    }[] = await m.query(
      `SELECT material_id AS "materialId", quantity::text AS quantity, needed_by::text AS "neededBy", lead_time_days AS "leadTimeDays",
                supplier_id AS "supplierId", supplier_name AS "supplierName", created_at AS "createdAt"
           FROM reservation_shortfalls WHERE company_id = $1 AND job_id = $2`,
      [companyId, job.id],
    );
    let flagged = 0;
    const materials: ReservationMaterialResponse[] = needed.map((n) => {
      const mine = rows.filter((r) => r.materialId === n.materialId);
      const lines = mine.map((r) => {
        const heldQ = r.status === 'held' ? new Decimal(r.quantity).minus(r.issuedQuantity) : ZERO;
        const flags = r.status === 'held' ? this.flags(r, job.scheduledOn, margin) : [];
        flagged += flags.length ? 1 : 0;
        return {
          id: r.id,
          lot: { id: r.lotId, batchNumber: r.batchNumber, expiresOn: r.expiresOn },
          status: r.status,
          reservedQuantity: new Decimal(r.quantity).toString(),
          issuedQuantity: new Decimal(r.issuedQuantity).toString(),
          heldQuantity: heldQ.toString(),
          flags,
          createdAt: r.createdAt.toISOString(),
        };
      });
      const held = lines.reduce((s, l) => s.plus(l.heldQuantity), ZERO);
      const issued = out.get(n.materialId) ?? ZERO;
      const s = shortfalls.find((x) => x.materialId === n.materialId);
      let toOrder: { packs: { size: string; label: string; count: number }[]; total: string } | null = null;
      if (s && n.packSizes.length) {
        const choice = shortfallToOrder(
          s.quantity,
          n.packSizes.map((p) => p.size),
          n.reorderQuantity,
        );
        toOrder = {
          packs: choice.packs.map((p) => ({
            size: p.size.toString(),
            label: n.packSizes.find((x) => new Decimal(x.size).eq(p.size))?.label ?? p.size.toString(),
            count: p.count,
          })),
          total: choice.total.toString(),
        };
      }
      return {
        material: { id: n.materialId, code: n.code, name: n.name },
        unit: n.unit,
        needed: n.needed.toString(),
        held: held.toString(),
        issued: issued.toString(),
        outstanding: Decimal.max(ZERO, n.needed.minus(held).minus(issued)).toString(),
        reservations: lines,
        shortfall: s
          ? {
              quantity: new Decimal(s.quantity).toString(),
              neededBy: s.neededBy,
              leadTimeDays: s.leadTimeDays,
              supplier: s.supplierId ? { id: s.supplierId, name: s.supplierName ?? '' } : null,
              toOrder,
              checkedAt: s.createdAt.toISOString(),
            }
          : null,
      };
    });
    const state =
      shortfalls.length > 0
        ? 'short'
        : !materials.every((x) => new Decimal(x.outstanding).isZero())
          ? 'not-reserved'
          : materials.some((x) => new Decimal(x.held).gt(0)) || materials.length === 0
            ? 'reserved'
            : 'issued'; // everything the estimate needs has gone out: nothing left to hold
    return {
      jobId: job.id,
      jobDate: job.scheduledOn,
      marginDays: margin,
      useBy,
      estimate: { id: job.acceptedEstimateId, version },
      state,
      materials,
      skipped,
      flagged,
    };
  }
}

/** One INSERT for many rows. */
async function insertRows(m: EntityManager, into: string, rows: unknown[][]): Promise<void> {
  if (rows.length === 0) {
    return;
  }
  const values: unknown[] = [];
  const tuples = rows.map((row) => `(${row.map((v) => `$${values.push(v)}`).join(', ')})`);
  await m.query(`INSERT INTO ${into} VALUES ${tuples.join(', ')}`, values);
}
