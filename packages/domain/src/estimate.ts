import { BuildUpInput, ResolvedBuildUp, resolveBuildUp } from './build-up';
import { Caution, cautionsFor } from './cautions';
import { Decimal, Numeric, toDecimal, nonNegative, count, percentToFraction, ONE, ZERO } from './decimal';
import { DomainError, unexpected } from './errors';
import { polygonArea, rectangleArea } from './geometry';
import { catalystPercent } from './laying';
import { MaterialKind } from './materials';
import { EdgeKind, Roof, RoofArea, RoofEdge, EDGE_KINDS } from './roof';
import { gsmToKgPerM2, lengthsForRun, matAreaForDeck, resinForMat, TrimStep } from './takeoff';

/** Units of an estimate line. */
export type Unit = 'm2' | 'kg' | 'm' | 'L' | 'each';

/** What an estimate line is for. One line per role; roles with nothing to buy are left out. */
export type LineRole =
  | 'mat'
  | 'base-resin'
  | 'bandage-resin'
  | 'topcoat'
  | 'catalyst'
  | `trim:${EdgeKind}`
  | 'corner:external'
  | 'corner:internal'
  | 'outlet'
  | 'bandage'
  | 'acetone'
  | 'adhesive'
  | 'battens'
  | 'nails';

/** The material kind each line role is costed as: the catalogue kind its material must be. */
export const LINE_ROLE_KINDS: Readonly<Record<LineRole, MaterialKind>> = Object.freeze({
  mat: 'mat',
  'base-resin': 'base-resin',
  'bandage-resin': 'base-resin',
  topcoat: 'topcoat',
  catalyst: 'catalyst',
  'trim:drip': 'trim',
  'trim:kerb': 'trim',
  'trim:wall': 'trim',
  'trim:angle': 'trim',
  'corner:external': 'trim',
  'corner:internal': 'trim',
  outlet: 'outlet',
  bandage: 'bandage',
  acetone: 'acetone',
  adhesive: 'adhesive',
  battens: 'batten',
  nails: 'fixing',
});

/** One line of a take-off. Trim lines also give the number of `lengths` and the `metres` of edge they cover. */
export interface EstimateLine {
  role: LineRole;
  material: MaterialKind;
  description: string;
  unit: Unit;
  /** unrounded; round for display, never before pricing */
  quantity: Decimal;
  lengths?: number;
  metres?: Decimal;
}

export interface EstimateArea {
  name: string;
  shape: 'rectangle' | 'polygon';
  areaM2: Decimal;
}

/** The take-off of a roof (GLOSSARY "take-off"); priceEstimate turns it into a price. */
export interface Estimate {
  areas: EstimateArea[];
  deckAreaM2: Decimal;
  /** Σ wall-edge length × upstand height */
  upstandAreaM2: Decimal;
  /** deck + upstands: the area laminated and topcoated */
  laminatedAreaM2: Decimal;
  /** all edges, every one of them trimmed */
  trimM: Decimal;
  corners: { external: number; internal: number; derived: boolean };
  pipes: number;
  outlets: number;
  airC: Decimal;
  catalystPercent: Decimal;
  lines: EstimateLine[];
  labour: { laminatingHours: Decimal; trimHours: Decimal; totalHours: Decimal };
  cautions: Caution[];
}

/** Air temperature assumed for the catalyst dose when the roof gives none, 20 °C (issue 3). */
export const DEFAULT_ESTIMATE_AIR_C = 20;

const MM_PER_M = new Decimal(1000);

type MeasuredArea =
  | { shape: 'rectangle'; name: string; lengthM: Numeric; widthM: Numeric }
  | { shape: 'polygon'; name: string; polygon: Extract<RoofArea, { polygon: unknown }>['polygon'] };

function classify(area: RoofArea, index: number): MeasuredArea {
  if (area === null || typeof area !== 'object') {
    throw new DomainError(`Area ${index + 1} must be an object with lengthM and widthM, or a polygon.`);
  }
  const name = typeof area.name === 'string' && area.name.trim() !== '' ? area.name : `Area ${index + 1}`;
  const polygon = 'polygon' in area ? area.polygon : undefined;
  const rectangle = 'lengthM' in area || 'widthM' in area;
  if (polygon !== undefined && rectangle) {
    throw new DomainError(`${name}: give either lengthM and widthM or a polygon, not both.`);
  }
  if (polygon !== undefined) {
    return { shape: 'polygon', name, polygon };
  }
  if (!rectangle) {
    throw new DomainError(`${name}: give lengthM and widthM, or a polygon.`);
  }
  const r = area as Extract<RoofArea, { lengthM: unknown }>;
  return { shape: 'rectangle', name, lengthM: r.lengthM, widthM: r.widthM };
}

function measure(area: MeasuredArea): EstimateArea {
  switch (area.shape) {
    case 'rectangle':
      return { name: area.name, shape: area.shape, areaM2: rectangleArea(area.lengthM, area.widthM, area.name) };
    case 'polygon':
      try {
        return { name: area.name, shape: area.shape, areaM2: polygonArea(area.polygon) };
      } catch (e) {
        if (e instanceof DomainError) {
          throw new DomainError(`${area.name}: ${e.message}`, e.code);
        }
        throw e;
      }
    default:
      return unexpected('area shape', area);
  }
}

/** The name of an edge kind's trim. */
function edgeKindLabel(kind: EdgeKind): string {
  switch (kind) {
    case 'drip':
      return 'Drip trim';
    case 'kerb':
      return 'Kerb trim';
    case 'wall':
      return 'Wall trim';
    case 'angle':
      return 'Angle trim';
    default:
      return unexpected('edge kind', kind);
  }
}

/** Drip and kerb edges meet at external corners; walls and angles are cut in without a piece. */
function takesCornerPiece(kind: EdgeKind): boolean {
  switch (kind) {
    case 'drip':
    case 'kerb':
      return true;
    case 'wall':
    case 'angle':
      return false;
    default:
      return unexpected('edge kind', kind);
  }
}

/**
 * Corner pieces, when the roof does not give them: with the edges listed in order around the roof,
 * every pair of neighbouring edges (the last meeting the first) that both take a corner piece meets
 * at an external corner. Internal corners cannot be told from edges alone: give `corners.internal`
 * for an L-shaped roof.
 */
export function deriveCorners(edges: readonly Pick<RoofEdge, 'kind'>[]): { external: number; internal: number } {
  let external = 0;
  if (edges.length >= 2) {
    edges.forEach((edge, i) => {
      const next = edges[(i + 1) % edges.length] as Pick<RoofEdge, 'kind'>;
      if (takesCornerPiece(edge.kind) && takesCornerPiece(next.kind)) {
        external += 1;
      }
    });
  }
  return { external, internal: 0 };
}

function show(d: Decimal, places = 2): string {
  return d.toDecimalPlaces(places).toString();
}

/**
 * The take-off of a roof with a build-up merged over DEFAULT_BUILD_UP.
 * Laminated area = deck areas + Σ wall-edge length × upstand height. Lines:
 * - `mat` m²: matAreaForDeck on the laminated area, with layers, lap and mat wastage;
 * - `base-resin` kg: resinForMat on the mat m² before wastage, then the resin wastage;
 * - `bandage-resin` kg: base resin to wet the bandage, and to dress pipes and outlets, then the resin wastage;
 * - `topcoat` kg: laminated area × topcoat rate;
 * - `catalyst` kg: (base resin + bandage resin + topcoat) × catalystPercent(airC ?? 20) / 100;
 * - `trim:drip|kerb|wall|angle` lengths: trimLengthsForRun per edge (the same rule, its step worked out once);
 * - `corner:external|internal`, `outlet` pieces; `bandage` m; `acetone` L; `adhesive` cartridges;
 *   `battens` m; `nails` each — by the build-up's rates.
 * Labour hours = laminated area × labourHoursPerM2 + trim metres × labourHoursPerTrimM.
 */
export function estimateRoof(roof: Roof, buildUp: BuildUpInput = {}): Estimate {
  const b: ResolvedBuildUp = resolveBuildUp(buildUp);
  if (!roof || !Array.isArray(roof.areas) || roof.areas.length === 0) {
    throw new DomainError('A roof needs at least one area.');
  }
  const edges: readonly RoofEdge[] = roof.edges ?? [];
  if (!Array.isArray(roof.edges ?? [])) {
    throw new DomainError('The roof’s edges must be a list.');
  }

  const areas = roof.areas.map((a, i) => measure(classify(a, i)));
  const deckAreaM2 = areas.reduce((sum, a) => sum.plus(a.areaM2), ZERO);

  const trims = new Map<EdgeKind, { lengths: number; metres: Decimal }>(
    EDGE_KINDS.map((k) => [k, { lengths: 0, metres: ZERO }]),
  );
  const step = new TrimStep(b.trimLengthM, b.trimLapM);
  let upstandAreaM2 = ZERO;
  let joints = 0;
  edges.forEach((edge, i) => {
    const label = `edge ${i + 1}`;
    const kind = edge.kind;
    const t = trims.get(kind);
    if (t === undefined) {
      throw new DomainError(`The kind of ${label} must be drip, kerb, wall or angle (got ${JSON.stringify(kind)}).`);
    }
    const length = nonNegative(edge.lengthM, `lengthM of ${label}`);
    if (kind === 'wall') {
      const upstand = edge.upstandM === undefined ? b.upstandM : nonNegative(edge.upstandM, `upstandM of ${label}`);
      upstandAreaM2 = upstandAreaM2.plus(length.times(upstand));
    } else if (edge.upstandM !== undefined) {
      throw new DomainError(`${label} is a ${kind} edge: only wall edges have an upstand.`);
    }
    const n = lengthsForRun(length, step);
    t.lengths += n;
    t.metres = t.metres.plus(length);
    joints += Math.max(n - 1, 0);
  });
  // Per-m rates by edge kind, applied to each kind's metres.
  let trimM = ZERO;
  let battenM = ZERO;
  let nails = ZERO;
  for (const [kind, t] of trims) {
    trimM = trimM.plus(t.metres);
    battenM = battenM.plus(t.metres.times(b.battenMPerEdgeM[kind]));
    nails = nails.plus(t.metres.times(b.nailsPerEdgeM[kind]));
  }
  const laminatedAreaM2 = deckAreaM2.plus(upstandAreaM2);

  const given = roof.corners;
  const corners =
    given === undefined
      ? { ...deriveCorners(edges), derived: true }
      : {
          external: count(given.external ?? 0, 'corners.external'),
          internal: count(given.internal ?? 0, 'corners.internal'),
          derived: false,
        };
  const pipes = count(roof.pipes ?? 0, 'pipes');
  const outlets = count(roof.outlets ?? 0, 'outlets');
  const airC = toDecimal(roof.airC ?? DEFAULT_ESTIMATE_AIR_C, 'airC');

  const resinWaste = ONE.plus(percentToFraction(b.resinWastagePct));
  const matOpts = { rollWidthM: b.rollWidthM, lapM: b.lapM, layers: b.layers };
  const matBeforeWastage = matAreaForDeck(laminatedAreaM2, { ...matOpts, wastagePct: 0 });
  const mat = matAreaForDeck(laminatedAreaM2, { ...matOpts, wastagePct: b.matWastagePct });
  const baseResin = resinForMat(matBeforeWastage, b.matGsm, b.resinToGlass).times(resinWaste);

  const bandageM = trimM
    .times(b.bandageMPerEdgeM)
    .plus(b.bandageMPerTrimJoint.times(joints))
    .plus(b.bandageMPerCorner.times(corners.external + corners.internal))
    .plus(b.bandageMPerPipe.times(pipes))
    .plus(b.bandageMPerOutlet.times(outlets));
  const bandageM2 = bandageM.times(b.bandageWidthMm).div(MM_PER_M);
  const bandageResin = bandageM2
    .times(gsmToKgPerM2(b.bandageGsm))
    .times(b.resinToGlass)
    .plus(b.extraResinKgPerPipe.times(pipes))
    .plus(b.extraResinKgPerOutlet.times(outlets))
    .times(resinWaste);

  const topcoat = laminatedAreaM2.times(b.topcoatKgPerM2);
  const pct = catalystPercent(airC, b.catalystBands);
  const catalyst = baseResin.plus(bandageResin).plus(topcoat).times(percentToFraction(pct));
  const adhesive = trimM.div(b.adhesiveTrimMPerCartridge).ceil();

  const lines: EstimateLine[] = [];
  const add = (line: Omit<EstimateLine, 'material'>): void => {
    if (!line.quantity.isZero()) {
      lines.push({ ...line, material: LINE_ROLE_KINDS[line.role] });
    }
  };
  add({
    role: 'mat',
    unit: 'm2',
    quantity: mat,
    description: `${b.matGsm.toString()} g/m² chopped strand mat, ${b.layers.toString()} layer(s), ${b.rollWidthM.toString()} m rolls lapped ${b.lapM.times(MM_PER_M).toString()} mm, ${b.matWastagePct.toString()} % wastage`,
  });
  add({
    role: 'base-resin',
    unit: 'kg',
    quantity: baseResin,
    description: `Base resin at ${b.resinToGlass.toString()}:1 resin to glass, ${b.resinWastagePct.toString()} % wastage`,
  });
  add({
    role: 'bandage-resin',
    unit: 'kg',
    quantity: bandageResin,
    description: `Base resin for bandage and for dressing pipes and outlets, ${b.resinWastagePct.toString()} % wastage`,
  });
  add({
    role: 'topcoat',
    unit: 'kg',
    quantity: topcoat,
    description: `Topcoat at ${b.topcoatKgPerM2.toString()} kg/m² over ${show(laminatedAreaM2)} m²`,
  });
  add({
    role: 'catalyst',
    unit: 'kg',
    quantity: catalyst,
    description: `Catalyst at ${pct.toString()} % of resin and topcoat for ${airC.toString()} °C air`,
  });
  for (const kind of EDGE_KINDS) {
    const t = trims.get(kind) as { lengths: number; metres: Decimal };
    add({
      role: `trim:${kind}`,
      unit: 'each',
      quantity: new Decimal(t.lengths),
      lengths: t.lengths,
      metres: t.metres,
      description: `${edgeKindLabel(kind)}: ${t.lengths} × ${b.trimLengthM.toString()} m lengths for ${show(t.metres)} m of edge`,
    });
  }
  add({ role: 'corner:external', unit: 'each', quantity: new Decimal(corners.external), description: 'External corner pieces' });
  add({ role: 'corner:internal', unit: 'each', quantity: new Decimal(corners.internal), description: 'Internal corner pieces' });
  add({ role: 'outlet', unit: 'each', quantity: new Decimal(outlets), description: 'Outlet pieces' });
  add({
    role: 'bandage',
    unit: 'm',
    quantity: bandageM,
    description: `${b.bandageWidthMm.toString()} mm bandage over trim junctions and joints, corners, pipes and outlets`,
  });
  add({
    role: 'acetone',
    unit: 'L',
    quantity: laminatedAreaM2.times(b.acetoneLPerM2),
    description: 'Acetone for cleaning rollers and tools',
  });
  add({
    role: 'adhesive',
    unit: 'each',
    quantity: adhesive,
    description: `Trim adhesive, cartridges of one per ${b.adhesiveTrimMPerCartridge.toString()} m of trim`,
  });
  add({ role: 'battens', unit: 'm', quantity: battenM, description: 'Timber battens under the trims' });
  add({ role: 'nails', unit: 'each', quantity: nails.ceil(), description: 'Clout nails for the trims' });

  const laminatingHours = laminatedAreaM2.times(b.labourHoursPerM2);
  const trimHours = trimM.times(b.labourHoursPerTrimM);
  return {
    areas,
    deckAreaM2,
    upstandAreaM2,
    laminatedAreaM2,
    trimM,
    corners,
    pipes,
    outlets,
    airC,
    catalystPercent: pct,
    lines,
    labour: { laminatingHours, trimHours, totalHours: laminatingHours.plus(trimHours) },
    cautions: cautionsFor(lines.map((l) => l.material)),
  };
}
