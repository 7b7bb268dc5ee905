import { HttpStatus, Injectable, NotFoundException } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import {
  catalystPercent,
  cautionsFor,
  checkLayingConditions,
  Decimal,
  DomainError,
  Estimate as Takeoff,
  estimateRoof,
  LineRole,
  workingTimeHint,
} from '@potlife/domain';
import { DataSource, EntityManager } from 'typeorm';
import { BuildUpsService, toDomainBuildUp } from '../build-ups/build-ups.service';
import type { BuildUp } from '../build-ups/entities/build-up.entity';
import type { AuthUser } from '../common/current-user';
import { RuleViolation } from '../common/http-exception.filter';
import { CostingService, StockOffer } from '../costing/costing.service';
import {
  CreateEstimateDto,
  EstimateMaterialResponse,
  EstimateResponse,
  EstimateSummaryResponse,
  LayingCheckDto,
  LayingCheckResponse,
} from './dto/estimate.dto';
import { CostBasis, Estimate } from './entities/estimate.entity';
import { EstimateBundle, readEstimateVersion } from './estimate-read';
import { EstimateLine } from './entities/estimate-line.entity';
import { EstimateMaterial } from './entities/estimate-material.entity';
import { EstimatePack } from './entities/estimate-pack.entity';
import { Job } from './entities/job.entity';
import { JobsService } from './jobs.service';
import { ReservationsService } from './reservations/reservations.service';
import { toDomainRoof } from './roof/roof';

/** numeric columns come back padded ("25.000"); the API gives them plainly ("25"). */
export const plain = (v: string): string => new Decimal(v).toString();
const plainOrNull = (v: string | null): string | null => (v === null ? null : plain(v));

/** Today as YYYY-MM-DD in the server's zone. */
export const today = (): string => {
  const d = new Date();
  return `${d.getFullYear()}-${String(d.getMonth() + 1).padStart(2, '0')}-${String(d.getDate()).padStart(2, '0')}`;
};

/** A job's estimates can change until the crew starts. */
const ESTIMATING: readonly string[] = ['enquiry', 'quoted', 'won', 'scheduled'];

@Injectable()
export class EstimatesService {
  constructor(
    @InjectDataSource() private readonly db: DataSource,
    private readonly jobs: JobsService,
    private readonly buildUps: BuildUpsService,
    private readonly costing: CostingService,
    private readonly reservations: ReservationsService,
  ) {}

  /**
   * A new estimate version: estimateRoof(roof, build-up) from the domain, its lines mapped to
   * catalogue materials, packed with choosePacks and priced with priceEstimate (CostingService).
   * On stock cost, what the job could reserve for its date (ReservationsService.offeredLots, read
   * without locks) is costed at its lots' cost first; a job without a scheduled date is refused.
   */
  async create(user: AuthUser, jobId: string, dto: CreateEstimateDto): Promise<EstimateResponse> {
    const id = await this.db.transaction(async (m) => {
      const job = await this.jobs.find(user.companyId, jobId, m, true);
      if (!ESTIMATING.includes(job.status)) {
        throw new RuleViolation(`A ${job.status} job cannot be estimated again`, 'job_closed');
      }
      if (!job.roof) {
        throw new RuleViolation('Measure the roof first: PUT /api/jobs/{id}/roof', 'no_roof');
      }
      const buildUpId = dto.buildUpId ?? job.buildUpId;
      if (!buildUpId) {
        throw new RuleViolation(
          'Choose a build-up for the job (or give buildUpId) before estimating',
          'no_build_up',
        );
      }
      const costBasis: CostBasis = dto.costBasis ?? 'supplier';
      if (costBasis === 'stock' && !job.scheduledOn) {
        throw new RuleViolation(
          'Give the job a scheduled date first: an estimate on stock cost uses the stock the job could reserve for its date',
          'job_needs_date',
        );
      }
      const buildUp = await this.buildUps.find(user.companyId, buildUpId, m);
      return writeEstimate(m, this.costing, {
        costBasis,
        stock:
          costBasis === 'stock'
            ? (ids) => this.reservations.offeredLots(m, user.companyId, job, ids)
            : undefined,
        companyId: user.companyId,
        userId: user.id,
        job,
        buildUp,
        airC: dto.airC ?? '20',
        note: dto.note ?? null,
        chosen: new Map<LineRole, string>((dto.materials ?? []).map((c) => [c.role, c.materialId])),
      });
    });
    return this.respond(await this.bundle(user.companyId, id));
  }

  async list(user: AuthUser, jobId: string): Promise<EstimateSummaryResponse[]> {
    const job = await this.jobs.find(user.companyId, jobId);
    const rows: (Estimate & { creator: string | null })[] = (
      await this.db
        .getRepository(Estimate)
        .find({ where: { jobId: job.id, companyId: user.companyId }, order: { version: 'DESC' } })
    ).map((e) => Object.assign(e, { creator: null as string | null }));
    const creators = [...new Set(rows.map((e) => e.createdBy).filter((x): x is string => !!x))];
    if (creators.length) {
      const users: { id: string; name: string }[] = await this.db.query(
        `SELECT id, name FROM users WHERE id = ANY($1)`,
        [creators],
      );
      rows.forEach((e) => (e.creator = users.find((u) => u.id === e.createdBy)?.name ?? null));
    }
    return rows.map((e) => ({
      id: e.id,
      version: e.version,
      accepted: job.acceptedEstimateId === e.id,
      createdAt: e.createdAt.toISOString(),
      createdBy: e.createdBy ? { id: e.createdBy, name: e.creator ?? '' } : null,
      buildUpName: e.buildUpName,
      costBasis: e.costBasis,
      laminatedAreaM2: plain(e.laminatedAreaM2),
      net: plain(e.net),
      gross: plain(e.gross),
      unpriced: e.unpriced,
    }));
  }

  /** An estimate with its lines, materials and packs; 404 when the job or version is not the company's. */
  async bundle(
    companyId: string,
    estimateId: string,
    m: EntityManager = this.db.manager,
  ): Promise<EstimateBundle> {
    const estimate = await m.getRepository(Estimate).findOneBy({ id: estimateId, companyId });
    if (!estimate) {
      throw new NotFoundException('Estimate not found');
    }
    return this.bundleOf(estimate, m);
  }

  /** The rest of an estimate, read in parallel: lines, materials, packs, names and whether it is the accepted one. */
  async bundleOf(estimate: Estimate, m: EntityManager = this.db.manager): Promise<EstimateBundle> {
    const estimateId = estimate.id;
    const [lines, materials, packs, names, accepted] = await Promise.all([
      m.getRepository(EstimateLine).find({ where: { estimateId }, order: { position: 'ASC' } }),
      m.getRepository(EstimateMaterial).find({ where: { estimateId }, order: { position: 'ASC' } }),
      m
        .getRepository(EstimatePack)
        .createQueryBuilder('p')
        .innerJoin(EstimateMaterial, 'em', 'em.id = p.estimate_material_id')
        .where('em.estimate_id = :estimateId', { estimateId })
        .orderBy('p.source', 'ASC')
        .addOrderBy('p.packSize', 'DESC')
        .getMany(),
      m
        .query(
          `SELECT mt.id, mt.name FROM materials mt WHERE mt.id IN (SELECT material_id FROM estimate_lines WHERE estimate_id = $1)
           UNION ALL SELECT u.id, u.name FROM users u WHERE u.id = $2`,
          [estimateId, estimate.createdBy],
        )
        .then((rows: { id: string; name: string }[]) => new Map(rows.map((r) => [r.id, r.name]))),
      m
        .query(`SELECT accepted_estimate_id AS id FROM jobs WHERE id = $1`, [estimate.jobId])
        .then((rows: { id: string | null }[]) => rows[0]?.id === estimateId),
    ]);
    return {
      estimate,
      lines,
      materials: materials.map((x) =>
        Object.assign(x, { packs: packs.filter((p) => p.estimateMaterialId === x.id) }),
      ),
      names,
      accepted,
    };
  }

  async findVersion(
    companyId: string,
    jobId: string,
    version: number,
    m: EntityManager = this.db.manager,
  ): Promise<Estimate> {
    const e = await m.getRepository(Estimate).findOneBy({ companyId, jobId, version });
    if (!e) {
      throw new NotFoundException(`Estimate version ${version} not found for this job`);
    }
    return e;
  }

  /** One estimate version in one round trip (readEstimateVersion); 404 for another company's job. */
  async get(user: AuthUser, jobId: string, version: number): Promise<EstimateResponse> {
    const bundle = await readEstimateVersion(this.db.manager, user.companyId, jobId, version);
    if (!bundle) {
      await this.jobs.find(user.companyId, jobId); // "Job not found" when it is not the company's
      throw new NotFoundException(`Estimate version ${version} not found for this job`);
    }
    return this.respond(bundle);
  }

  /**
   * Makes a version the job's accepted estimate: the price of the quote and the basis for
   * reservations and the reconciliation. Refused while stock is reserved against another version.
   */
  async accept(
    user: AuthUser,
    jobId: string,
    version: number,
    beforeAccept?: (m: EntityManager, job: Job, e: Estimate) => Promise<void>,
  ): Promise<EstimateResponse> {
    const id = await this.db.transaction(async (m) => {
      const job = await this.jobs.find(user.companyId, jobId, m, true);
      if (!ESTIMATING.includes(job.status)) {
        throw new RuleViolation(`The estimate of a ${job.status} job can no longer change`, 'job_closed');
      }
      const e = await this.findVersion(user.companyId, job.id, version, m);
      if (beforeAccept) {
        await beforeAccept(m, job, e);
      }
      job.acceptedEstimateId = e.id;
      await m.getRepository(Job).save(job);
      e.acceptedAt = new Date();
      e.acceptedBy = user.id;
      await m.getRepository(Estimate).save(e);
      return e.id;
    });
    return this.respond(await this.bundle(user.companyId, id));
  }

  respond(b: EstimateBundle): EstimateResponse {
    const e = b.estimate;
    const materials: EstimateMaterialResponse[] = b.materials.map((x) => ({
      position: x.position,
      roles: x.roles,
      materialKind: x.materialKind,
      material: x.materialId ? { id: x.materialId, name: x.materialName ?? '' } : null,
      unit: x.stockUnit ?? '',
      quantity: plain(x.quantity),
      stockQuantity: plain(x.stockQuantity ?? '0'),
      packs: x.packs.map((p) => ({
        source: p.source ?? 'supplier',
        lot:
          p.source === 'stock' && p.lotId
            ? {
                id: p.lotId,
                batchNumber: p.batchNumber,
                unitCost: p.unitCost === null ? '0' : plain(p.unitCost),
              }
            : null,
        size: plain(p.packSize),
        label: p.label,
        count: p.count,
        packPrice: p.packPrice === null ? null : new Decimal(p.packPrice).toFixed(2),
        supplier: p.supplierId
          ? { id: p.supplierId, name: p.supplierName ?? '', leadTimeDays: p.leadTimeDays ?? 0 }
          : null,
        cost: p.cost === null ? null : new Decimal(p.cost).toFixed(2),
      })),
      packTotal: plainOrNull(x.packTotal),
      leftover: plainOrNull(x.leftover),
      cost: x.cost === null ? null : new Decimal(x.cost).toFixed(2),
      priced: x.cost !== null,
      problem: x.problem,
    }));
    const money = (v: string) => new Decimal(v).toFixed(2);
    return {
      id: e.id,
      jobId: e.jobId,
      version: e.version,
      accepted: b.accepted,
      acceptedAt: e.acceptedAt ? e.acceptedAt.toISOString() : null,
      createdAt: e.createdAt.toISOString(),
      createdBy: e.createdBy ? { id: e.createdBy, name: b.names.get(e.createdBy) ?? '' } : null,
      note: e.note,
      buildUp: {
        id: e.buildUpId,
        name: e.buildUpName,
        labourRate: money(e.labourRate),
        markupPct: plain(e.markupPct),
        vatRatePct: plain(e.vatRatePct),
      },
      pricedOn: e.pricedOn,
      costBasis: e.costBasis,
      airC: plain(e.airC),
      catalystPercent: plain(e.catalystPct),
      deckAreaM2: plain(e.deckAreaM2),
      upstandAreaM2: plain(e.upstandAreaM2),
      laminatedAreaM2: plain(e.laminatedAreaM2),
      trimM: plain(e.trimM),
      corners: { external: e.cornersExternal, internal: e.cornersInternal, derived: e.cornersDerived },
      pipes: e.pipes,
      outlets: e.outlets,
      lines: b.lines.map((l) => ({
        position: l.position,
        role: l.role,
        materialKind: l.materialKind,
        description: l.description,
        unit: l.unit,
        quantity: plain(l.quantity),
        lengths: l.lengths,
        metres: plainOrNull(l.metres),
        material: l.materialId ? { id: l.materialId, name: b.names.get(l.materialId) ?? '' } : null,
      })),
      materials,
      labour: {
        laminatingHours: plain(e.laminatingHours),
        trimHours: plain(e.trimHours),
        totalHours: plain(e.labourHours),
        rate: money(e.labourRate),
        cost: money(e.labourCost),
      },
      price: {
        materialCost: money(e.materialCost),
        labourCost: money(e.labourCost),
        markupPct: plain(e.markupPct),
        markup: money(e.markup),
        net: money(e.net),
        vatRatePct: plain(e.vatRatePct),
        vat: money(e.vat),
        gross: money(e.gross),
      },
      unpriced: e.unpriced,
      problems: materials.map((x) => x.problem).filter((x): x is string => x !== null),
      cautions: e.cautions,
    };
  }

  /** The laying check of the domain: fit to lay, the catalyst dose and a working-time hint. */
  layingCheck(dto: LayingCheckDto): LayingCheckResponse {
    const check = checkLayingConditions(dto);
    let dose: string | null = null;
    let hint: LayingCheckResponse['workingTime'] = null;
    try {
      dose = catalystPercent(dto.airC).toString();
      hint = workingTimeHint(dto.airC);
    } catch (e) {
      if (!(e instanceof DomainError && e.code === 'too-cold')) {
        throw e;
      }
    }
    return {
      ok: check.ok,
      problems: check.problems,
      dewPointC: check.dewPointC.toDecimalPlaces(1).toString(),
      catalystPercent: dose,
      workingTime: hint,
      cautions: cautionsFor(['base-resin', 'topcoat', 'catalyst', 'acetone']),
    };
  }
}

/** What writeEstimate needs: the job (with its roof) and the build-up, who and at what air temperature. */
export interface EstimateInput {
  companyId: string;
  userId: string;
  job: Job;
  buildUp: BuildUp;
  airC: string;
  note: string | null;
  chosen?: ReadonlyMap<LineRole, string>;
  /** supplier (the default) or stock; stock needs `stock`, the lots the job could take */
  costBasis?: CostBasis;
  stock?: StockOffer;
}

/**
 * A new estimate version in the caller's transaction (the routes and the demo seed): the domain's
 * estimateRoof, costed by CostingService, stored with its lines, materials and packs. The caller
 * holds the job's row lock, so versions never collide.
 */
export async function writeEstimate(
  m: EntityManager,
  costing: CostingService,
  input: EstimateInput,
): Promise<string> {
  const { companyId, userId, job, buildUp, airC, note } = input;
  const chosen = input.chosen ?? new Map<LineRole, string>();
  const costBasis: CostBasis = input.costBasis ?? 'supplier';
  if (costBasis === 'stock' && !input.stock) {
    throw new Error('An estimate on stock cost needs the lots the job could take');
  }
  if (!job.roof) {
    throw new RuleViolation('Measure the roof first: PUT /api/jobs/{id}/roof', 'no_roof');
  }
  let takeoff: Takeoff;
  try {
    takeoff = estimateRoof(toDomainRoof(job.roof, airC), toDomainBuildUp(buildUp.rates));
  } catch (e) {
    if (e instanceof DomainError) {
      throw new RuleViolation(
        e.message,
        e.code === 'too-cold' ? 'too_cold' : 'invalid_roof',
        HttpStatus.UNPROCESSABLE_ENTITY,
      );
    }
    throw e;
  }
  const pricedOn = today();
  const costed = await costing.costTakeoff(
    companyId,
    takeoff,
    {
      matGsm: buildUp.rates.matGsm,
      rollWidthM: buildUp.rates.rollWidthM,
      bandageWidthMm: buildUp.rates.bandageWidthMm,
      bandageGsm: buildUp.rates.bandageGsm,
      trimLengthM: buildUp.rates.trimLengthM,
      topcoatColour: job.topcoatColour,
    },
    { labourRate: buildUp.labourRate, markupPct: buildUp.markupPct, vatRatePct: buildUp.vatRatePct },
    pricedOn,
    chosen,
    m,
    costBasis === 'stock' ? input.stock : undefined,
  );
  const [{ next }] = (await m.query(
    `SELECT coalesce(max(version), 0) + 1 AS next FROM estimates WHERE job_id = $1`,
    [job.id],
  )) as [{ next: number }];
  const p = costed.price;
  const estimate = await m.getRepository(Estimate).save(
    m.getRepository(Estimate).create({
      companyId,
      jobId: job.id,
      version: next,
      buildUpId: buildUp.id,
      buildUpName: buildUp.name,
      buildUp: {
        rates: buildUp.rates,
        labourRate: buildUp.labourRate,
        markupPct: buildUp.markupPct,
        vatRatePct: buildUp.vatRatePct,
      },
      roof: job.roof,
      pricedOn,
      costBasis,
      airC: takeoff.airC.toString(),
      catalystPct: takeoff.catalystPercent.toString(),
      deckAreaM2: takeoff.deckAreaM2.toString(),
      upstandAreaM2: takeoff.upstandAreaM2.toString(),
      laminatedAreaM2: takeoff.laminatedAreaM2.toString(),
      trimM: takeoff.trimM.toString(),
      cornersExternal: takeoff.corners.external,
      cornersInternal: takeoff.corners.internal,
      cornersDerived: takeoff.corners.derived,
      pipes: takeoff.pipes,
      outlets: takeoff.outlets,
      laminatingHours: takeoff.labour.laminatingHours.toString(),
      trimHours: takeoff.labour.trimHours.toString(),
      labourHours: takeoff.labour.totalHours.toString(),
      labourRate: buildUp.labourRate,
      materialCost: p.materialCost.toString(),
      labourCost: p.labourCost.toString(),
      markupPct: buildUp.markupPct,
      markup: p.markup.toString(),
      net: p.net.toString(),
      vatRatePct: buildUp.vatRatePct,
      vat: p.vat.toString(),
      gross: p.gross.toString(),
      unpriced: costed.unpriced,
      cautions: takeoff.cautions,
      note,
      createdBy: userId,
      acceptedAt: null,
      acceptedBy: null,
    }),
  );
  await m.getRepository(EstimateLine).insert(
    takeoff.lines.map((l, i) => ({
      companyId,
      estimateId: estimate.id,
      position: i + 1,
      role: l.role,
      materialKind: l.material,
      description: l.description,
      unit: l.unit,
      quantity: l.quantity.toString(),
      lengths: l.lengths ?? null,
      metres: l.metres ? l.metres.toString() : null,
      materialId: costed.lineMaterials.get(l.role)?.id ?? null,
    })),
  );
  for (const [i, g] of costed.materials.entries()) {
    const row = await m.getRepository(EstimateMaterial).save({
      companyId,
      estimateId: estimate.id,
      position: i + 1,
      roles: g.roles,
      materialKind: g.materialKind,
      materialId: g.material?.id ?? null,
      materialName: g.material?.name ?? null,
      stockUnit: g.unit,
      quantity: g.quantity.toString(),
      stockQuantity: g.stockQuantity.toString(),
      packTotal: g.packTotal ? g.packTotal.toString() : null,
      leftover: g.leftover ? g.leftover.toString() : null,
      cost: g.cost ? g.cost.toString() : null,
      problem: g.problem,
    });
    if (g.packs.length > 0) {
      await m.getRepository(EstimatePack).insert(
        g.packs.map((pk) => ({
          companyId,
          estimateMaterialId: row.id,
          source: pk.source,
          lotId: pk.lot?.id ?? null,
          batchNumber: pk.lot?.batchNumber ?? null,
          unitCost: pk.lot ? pk.lot.unitCost.toString() : null,
          packSize: pk.size.toString(),
          label: pk.label,
          count: pk.count,
          packPrice: pk.lot ? (pk.cost as Decimal).toString() : (pk.price?.packPrice ?? null),
          supplierId: pk.price?.supplierId ?? null,
          supplierName: pk.price?.supplierName ?? null,
          leadTimeDays: pk.price?.leadTimeDays ?? null,
          cost: pk.cost ? pk.cost.toString() : null,
        })),
      );
    }
  }
  return estimate.id;
}
