import { HttpStatus, Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import {
  BuildUpInput,
  BuildUpRates,
  DEFAULT_BUILD_UP,
  DomainError,
  EDGE_KINDS,
  EdgeKind,
  resolveBuildUp,
  SCALAR_RATES,
} from '@potlife/domain';
import { EntityManager, QueryFailedError, Repository } from 'typeorm';
import { RuleViolation } from '../common/http-exception.filter';
import {
  BuildUpRatesDto,
  buildUpResponse,
  BuildUpResponse,
  CreateBuildUpDto,
  UpdateBuildUpDto,
} from './dto/build-up.dto';
import { BuildUp } from './entities/build-up.entity';

const perEdge = (
  r: Readonly<Record<EdgeKind, number | string | { toString(): string }>>,
): Record<EdgeKind, string> =>
  Object.fromEntries(EDGE_KINDS.map((k) => [k, String(r[k])])) as Record<EdgeKind, string>;

/** DEFAULT_BUILD_UP as stored rates (decimal strings). */
export function defaultRates(): BuildUpRates {
  const scalars = Object.fromEntries(SCALAR_RATES.map((k) => [k, String(DEFAULT_BUILD_UP[k])])) as Record<
    (typeof SCALAR_RATES)[number],
    string
  >;
  return {
    ...scalars,
    catalystBands: DEFAULT_BUILD_UP.catalystBands.map((b) => ({
      fromC: String(b.fromC),
      percent: String(b.percent),
    })),
    battenMPerEdgeM: perEdge(DEFAULT_BUILD_UP.battenMPerEdgeM),
    nailsPerEdgeM: perEdge(DEFAULT_BUILD_UP.nailsPerEdgeM),
  };
}

/** The stored rates as the costing engine takes them (pack sizes come from the catalogue). */
export function toDomainBuildUp(rates: BuildUpRates): BuildUpInput {
  return { ...rates, catalystBands: rates.catalystBands };
}

/** The rates given in a body laid over a base. */
function mergeRates(base: BuildUpRates, dto: BuildUpRatesDto): BuildUpRates {
  const out: BuildUpRates = {
    ...base,
    battenMPerEdgeM: { ...base.battenMPerEdgeM },
    nailsPerEdgeM: { ...base.nailsPerEdgeM },
  };
  for (const key of SCALAR_RATES) {
    const v = dto[key];
    if (v !== undefined) {
      out[key] = v;
    }
  }
  if (dto.catalystBands !== undefined) {
    out.catalystBands = dto.catalystBands.map((b) => ({ fromC: b.fromC, percent: b.percent }));
  }
  if (dto.battenMPerEdgeM !== undefined) {
    Object.assign(out.battenMPerEdgeM, dto.battenMPerEdgeM);
  }
  if (dto.nailsPerEdgeM !== undefined) {
    Object.assign(out.nailsPerEdgeM, dto.nailsPerEdgeM);
  }
  return out;
}

/** Checks rates with the domain's resolveBuildUp; a refusal answers 422 with its sentence. */
export function checkRates(rates: BuildUpRates): void {
  try {
    resolveBuildUp(toDomainBuildUp(rates));
  } catch (e) {
    if (e instanceof DomainError) {
      throw new RuleViolation(
        `This build-up cannot be used: ${e.message}`,
        'invalid_build_up',
        HttpStatus.UNPROCESSABLE_ENTITY,
      );
    }
    throw e;
  }
}

function nameTaken(e: unknown): boolean {
  return e instanceof QueryFailedError && (e as { code?: string }).code === '23505';
}

@Injectable()
export class BuildUpsService {
  constructor(@InjectRepository(BuildUp) private readonly buildUps: Repository<BuildUp>) {}

  async list(companyId: string, includeInactive: boolean): Promise<BuildUpResponse[]> {
    const rows = await this.buildUps.find({
      where: includeInactive ? { companyId } : { companyId, active: true },
      order: { name: 'ASC' },
    });
    return rows.map(buildUpResponse);
  }

  /** A build-up of the company, or 404. */
  async find(companyId: string, id: string, manager?: EntityManager): Promise<BuildUp> {
    const repo = manager ? manager.getRepository(BuildUp) : this.buildUps;
    const b = await repo.findOneBy({ id, companyId });
    if (!b) {
      throw new NotFoundException('Build-up not found');
    }
    return b;
  }

  async get(companyId: string, id: string): Promise<BuildUpResponse> {
    return buildUpResponse(await this.find(companyId, id));
  }

  async create(companyId: string, dto: CreateBuildUpDto): Promise<BuildUpResponse> {
    const rates = mergeRates(defaultRates(), dto);
    checkRates(rates);
    try {
      const saved = await this.buildUps.save(
        this.buildUps.create({
          companyId,
          name: dto.name,
          description: dto.description ?? null,
          rates,
          labourRate: dto.labourRate,
          markupPct: dto.markupPct,
          vatRatePct: dto.vatRatePct ?? '20',
          active: true,
        }),
      );
      return buildUpResponse(saved);
    } catch (e) {
      if (nameTaken(e)) {
        throw new RuleViolation(`There is already a build-up called “${dto.name}”`, 'build_up_name_taken');
      }
      throw e;
    }
  }

  async update(companyId: string, id: string, dto: UpdateBuildUpDto): Promise<BuildUpResponse> {
    const b = await this.find(companyId, id);
    const rates = mergeRates(b.rates, dto);
    checkRates(rates);
    b.rates = rates;
    if (dto.name !== undefined) {
      b.name = dto.name;
    }
    if (dto.description !== undefined) {
      b.description = dto.description ?? null;
    }
    if (dto.labourRate !== undefined) {
      b.labourRate = dto.labourRate;
    }
    if (dto.markupPct !== undefined) {
      b.markupPct = dto.markupPct;
    }
    if (dto.vatRatePct !== undefined) {
      b.vatRatePct = dto.vatRatePct;
    }
    if (dto.active !== undefined) {
      b.active = dto.active;
    }
    try {
      await this.buildUps.save(b);
    } catch (e) {
      if (nameTaken(e)) {
        throw new RuleViolation(`There is already a build-up called “${b.name}”`, 'build_up_name_taken');
      }
      throw e;
    }
    return this.get(companyId, id);
  }
}
