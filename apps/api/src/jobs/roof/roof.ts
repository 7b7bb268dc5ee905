import { HttpStatus } from '@nestjs/common';
import {
  BuildUpInput,
  checkFall,
  Decimal,
  DomainError,
  EDGE_KINDS,
  EdgeKind,
  estimateRoof,
  Estimate as Takeoff,
  FallResult,
  polygonArea,
  rectangleArea,
  Roof,
  RoofSummary,
  StoredArea,
  StoredRoof,
} from '@potlife/domain';
import { RuleViolation } from '../../common/http-exception.filter';
import { PutRoofDto } from './roof.dto';

/** A refusal of bad geometry: 422, pointing at the area or edge. */
export class RoofRefused extends RuleViolation {
  constructor(message: string) {
    super(message, 'invalid_roof', HttpStatus.UNPROCESSABLE_ENTITY);
  }
}

const areaLabel = (a: { name: string }, i: number) => `Area ${i + 1} (“${a.name}”)`;

/** The body of PUT /roof as stored: only the fields of each area's shape, decimals as strings. */
export function normaliseRoof(dto: PutRoofDto): StoredRoof {
  const areas: StoredArea[] = dto.areas.map((a, i) => {
    const fall = a.fall ? { riseMm: a.fall.riseMm, runM: a.fall.runM } : null;
    if (a.shape === 'rectangle') {
      if (a.points !== undefined) {
        throw new RoofRefused(`${areaLabel(a, i)} is a rectangle: give lengthM and widthM, not points.`);
      }
      return {
        name: a.name,
        shape: 'rectangle',
        lengthM: a.lengthM as string,
        widthM: a.widthM as string,
        fall,
      };
    }
    if (a.lengthM !== undefined || a.widthM !== undefined) {
      throw new RoofRefused(`${areaLabel(a, i)} is a polygon: give its points, not lengthM and widthM.`);
    }
    return { name: a.name, shape: 'polygon', points: a.points as [string, string][], fall };
  });
  const edges = dto.edges.map((e, i) => {
    if (e.areaIndex !== undefined && e.areaIndex !== null && e.areaIndex >= areas.length) {
      throw new RoofRefused(
        `Edge ${i + 1}: areaIndex ${e.areaIndex} is not an area of this roof (it has ${areas.length}).`,
      );
    }
    return {
      kind: e.kind,
      lengthM: e.lengthM,
      upstandM: e.upstandM ?? null,
      areaIndex: e.areaIndex ?? null,
      side: e.side ?? null,
      label: e.label ?? null,
    };
  });
  return {
    areas,
    edges,
    pipes: dto.pipes ?? 0,
    outlets: dto.outlets ?? 0,
    corners: dto.corners
      ? { external: dto.corners.external ?? 0, internal: dto.corners.internal ?? 0 }
      : null,
    notes: dto.notes ?? null,
  };
}

/** The stored roof as the costing engine takes it. */
export function toDomainRoof(roof: StoredRoof, airC?: string): Roof {
  return {
    areas: roof.areas.map((a) =>
      a.shape === 'rectangle'
        ? { name: a.name, lengthM: a.lengthM as string, widthM: a.widthM as string }
        : { name: a.name, polygon: (a.points ?? []) as [string, string][] },
    ),
    edges: roof.edges.map((e) =>
      e.upstandM === null
        ? { kind: e.kind, lengthM: e.lengthM }
        : { kind: e.kind, lengthM: e.lengthM, upstandM: e.upstandM },
    ),
    pipes: roof.pipes,
    outlets: roof.outlets,
    ...(roof.corners ? { corners: roof.corners } : {}),
    ...(airC !== undefined ? { airC } : {}),
  };
}

const MM_PER_M = 1000;

/**
 * Checks a roof with the domain (each area's polygonArea or rectangleArea, then estimateRoof for
 * the totals) and the falls with checkFall. Bad geometry throws RoofRefused naming the area.
 */
export function summariseRoof(roof: StoredRoof, buildUp: BuildUpInput): RoofSummary {
  roof.areas.forEach((a, i) => {
    try {
      if (a.shape === 'rectangle') {
        rectangleArea(a.lengthM as string, a.widthM as string, `“${a.name}”`);
      } else {
        polygonArea(a.points ?? []);
      }
    } catch (e) {
      if (e instanceof DomainError) {
        throw new RoofRefused(`${areaLabel(a, i)}: ${e.message}`);
      }
      throw e;
    }
  });
  let takeoff: Takeoff;
  try {
    takeoff = estimateRoof(toDomainRoof(roof), buildUp);
  } catch (e) {
    if (e instanceof DomainError) {
      throw new RoofRefused(e.message.replace(/^edge (\d+)/, 'Edge $1'));
    }
    throw e;
  }
  const falls: FallResult[] = [];
  const warnings: string[] = [];
  roof.areas.forEach((a, i) => {
    if (!a.fall) {
      return;
    }
    let check;
    try {
      check = checkFall(new Decimal(a.fall.riseMm), new Decimal(a.fall.runM).times(MM_PER_M));
    } catch (e) {
      if (e instanceof DomainError) {
        throw new RoofRefused(`${areaLabel(a, i)}, fall: ${e.message}`);
      }
      throw e;
    }
    const rise = new Decimal(a.fall.riseMm);
    const ratio = rise.isZero()
      ? 'level'
      : `1:${new Decimal(a.fall.runM).times(MM_PER_M).div(rise).toDecimalPlaces(0).toString()}`;
    falls.push({
      areaIndex: i,
      areaName: a.name,
      riseMm: a.fall.riseMm,
      runM: a.fall.runM,
      ratio,
      level: check.level,
      message: check.message,
    });
    if (check.level !== 'ok') {
      warnings.push(`${areaLabel(a, i)}: ${check.message}`);
    }
  });
  const trimMByKind = Object.fromEntries(EDGE_KINDS.map((k) => [k, '0'])) as Record<EdgeKind, string>;
  for (const line of takeoff.lines) {
    if (line.role.startsWith('trim:') && line.metres) {
      trimMByKind[line.role.slice(5) as EdgeKind] = line.metres.toString();
    }
  }
  return {
    areas: takeoff.areas.map((a, index) => ({
      index,
      name: roof.areas[index]?.name ?? a.name,
      shape: a.shape,
      areaM2: a.areaM2.toString(),
    })),
    deckAreaM2: takeoff.deckAreaM2.toString(),
    upstandAreaM2: takeoff.upstandAreaM2.toString(),
    laminatedAreaM2: takeoff.laminatedAreaM2.toString(),
    trimM: takeoff.trimM.toString(),
    trimMByKind,
    corners: takeoff.corners,
    pipes: takeoff.pipes,
    outlets: takeoff.outlets,
    falls,
    warnings,
  };
}
