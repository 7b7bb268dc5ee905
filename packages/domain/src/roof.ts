import { Numeric } from './decimal';
import { Point } from './geometry';

/** The kinds of edge along a roof's border (GLOSSARY "edge"). */
export type EdgeKind = 'drip' | 'kerb' | 'wall' | 'angle';

export const EDGE_KINDS: readonly EdgeKind[] = Object.freeze(['drip', 'kerb', 'wall', 'angle']);

/** A rectangular area, measured in metres. */
export interface RectangleArea {
  name: string;
  lengthM: Numeric;
  widthM: Numeric;
}

/** An area drawn as a simple polygon, corners [x, y] in metres. */
export interface PolygonArea {
  name: string;
  polygon: readonly Point[];
}

/** One flat part of a roof: a rectangle or a polygon (GLOSSARY "area"). */
export type RoofArea = RectangleArea | PolygonArea;

/** A run along the roof's border. `upstandM`, for wall edges only, is the height laminated up the wall. */
export interface RoofEdge {
  kind: EdgeKind;
  lengthM: Numeric;
  upstandM?: Numeric;
}

/**
 * The measured roof of a job (GLOSSARY "roof"). Edges are best listed in order around the roof:
 * corner pieces are then derived from them unless `corners` is given. `airC` is the expected air
 * temperature on the day, for the catalyst dose.
 */
export interface Roof {
  areas: readonly RoofArea[];
  edges: readonly RoofEdge[];
  pipes?: Numeric;
  outlets?: Numeric;
  airC?: Numeric;
  corners?: { external?: Numeric; internal?: Numeric };
}
