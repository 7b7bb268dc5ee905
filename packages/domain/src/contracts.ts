import type { BuildUp } from './build-up';
import type { EdgeKind } from './roof';

// Shapes that cross the wire between the API and the web app (and are stored as jsonb): every
// quantity a decimal string. One definition for both sides; the domain's own types (Roof,
// BuildUp) hold decimals and are what the rules compute with.

/** A fall measured on an area: `riseMm` over `runM`, for the BS 6229 check. */
export interface StoredFall {
  riseMm: string;
  runM: string;
}

/** One area as stored on the job: a rectangle (lengthM × widthM) or a polygon of [x, y] corners in metres. */
export interface StoredArea {
  name: string;
  shape: 'rectangle' | 'polygon';
  lengthM?: string;
  widthM?: string;
  points?: [string, string][];
  fall: StoredFall | null;
}

/**
 * One edge: its kind and length; `upstandM` for a wall; `areaIndex` and `side` (0-based) say which
 * side of which area it runs along, when it came from a drawn polygon.
 */
export interface StoredEdge {
  kind: EdgeKind;
  lengthM: string;
  upstandM: string | null;
  areaIndex: number | null;
  side: number | null;
  label: string | null;
}

/** The roof of a job as the estimator measured it (jsonb on the job). */
export interface StoredRoof {
  areas: StoredArea[];
  edges: StoredEdge[];
  pipes: number;
  outlets: number;
  /** given corner pieces; null means derive external corners from the order of the edges */
  corners: { external: number; internal: number } | null;
  notes: string | null;
}

/** The BS 6229 fall check of one area, as the roof summary gives it. */
export interface FallResult {
  areaIndex: number;
  areaName: string;
  riseMm: string;
  runM: string;
  /** "1:40" */
  ratio: string;
  level: 'ok' | 'warning' | 'error';
  message: string;
}

/** A roof's totals from the domain, as `GET`/`PUT /api/jobs/:id/roof` answer them. */
export interface RoofSummary {
  areas: { index: number; name: string; shape: 'rectangle' | 'polygon'; areaM2: string }[];
  deckAreaM2: string;
  upstandAreaM2: string;
  laminatedAreaM2: string;
  trimM: string;
  trimMByKind: Record<EdgeKind, string>;
  corners: { external: number; internal: number; derived: boolean };
  pipes: number;
  outlets: number;
  falls: FallResult[];
  /** sentences for the estimator: fall warnings and errors, areas without a fall */
  warnings: string[];
}

/** The scalar rates of a build-up (the domain's `BuildUp`), each a decimal string when stored or sent. */
export const SCALAR_RATES = Object.freeze([
  'matGsm',
  'layers',
  'rollWidthM',
  'lapM',
  'resinToGlass',
  'topcoatKgPerM2',
  'matWastagePct',
  'resinWastagePct',
  'trimLengthM',
  'trimLapM',
  'upstandM',
  'bandageWidthMm',
  'bandageGsm',
  'bandageMPerEdgeM',
  'bandageMPerTrimJoint',
  'bandageMPerCorner',
  'bandageMPerPipe',
  'bandageMPerOutlet',
  'extraResinKgPerPipe',
  'extraResinKgPerOutlet',
  'acetoneLPerM2',
  'adhesiveTrimMPerCartridge',
  'labourHoursPerM2',
  'labourHoursPerTrimM',
] as const satisfies readonly (keyof BuildUp)[]);
export type ScalarRate = (typeof SCALAR_RATES)[number];

/** Every rate of the costing engine except pack sizes (which come from the catalogue), as stored and sent. */
export type BuildUpRates = Record<ScalarRate, string> & {
  catalystBands: { fromC: string; percent: string }[];
  battenMPerEdgeM: Record<EdgeKind, string>;
  nailsPerEdgeM: Record<EdgeKind, string>;
};
