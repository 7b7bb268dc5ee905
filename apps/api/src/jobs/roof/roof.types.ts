import type { EdgeKind } from '@potlife/domain';

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
