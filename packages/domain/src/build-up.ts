import { Decimal, Numeric, nonNegative, positive, count } from './decimal';
import { DomainError } from './errors';
import { CatalystBand, DEFAULT_CATALYST_BANDS, checkCatalystBands } from './laying';
import { MaterialKind } from './materials';
import { EdgeKind, EDGE_KINDS } from './roof';
import { DEFAULT_MAT_LAP_M, DEFAULT_TRIM_LAP_M, DEFAULT_TRIM_LENGTH_M } from './takeoff';

/** Materials bought by weight, volume or length in packs of several sizes. Trims and outlets are bought by the piece. */
export type PackedMaterial = Exclude<MaterialKind, 'trim' | 'outlet' | 'other'>;

/** Pack sizes per material, in the unit of its estimate line (kg, L, m, each). */
export type PackSizes = Readonly<Partial<Record<PackedMaterial, readonly Numeric[]>>>;

/**
 * The layers and rates a roof is laid with (GLOSSARY "build-up"). Every rate is data: a company
 * keeps its own and estimateRoof merges it over DEFAULT_BUILD_UP.
 */
export interface BuildUp {
  /** mat weight, g/m² */
  matGsm: Numeric;
  /** layers of mat */
  layers: Numeric;
  /** width of a roll of mat, m */
  rollWidthM: Numeric;
  /** lap between runs of mat, m */
  lapM: Numeric;
  /** kg of resin per kg of glass */
  resinToGlass: Numeric;
  /** topcoat, kg/m² of laminated area */
  topcoatKgPerM2: Numeric;
  /** mat wastage, % */
  matWastagePct: Numeric;
  /** resin wastage, % (base resin, including the resin for bandage) */
  resinWastagePct: Numeric;
  /** length of one trim, m */
  trimLengthM: Numeric;
  /** lap of one trim over the next, m */
  trimLapM: Numeric;
  /** catalyst dose by air temperature */
  catalystBands: readonly CatalystBand[];
  /** upstand height laminated up a wall where a wall edge gives none, m */
  upstandM: Numeric;
  /** width of bandage tape, mm */
  bandageWidthMm: Numeric;
  /** weight of bandage tape, g/m² */
  bandageGsm: Numeric;
  /** bandage along every trim-to-deck junction, m per m of edge */
  bandageMPerEdgeM: Numeric;
  /** bandage over each joint between two trim lengths, m */
  bandageMPerTrimJoint: Numeric;
  /** bandage at each corner piece, m */
  bandageMPerCorner: Numeric;
  /** bandage round each pipe, m */
  bandageMPerPipe: Numeric;
  /** bandage round each outlet, m */
  bandageMPerOutlet: Numeric;
  /** extra base resin to dress each pipe, kg */
  extraResinKgPerPipe: Numeric;
  /** extra base resin to dress each outlet, kg */
  extraResinKgPerOutlet: Numeric;
  /** acetone for cleaning rollers and tools, L per m² laminated */
  acetoneLPerM2: Numeric;
  /** metres of trim one cartridge of trim adhesive fixes */
  adhesiveTrimMPerCartridge: Numeric;
  /** batten, m per m of edge, by edge kind */
  battenMPerEdgeM: Readonly<Record<EdgeKind, Numeric>>;
  /** clout nails per m of edge, by edge kind */
  nailsPerEdgeM: Readonly<Record<EdgeKind, Numeric>>;
  /** labour, hours per m² laminated (preparing, laminating, topcoat) */
  labourHoursPerM2: Numeric;
  /** labour, hours per m of trim (battens, trims, bandage) */
  labourHoursPerTrimM: Numeric;
  /** the pack sizes a material is bought in, in the unit of its estimate line */
  packSizes: PackSizes;
}

/** A build-up with only the rates that differ from DEFAULT_BUILD_UP; per-edge records merge by kind. */
export type BuildUpInput = Partial<Omit<BuildUp, 'battenMPerEdgeM' | 'nailsPerEdgeM'>> & {
  battenMPerEdgeM?: Partial<Record<EdgeKind, Numeric>>;
  nailsPerEdgeM?: Partial<Record<EdgeKind, Numeric>>;
};

/**
 * Trade-typical defaults. Labels from TRADE.md: [pub] published, [practice] common trade practice
 * (no source), [memory] from memory; "Potlife's own" marks an estimating rate of ours, to be tuned
 * by each company.
 */
export const DEFAULT_BUILD_UP: Readonly<BuildUp> = Object.freeze({
  /** 450 g/m² chopped strand mat, the most common on decks. [practice] */
  matGsm: 450,
  /** One layer of mat on the deck. [practice] */
  layers: 1,
  /** Rolls about 1.0–1.04 m wide; 1.0 m. [practice] */
  rollWidthM: 1,
  /** Runs of mat lap by about 50 mm. [practice] */
  lapM: DEFAULT_MAT_LAP_M,
  /** Resin-to-glass 2:1 to 3:1, 2.5:1 a usual default. [practice] */
  resinToGlass: 2.5,
  /** Topcoat 0.4–0.6 kg/m²; 0.5. [practice] */
  topcoatKgPerM2: 0.5,
  /** Mat wastage 10–15 %; 10 %. [practice] */
  matWastagePct: 10,
  /** Resin wastage 5–10 %; 10 %. [practice] */
  resinWastagePct: 10,
  /** 3 m trim lengths. [practice] */
  trimLengthM: DEFAULT_TRIM_LENGTH_M,
  /** Trims lap about 50 mm. [practice] */
  trimLapM: DEFAULT_TRIM_LAP_M,
  /** ~3 % cold, 2 % at 20 °C, ~1 % hot, within 1–4 %. [practice] */
  catalystBands: DEFAULT_CATALYST_BANDS,
  /** 150 mm upstand, the usual minimum height of an upstand. [memory] (BS 6229), verify. */
  upstandM: 0.15,
  /** Bandage tape 75, 100 or 150 mm wide; 100 mm. [practice] */
  bandageWidthMm: 100,
  /** Bandage of 450 g/m² mat. [practice] */
  bandageGsm: 450,
  /** One run of bandage along every trim-to-deck junction. Potlife's own, [practice] no source. */
  bandageMPerEdgeM: 1,
  /** 0.3 m of bandage over each trim joint. Potlife's own, [practice] no source. */
  bandageMPerTrimJoint: 0.3,
  /** 0.5 m of bandage at each corner piece. Potlife's own, [practice] no source. */
  bandageMPerCorner: 0.5,
  /** 1 m of bandage round each pipe. Potlife's own, [practice] no source. */
  bandageMPerPipe: 1,
  /** 1.5 m of bandage round each outlet. Potlife's own, [practice] no source. */
  bandageMPerOutlet: 1.5,
  /** 0.25 kg of base resin to dress each pipe. Potlife's own, [practice] no source. */
  extraResinKgPerPipe: 0.25,
  /** 0.5 kg of base resin to dress each outlet. Potlife's own, [practice] no source. */
  extraResinKgPerOutlet: 0.5,
  /** 0.05 L of acetone per m² for cleaning rollers and tools. Potlife's own, [practice] no source. */
  acetoneLPerM2: 0.05,
  /** One cartridge of trim adhesive per 6 m of trim. Potlife's own, [practice] no source. */
  adhesiveTrimMPerCartridge: 6,
  /** Drip trims on a double batten [practice, TRADE.md step 2]; kerb on one; none at walls and angles. Potlife's own. */
  battenMPerEdgeM: Object.freeze({ drip: 2, kerb: 1, wall: 0, angle: 0 }),
  /** Clout nails every 200 mm (5 per m) through drip, kerb and wall trims; angle trims are bedded. Potlife's own, [practice] no source. */
  nailsPerEdgeM: Object.freeze({ drip: 5, kerb: 5, wall: 5, angle: 0 }),
  /** 0.35 labour hours per m² laminated. Potlife's own, [practice] no source. */
  labourHoursPerM2: 0.35,
  /** 0.15 labour hours per m of trim. Potlife's own, [practice] no source. */
  labourHoursPerTrimM: 0.15,
  /** Packs: resin 5/10/20/25 kg, topcoat 5/10/20 kg, catalyst 0.5/1/5 kg. [practice] */
  packSizes: Object.freeze({
    'base-resin': Object.freeze([5, 10, 20, 25]),
    topcoat: Object.freeze([5, 10, 20]),
    catalyst: Object.freeze([0.5, 1, 5]),
  }),
});

type ResolvedPerEdge = Readonly<Record<EdgeKind, Decimal>>;

/** A build-up checked and in Decimals, as the costing engine uses it. */
export interface ResolvedBuildUp {
  matGsm: Decimal;
  layers: Decimal;
  rollWidthM: Decimal;
  lapM: Decimal;
  resinToGlass: Decimal;
  topcoatKgPerM2: Decimal;
  matWastagePct: Decimal;
  resinWastagePct: Decimal;
  trimLengthM: Decimal;
  trimLapM: Decimal;
  catalystBands: readonly CatalystBand[];
  upstandM: Decimal;
  bandageWidthMm: Decimal;
  bandageGsm: Decimal;
  bandageMPerEdgeM: Decimal;
  bandageMPerTrimJoint: Decimal;
  bandageMPerCorner: Decimal;
  bandageMPerPipe: Decimal;
  bandageMPerOutlet: Decimal;
  extraResinKgPerPipe: Decimal;
  extraResinKgPerOutlet: Decimal;
  acetoneLPerM2: Decimal;
  adhesiveTrimMPerCartridge: Decimal;
  battenMPerEdgeM: ResolvedPerEdge;
  nailsPerEdgeM: ResolvedPerEdge;
  labourHoursPerM2: Decimal;
  labourHoursPerTrimM: Decimal;
  packSizes: PackSizes;
}

function perEdge(
  base: Readonly<Record<EdgeKind, Numeric>>,
  over: Partial<Record<EdgeKind, Numeric>> | undefined,
  name: string,
): ResolvedPerEdge {
  const out = {} as Record<EdgeKind, Decimal>;
  for (const kind of EDGE_KINDS) {
    out[kind] = nonNegative(over?.[kind] ?? base[kind], `${name}.${kind}`);
  }
  return out;
}

/**
 * A partial build-up merged over DEFAULT_BUILD_UP, checked and turned into Decimals. Throws
 * DomainError naming the first bad rate. The API can call it to check a company's build-up on save.
 */
export function resolveBuildUp(input: BuildUpInput = {}): ResolvedBuildUp {
  const b = { ...DEFAULT_BUILD_UP, ...stripUndefined(input) };
  const layers = positive(b.layers, 'layers');
  count(layers, 'layers');
  const rollWidthM = positive(b.rollWidthM, 'rollWidthM');
  const lapM = nonNegative(b.lapM, 'lapM');
  if (lapM.gte(rollWidthM)) {
    throw new DomainError(`lapM (${lapM.toString()} m) must be narrower than rollWidthM (${rollWidthM.toString()} m).`);
  }
  const trimLengthM = positive(b.trimLengthM, 'trimLengthM');
  const trimLapM = nonNegative(b.trimLapM, 'trimLapM');
  if (trimLapM.gte(trimLengthM)) {
    throw new DomainError(`trimLapM (${trimLapM.toString()} m) must be shorter than trimLengthM (${trimLengthM.toString()} m).`);
  }
  checkCatalystBands(b.catalystBands);
  const packSizes = b.packSizes;
  for (const [kind, sizes] of Object.entries(packSizes)) {
    (sizes ?? []).forEach((s, i) => positive(s, `packSizes.${kind}[${i}]`));
  }
  return {
    matGsm: positive(b.matGsm, 'matGsm'),
    layers,
    rollWidthM,
    lapM,
    resinToGlass: positive(b.resinToGlass, 'resinToGlass'),
    topcoatKgPerM2: nonNegative(b.topcoatKgPerM2, 'topcoatKgPerM2'),
    matWastagePct: nonNegative(b.matWastagePct, 'matWastagePct'),
    resinWastagePct: nonNegative(b.resinWastagePct, 'resinWastagePct'),
    trimLengthM,
    trimLapM,
    catalystBands: b.catalystBands,
    upstandM: nonNegative(b.upstandM, 'upstandM'),
    bandageWidthMm: nonNegative(b.bandageWidthMm, 'bandageWidthMm'),
    bandageGsm: nonNegative(b.bandageGsm, 'bandageGsm'),
    bandageMPerEdgeM: nonNegative(b.bandageMPerEdgeM, 'bandageMPerEdgeM'),
    bandageMPerTrimJoint: nonNegative(b.bandageMPerTrimJoint, 'bandageMPerTrimJoint'),
    bandageMPerCorner: nonNegative(b.bandageMPerCorner, 'bandageMPerCorner'),
    bandageMPerPipe: nonNegative(b.bandageMPerPipe, 'bandageMPerPipe'),
    bandageMPerOutlet: nonNegative(b.bandageMPerOutlet, 'bandageMPerOutlet'),
    extraResinKgPerPipe: nonNegative(b.extraResinKgPerPipe, 'extraResinKgPerPipe'),
    extraResinKgPerOutlet: nonNegative(b.extraResinKgPerOutlet, 'extraResinKgPerOutlet'),
    acetoneLPerM2: nonNegative(b.acetoneLPerM2, 'acetoneLPerM2'),
    adhesiveTrimMPerCartridge: positive(b.adhesiveTrimMPerCartridge, 'adhesiveTrimMPerCartridge'),
    battenMPerEdgeM: perEdge(DEFAULT_BUILD_UP.battenMPerEdgeM, input.battenMPerEdgeM, 'battenMPerEdgeM'),
    nailsPerEdgeM: perEdge(DEFAULT_BUILD_UP.nailsPerEdgeM, input.nailsPerEdgeM, 'nailsPerEdgeM'),
    labourHoursPerM2: nonNegative(b.labourHoursPerM2, 'labourHoursPerM2'),
    labourHoursPerTrimM: nonNegative(b.labourHoursPerTrimM, 'labourHoursPerTrimM'),
    packSizes,
  };
}

/** `{ a: undefined }` should not wipe out a default. */
function stripUndefined<T extends object>(o: T): Partial<T> {
  return Object.fromEntries(Object.entries(o).filter(([, v]) => v !== undefined)) as Partial<T>;
}
