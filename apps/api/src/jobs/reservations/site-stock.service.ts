import { BadRequestException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import {
  allocateFefo,
  cautionsFor,
  Decimal,
  FefoLot,
  lotUsableOn,
  MaterialKind,
  roundMoney,
} from '@potlife/domain';
import dayjs from 'dayjs';
import { DataSource, EntityManager } from 'typeorm';
import type { AuthUser } from '../../common/current-user';
import { RuleViolation } from '../../common/http-exception.filter';
import { IdempotencyService } from '../../stock/idempotency.service';
import { StockService } from '../../stock/stock.service';
import { Job, jobReference } from '../entities/job.entity';
import { JobsService } from '../jobs.service';
import {
  IssueDto,
  PickListCandidate,
  PickListPassedOver,
  PickListResponse,
  PickListUnreserved,
  ReconciliationMaterial,
  ReconciliationResponse,
  ReservationsResponse,
  ReturnDto,
  SiteMovementLine,
  SiteMovementResponse,
} from './reservation.dto';
import { ReservationsService } from './reservations.service';

const ZERO = new Decimal(0);
/** allocateFefo's stand-in expiry for a lot that never expires (as StockService.lockLotsForMaterial). */
const NO_EXPIRY = '9999-12-31';

/** Stock goes to site from won until the job is complete; it comes back until it is invoiced. */
const ISSUABLE: readonly string[] = ['won', 'scheduled', 'in-progress'];
const RETURNABLE: readonly string[] = ['scheduled', 'in-progress', 'complete'];

interface LockedLot {
  id: string;
  materialId: string;
  materialName: string;
  stockUnit: string;
  batchNumber: string | null;
  quantity: string;
  locationId: string;
  packSizes: { size: string; label: string }[];
}

/** The storeman's side of a job: the pick list, issues and returns; and the reconciliation. */
@Injectable()
export class SiteStockService {
  constructor(
    @InjectDataSource() private readonly db: DataSource,
    private readonly jobs: JobsService,
    private readonly reservations: ReservationsService,
    private readonly stock: StockService,
    private readonly idempotency: IdempotencyService,
  ) {}

  /** Locks the lots of the request in id order (the ledger's order), 404 for another company's. */
  private async lockLots(
    m: EntityManager,
    companyId: string,
    ids: string[],
  ): Promise<Map<string, LockedLot>> {
    const unique = [...new Set(ids)].sort();
    const rows: LockedLot[] = await m.query(
      `SELECT l.id, l.material_id AS "materialId", mt.name AS "materialName", mt.stock_unit AS "stockUnit", l.batch_number AS "batchNumber",
              l.quantity::text AS quantity, l.location_id AS "locationId", mt.pack_sizes AS "packSizes"
         FROM lots l JOIN materials mt ON mt.id = l.material_id
        WHERE l.company_id = $1 AND l.id = ANY($2) ORDER BY l.id FOR UPDATE OF l`,
      [companyId, unique],
    );
    if (rows.length !== unique.length) {
      throw new NotFoundException('Lot not found');
    }
    return new Map(rows.map((r) => [r.id, r]));
  }

  /**
   * Sends stock to the job: one issue movement per line through StockService (which refuses an
   * unusable lot or more than a location holds), never taking what other jobs hold; the job's own
   * reservations of the lot are consumed. Partial issues are fine. With an Idempotency-Key a
   * double-submitted form issues once.
   */
  issue(
    user: AuthUser,
    jobId: string,
    dto: IssueDto,
    key: string | undefined,
  ): Promise<SiteMovementResponse> {
    return this.idempotency.run(
      {
        companyId: user.companyId,
        userId: user.id,
        key,
        route: 'POST /api/jobs/{id}/issues',
        request: { jobId, ...dto },
      },
      async (m) => this.issueIn(m, user, await this.jobs.find(user.companyId, jobId, m, true), dto),
    );
  }

  /** The issue in the caller's transaction, the job's row already locked (the route, the demo seed). */
  async issueIn(
    m: EntityManager,
    user: Pick<AuthUser, 'companyId' | 'id'>,
    job: Job,
    dto: IssueDto,
  ): Promise<SiteMovementResponse> {
    if (!ISSUABLE.includes(job.status)) {
      throw new RuleViolation(
        `Stock cannot be issued to a ${job.status} job: issue to a job that is won, scheduled or in progress`,
        'job_cannot_issue',
      );
    }
    const lots = await this.lockLots(
      m,
      user.companyId,
      dto.lines.map((l) => l.lotId),
    );
    const others: { lotId: string; held: string; refs: string }[] = await m.query(
      `SELECT r.lot_id AS "lotId", sum(r.quantity - r.issued_quantity)::text AS held,
              string_agg(DISTINCT 'J-' || lpad(j.number::text, 4, '0'), ', ') AS refs
         FROM reservations r JOIN jobs j ON j.id = r.job_id
        WHERE r.status = 'held' AND r.lot_id = ANY($1) AND r.job_id <> $2 GROUP BY r.lot_id`,
      [[...lots.keys()], job.id],
    );
    const out = new Map<string, Decimal>();
    const lines: SiteMovementLine[] = [];
    const operationIds: string[] = [];
    const warnings: string[] = [];
    for (const [i, line] of dto.lines.entries()) {
      const lot = lots.get(line.lotId)!;
      const q = new Decimal(line.quantity);
      const other = others.find((o) => o.lotId === lot.id);
      const free = new Decimal(lot.quantity).minus(other?.held ?? 0).minus(out.get(lot.id) ?? ZERO);
      if (q.gt(free)) {
        throw new RuleViolation(
          `Line ${i + 1}: only ${Decimal.max(free, 0).toString()} ${lot.stockUnit} of ${lot.materialName}${lot.batchNumber ? `, batch ${lot.batchNumber}` : ''} may go to this job` +
            (other ? `; ${new Decimal(other.held).toString()} is reserved for ${other.refs}.` : '.'),
          'reserved_for_another_job',
        );
      }
      const from = line.fromLocationId ?? (await this.onlyPlace(m, user.companyId, lot, q, i));
      const res = await this.stock.issueToJob(m, user.companyId, user, {
        lotId: lot.id,
        quantity: q.toString(),
        jobId: job.id,
        fromLocationId: from,
        note: dto.note ?? undefined,
      });
      out.set(lot.id, (out.get(lot.id) ?? ZERO).plus(q));
      await this.consume(m, job.id, lot.id, q);
      operationIds.push(res.operationId);
      warnings.push(...res.warnings);
      const mv = res.movements[0]!;
      lines.push({
        movementId: mv.id,
        lotId: lot.id,
        batchNumber: lot.batchNumber,
        material: { id: lot.materialId, name: lot.materialName },
        unit: lot.stockUnit,
        quantity: q.toString(),
        locationId: mv.locationId,
        locationName: mv.locationName,
      });
    }
    return { jobId: job.id, operationIds, lines, warnings };
  }

  /** The one location a lot is at with enough of it; else the caller must say. */
  private async onlyPlace(
    m: EntityManager,
    companyId: string,
    lot: LockedLot,
    q: Decimal,
    i: number,
  ): Promise<string> {
    const [b] = await this.stock.lotBalances(m, companyId, [lot.id]);
    const places = (b?.places ?? []).filter((p) => new Decimal(p.quantity).gte(q));
    if (places.length === 1) {
      return places[0]!.locationId;
    }
    throw new BadRequestException({
      message: `lines.${i}.fromLocationId: ${lot.materialName}${lot.batchNumber ? `, batch ${lot.batchNumber}` : ''} is ${places.length ? 'in several places' : 'not in one place with that much'}: say where it is picked from`,
      code: 'validation_failed',
    });
  }

  /** Issuing from a lot uses up the job's holds on it, oldest first. */
  private async consume(m: EntityManager, jobId: string, lotId: string, q: Decimal): Promise<void> {
    let left = q;
    const rows: { id: string; held: string }[] = await m.query(
      `SELECT id, (quantity - issued_quantity)::text AS held FROM reservations
        WHERE job_id = $1 AND lot_id = $2 AND status = 'held' ORDER BY created_at, id FOR UPDATE`,
      [jobId, lotId],
    );
    for (const r of rows) {
      if (left.lte(0)) {
        break;
      }
      const take = Decimal.min(left, r.held);
      await m.query(
        `UPDATE reservations SET issued_quantity = issued_quantity + $2,
                status = CASE WHEN quantity - issued_quantity - $2 <= 0 THEN 'issued' ELSE 'held' END
          WHERE id = $1`,
        [r.id, take.toString()],
      );
      left = left.minus(take);
    }
  }

  /**
   * Brings stock back from the job into the same lot: full packs (counted, at the lot's pack size)
   * and a part-used pack weighed or measured, both as quantities of that lot, through
   * StockService (no more than the job has out of the lot).
   */
  return(
    user: AuthUser,
    jobId: string,
    dto: ReturnDto,
    key: string | undefined,
  ): Promise<SiteMovementResponse> {
    return this.idempotency.run(
      {
        companyId: user.companyId,
        userId: user.id,
        key,
        route: 'POST /api/jobs/{id}/returns',
        request: { jobId, ...dto },
      },
      async (m) => this.returnIn(m, user, await this.jobs.find(user.companyId, jobId, m, true), dto),
    );
  }

  /** The return in the caller's transaction, the job's row already locked (the route, the demo seed). */
  async returnIn(
    m: EntityManager,
    user: Pick<AuthUser, 'companyId' | 'id'>,
    job: Job,
    dto: ReturnDto,
  ): Promise<SiteMovementResponse> {
    if (!RETURNABLE.includes(job.status)) {
      throw new RuleViolation(`Stock cannot come back from a ${job.status} job`, 'job_cannot_return');
    }
    const lots = await this.lockLots(
      m,
      user.companyId,
      dto.lines.map((l) => l.lotId),
    );
    const lines: SiteMovementLine[] = [];
    const operationIds: string[] = [];
    const warnings: string[] = [];
    for (const [i, line] of dto.lines.entries()) {
      const lot = lots.get(line.lotId)!;
      const full = line.fullPacks ?? 0;
      const part = new Decimal(line.partQuantity ?? 0);
      const packSize = full > 0 ? await this.packSize(m, lot, i) : ZERO;
      const q = packSize.times(full).plus(part);
      if (q.lte(0)) {
        throw new BadRequestException({
          message: `lines.${i}: give fullPacks or partQuantity (more than 0)`,
          code: 'validation_failed',
        });
      }
      const note = [
        full > 0
          ? `${full} full pack${full === 1 ? '' : 's'} of ${packSize.toString()} ${lot.stockUnit}`
          : null,
        part.gt(0) ? `part-pack weighed back: ${part.toString()} ${lot.stockUnit}` : null,
        dto.note ?? null,
      ]
        .filter(Boolean)
        .join('; ');
      const res = await this.stock.returnFromJob(m, user.companyId, user, {
        lotId: lot.id,
        quantity: q.toString(),
        jobId: job.id,
        toLocationId: line.toLocationId ?? lot.locationId,
        note,
      });
      operationIds.push(res.operationId);
      warnings.push(...res.warnings);
      const mv = res.movements[0]!;
      lines.push({
        movementId: mv.id,
        lotId: lot.id,
        batchNumber: lot.batchNumber,
        material: { id: lot.materialId, name: lot.materialName },
        unit: lot.stockUnit,
        quantity: q.toString(),
        locationId: mv.locationId,
        locationName: mv.locationName,
        fullPacks: full,
        partQuantity: part.toString(),
      });
    }
    return { jobId: job.id, operationIds, lines, warnings };
  }

  /** The size of one pack of a lot: as it was received, else the material's only pack size. */
  private async packSize(m: EntityManager, lot: LockedLot, i: number): Promise<Decimal> {
    const [r] = (await m.query(
      `SELECT pack_size::text AS size FROM receipt_lines WHERE lot_id = $1 ORDER BY line_no LIMIT 1`,
      [lot.id],
    )) as { size: string }[];
    if (r) {
      return new Decimal(r.size);
    }
    if (lot.packSizes.length === 1) {
      return new Decimal(lot.packSizes[0]!.size);
    }
    throw new BadRequestException({
      message: `lines.${i}.fullPacks: the pack size of this lot is not known; give the quantity as partQuantity`,
      code: 'validation_failed',
    });
  }

  /** What the storeman sends, lot by lot and where it is, with the cautions for what is on it. No prices. */
  async pickList(user: AuthUser, jobId: string): Promise<PickListResponse> {
    const m = this.db.manager;
    const job = await this.jobs.find(user.companyId, jobId);
    const view = await this.reservations.view(user.companyId, job.id);
    const rows = (await this.reservations.heldRows(m, user.companyId, job.id)).filter(
      (r) => r.status === 'held',
    );
    const balances = await this.stock.lotBalances(
      m,
      user.companyId,
      rows.map((r) => r.lotId),
    );
    const locations: { id: string; name: string }[] = await m.query(
      `SELECT id, name FROM locations WHERE company_id = $1`,
      [user.companyId],
    );
    const materials: { id: string; code: string; name: string; kind: MaterialKind; stockUnit: string }[] =
      await m.query(
        `SELECT id, code, name, kind, stock_unit AS "stockUnit" FROM materials WHERE company_id = $1 AND id = ANY($2)`,
        [
          user.companyId,
          [...new Set([...rows.map((r) => r.materialId), ...view.materials.map((x) => x.material.id)])],
        ],
      );
    const mat = (id: string) => materials.find((x) => x.id === id)!;
    const lines = rows.map((r) => {
      const b = balances.find((x) => x.lotId === r.lotId);
      const material = mat(r.materialId);
      return {
        material: { id: material.id, code: material.code, name: material.name, kind: material.kind },
        unit: material.stockUnit,
        lot: { id: r.lotId, batchNumber: r.batchNumber, expiresOn: r.expiresOn },
        quantity: new Decimal(r.quantity).minus(r.issuedQuantity).toString(),
        places: (b?.places ?? []).map((p) => ({
          locationId: p.locationId,
          locationName: locations.find((l) => l.id === p.locationId)?.name ?? '',
          quantity: new Decimal(p.quantity).toString(),
        })),
        flags: this.reservations.flags(r, job.scheduledOn, view.marginDays),
      };
    });
    const moved: { materialId: string; issued: string; returned: string }[] = await m.query(
      `SELECT material_id AS "materialId", coalesce(-sum(quantity) FILTER (WHERE kind = 'issue'), 0)::text AS issued,
              coalesce(sum(quantity) FILTER (WHERE kind = 'return'), 0)::text AS returned
         FROM stock_movements WHERE company_id = $1 AND job_id = $2 GROUP BY material_id`,
      [user.companyId, job.id],
    );
    const movedNames: { id: string; name: string; stockUnit: string }[] = moved.length
      ? await m.query(`SELECT id, name, stock_unit AS "stockUnit" FROM materials WHERE id = ANY($1)`, [
          moved.map((x) => x.materialId),
        ])
      : [];
    const { useBy, unreserved } = await this.unreservedNeeds(m, user.companyId, job, view, locations);
    const kinds = new Set<MaterialKind>([
      ...lines.map((l) => l.material.kind),
      ...view.materials.map((x) => mat(x.material.id).kind),
    ]);
    return {
      jobId: job.id,
      reference: jobReference(job.number),
      title: job.title,
      siteAddress: job.siteAddress,
      jobDate: job.scheduledOn,
      crew: job.crew,
      lines,
      useBy,
      marginDays: view.marginDays,
      unreserved,
      issued: moved.map((x) => {
        const n = movedNames.find((y) => y.id === x.materialId);
        return {
          material: { id: x.materialId, name: n?.name ?? '' },
          unit: n?.stockUnit ?? '',
          issued: new Decimal(x.issued).toString(),
          returned: new Decimal(x.returned).toString(),
        };
      }),
      cautions: cautionsFor([...kinds]),
    };
  }

  /**
   * For each need that was not reserved, the lots that could go to the job now: what the domain's
   * allocateFefo would take from, in its order (usable: available and not exposure-flagged; in date
   * on the later of today and the job date + the owner's margin), each with its free quantity (on
   * hand less what other jobs hold and what this job's reserved lines hold: the issue route takes
   * no more than on hand less other jobs' holds) and places, and the FEFO suggestion for the
   * outstanding quantity marked. Lots it passes over that the storeman may wonder about (flagged,
   * expiring within the margin, all held for other jobs) are listed with why, not offered;
   * quarantined, written-off and expired ones are left out.
   */
  private async unreservedNeeds(
    m: EntityManager,
    companyId: string,
    job: Job,
    view: ReservationsResponse,
    locations: { id: string; name: string }[],
  ): Promise<{ useBy: string; unreserved: PickListUnreserved[] }> {
    const today = dayjs().format('YYYY-MM-DD');
    const from = job.scheduledOn && job.scheduledOn > today ? job.scheduledOn : today;
    const useBy = dayjs(from).add(view.marginDays, 'day').format('YYYY-MM-DD');
    const needs = view.materials.filter((x) => new Decimal(x.outstanding).gt(0));
    if (needs.length === 0) {
      return { useBy, unreserved: [] };
    }
    const lots: {
      id: string;
      materialId: string;
      batchNumber: string | null;
      expiresOn: string | null;
      status: string;
      exposureFlagged: boolean;
      quantity: string;
    }[] = await m.query(
      `SELECT id, material_id AS "materialId", batch_number AS "batchNumber", expires_on::text AS "expiresOn", status,
              exposure_flagged AS "exposureFlagged", quantity::text AS quantity
         FROM lots WHERE company_id = $1 AND material_id = ANY($2) AND quantity > 0
        ORDER BY coalesce(expires_on, 'infinity'::date), received_on, id`,
      [companyId, needs.map((x) => x.material.id)],
    );
    const ids = lots.map((l) => l.id);
    const [holds, balances] = await Promise.all([
      ids.length
        ? (m.query(
            `SELECT r.lot_id AS "lotId",
                    coalesce(sum(r.quantity - r.issued_quantity) FILTER (WHERE r.job_id <> $2), 0)::text AS others,
                    coalesce(sum(r.quantity - r.issued_quantity) FILTER (WHERE r.job_id = $2), 0)::text AS mine,
                    string_agg(DISTINCT 'J-' || lpad(j.number::text, 4, '0'), ', ') FILTER (WHERE r.job_id <> $2) AS refs
               FROM reservations r JOIN jobs j ON j.id = r.job_id
              WHERE r.status = 'held' AND r.lot_id = ANY($1) GROUP BY r.lot_id`,
            [ids, job.id],
          ) as Promise<{ lotId: string; others: string; mine: string; refs: string | null }[]>)
        : Promise.resolve([]),
      this.stock.lotBalances(m, companyId, ids),
    ]);
    const lotRef = (l: (typeof lots)[number]) => ({
      id: l.id,
      batchNumber: l.batchNumber,
      expiresOn: l.expiresOn,
    });
    const unreserved = needs.map((need): PickListUnreserved => {
      const mine = lots.filter((l) => l.materialId === need.material.id);
      const free = new Map(
        mine.map((l) => {
          const h = holds.find((x) => x.lotId === l.id);
          return [
            l.id,
            Decimal.max(ZERO, new Decimal(l.quantity).minus(h?.others ?? 0).minus(h?.mine ?? 0)),
          ];
        }),
      );
      const offered: FefoLot[] = mine.map((l) => ({
        id: l.id,
        quantity: free.get(l.id)!,
        expiresOn: l.expiresOn ?? NO_EXPIRY,
        usable: l.status === 'available' && !l.exposureFlagged,
      }));
      // Everything there is, taken FEFO: the candidates in the domain's order; then the suggestion.
      const everything = allocateFefo(
        offered,
        offered.reduce((s, o) => s.plus(o.quantity), ZERO),
        useBy,
      );
      const suggestion = allocateFefo(offered, need.outstanding, useBy);
      const candidates = everything.allocations.map((a): PickListCandidate => {
        const l = mine.find((x) => x.id === a.lotId)!;
        const s = suggestion.allocations.find((x) => x.lotId === a.lotId);
        return {
          lot: lotRef(l),
          onHand: new Decimal(l.quantity).toString(),
          free: a.quantity.toString(),
          suggested: s ? s.quantity.toString() : null,
          places: (balances.find((b) => b.lotId === l.id)?.places ?? []).map((p) => ({
            locationId: p.locationId,
            locationName: locations.find((x) => x.id === p.locationId)?.name ?? '',
            quantity: new Decimal(p.quantity).toString(),
          })),
        };
      });
      const passedOver: PickListPassedOver[] = [];
      for (const skip of everything.skipped) {
        const l = mine.find((x) => x.id === skip.lotId)!;
        const h = holds.find((x) => x.lotId === l.id);
        const flags: PickListPassedOver['flags'] = [];
        if (l.status !== 'available') {
          continue;
        }
        if (l.exposureFlagged) {
          flags.push({
            code: 'exposure-flagged',
            message:
              'Flagged “check before use” (stored outside its temperature range): it cannot be issued until the flag is cleared.',
          });
        }
        if (
          l.expiresOn &&
          !lotUsableOn({ expiresOn: l.expiresOn, usable: true }, useBy) &&
          lotUsableOn({ expiresOn: l.expiresOn, usable: true }, from)
        ) {
          flags.push({
            code: 'expires-within-margin',
            message: `Expires on ${l.expiresOn}, within the ${view.marginDays}-day margin after ${from === today ? 'today' : `the job date ${from}`}: not offered.`,
          });
        }
        if (free.get(l.id)!.isZero() && h?.refs) {
          flags.push({
            code: 'held-for-other-jobs',
            message: new Decimal(h.mine).gt(0)
              ? `All of it is reserved: for this job's reserved lines and for ${h.refs}.`
              : `All of it is reserved for ${h.refs}.`,
          });
        }
        if (flags.length > 0) {
          passedOver.push({ lot: lotRef(l), onHand: new Decimal(l.quantity).toString(), flags });
        }
      }
      return {
        material: need.material,
        unit: need.unit,
        quantity: need.outstanding,
        candidates,
        short: suggestion.shortfall.toString(),
        passedOver,
      };
    });
    return { useBy, unreserved };
  }

  /**
   * Estimated against issued, returned and used (issued − returned) per material, at the lots'
   * unit costs; margin = the accepted estimate's price − actual materials − labour.
   */
  async reconciliation(user: AuthUser, jobId: string): Promise<ReconciliationResponse> {
    const m = this.db.manager;
    const job = await this.jobs.find(user.companyId, jobId);
    const moved: {
      materialId: string;
      name: string;
      stockUnit: string;
      issued: string;
      returned: string;
      cost: string;
    }[] = await m.query(
      `SELECT sm.material_id AS "materialId", mt.name, mt.stock_unit AS "stockUnit",
              coalesce(-sum(sm.quantity) FILTER (WHERE sm.kind = 'issue'), 0)::text AS issued,
              coalesce(sum(sm.quantity) FILTER (WHERE sm.kind = 'return'), 0)::text AS returned,
              (-sum(sm.quantity * sm.unit_cost))::text AS cost
         FROM stock_movements sm JOIN materials mt ON mt.id = sm.material_id
        WHERE sm.company_id = $1 AND sm.job_id = $2 AND sm.kind IN ('issue', 'return')
        GROUP BY sm.material_id, mt.name, mt.stock_unit`,
      [user.companyId, job.id],
    );
    const estimate = job.acceptedEstimateId
      ? (
          (await m.query(
            `SELECT id, version, net::text, material_cost::text AS "materialCost", labour_cost::text AS "labourCost",
                    labour_hours::text AS "labourHours", labour_rate::text AS "labourRate" FROM estimates WHERE id = $1`,
            [job.acceptedEstimateId],
          )) as {
            id: string;
            version: number;
            net: string;
            materialCost: string;
            labourCost: string;
            labourHours: string;
            labourRate: string;
          }[]
        )[0]
      : undefined;
    const estimated: {
      materialId: string | null;
      materialName: string | null;
      roles: string[];
      unit: string | null;
      quantity: string;
      packTotal: string | null;
      cost: string | null;
    }[] = estimate
      ? await m.query(
          `SELECT material_id AS "materialId", material_name AS "materialName", roles, stock_unit AS unit, quantity::text AS quantity,
                    pack_total::text AS "packTotal", cost::text AS cost
               FROM estimate_materials WHERE estimate_id = $1 ORDER BY position`,
          [estimate.id],
        )
      : [];
    const materials: ReconciliationMaterial[] = [];
    let actual = ZERO;
    const line = (
      e: (typeof estimated)[number] | undefined,
      mv: (typeof moved)[number] | undefined,
    ): ReconciliationMaterial => {
      const issued = new Decimal(mv?.issued ?? 0);
      const returned = new Decimal(mv?.returned ?? 0);
      const used = issued.minus(returned);
      const cost = roundMoney(mv?.cost ?? 0);
      actual = actual.plus(cost);
      const estimatedQuantity = new Decimal(e?.quantity ?? 0);
      return {
        material: e?.materialId
          ? { id: e.materialId, name: e.materialName ?? '' }
          : mv
            ? { id: mv.materialId, name: mv.name }
            : null,
        roles: e?.roles ?? [],
        unit: e?.unit ?? mv?.stockUnit ?? '',
        estimatedQuantity: estimatedQuantity.toString(),
        estimatedPacks: e?.packTotal ? new Decimal(e.packTotal).toString() : null,
        estimatedCost: e?.cost ? new Decimal(e.cost).toFixed(2) : null,
        issued: issued.toString(),
        returned: returned.toString(),
        used: used.toString(),
        variance: used.minus(estimatedQuantity).toString(),
        actualCost: cost.toFixed(2),
      };
    };
    for (const e of estimated) {
      materials.push(
        line(
          e,
          moved.find((x) => x.materialId === e.materialId),
        ),
      );
    }
    for (const mv of moved.filter((x) => !estimated.some((e) => e.materialId === x.materialId))) {
      materials.push(line(undefined, mv));
    }
    const price = estimate ? new Decimal(estimate.net) : null;
    // Labour: the hours the crew recorded, at the accepted estimate's rate; the estimate's own
    // labour while nothing is recorded (labourBasis says which).
    const [{ hours: recordedText, entries }] = (await m.query(
      `SELECT coalesce(sum(hours), 0)::text AS hours, count(*)::int AS entries
         FROM job_labour_entries WHERE company_id = $1 AND job_id = $2 AND removed_at IS NULL`,
      [user.companyId, job.id],
    )) as [{ hours: string; entries: number }];
    const recordedHours = new Decimal(recordedText);
    const labourBasis: 'recorded' | 'estimate' = entries > 0 ? 'recorded' : 'estimate';
    const recordedCost = estimate ? roundMoney(recordedHours.times(estimate.labourRate)) : null;
    const labour = estimate
      ? labourBasis === 'recorded'
        ? recordedCost
        : new Decimal(estimate.labourCost)
      : null;
    const margin = price && labour ? price.minus(actual).minus(labour) : null;
    return {
      jobId: job.id,
      estimate: estimate ? { id: estimate.id, version: estimate.version } : null,
      materials,
      labour: {
        basis: labourBasis,
        estimatedHours: estimate ? new Decimal(estimate.labourHours).toString() : null,
        recordedHours: recordedHours.toString(),
        entries,
        rate: estimate ? new Decimal(estimate.labourRate).toFixed(2) : null,
        estimatedCost: estimate ? new Decimal(estimate.labourCost).toFixed(2) : null,
        recordedCost: recordedCost && entries > 0 ? recordedCost.toFixed(2) : null,
      },
      totals: {
        price: price ? price.toFixed(2) : null,
        estimatedMaterials: estimate ? new Decimal(estimate.materialCost).toFixed(2) : null,
        actualMaterials: actual.toFixed(2),
        labour: labour ? labour.toFixed(2) : null,
        labourBasis,
        margin: margin ? margin.toFixed(2) : null,
        marginPct:
          margin && price && price.gt(0) ? margin.div(price).times(100).toDecimalPlaces(1).toString() : null,
      },
    };
  }
}
