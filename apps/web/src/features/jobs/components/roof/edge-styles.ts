import type { EdgeKind } from '@potlife/domain';
import type { SideKind } from './roof-model';

// How each kind of edge is drawn on the plan and in its legend. Each kind differs in weight and
// dash as well as colour, so the plan reads in greyscale and for colour-blind eyes; walls also
// carry hatching on the outside, as a wall is drawn on a plan.

export interface EdgeStyle {
  label: string;
  /** what the kind means on site */
  hint: string;
  colour: string;
  width: number;
  dash?: string;
  hatch?: boolean;
  cap: 'butt' | 'round';
}

export const EDGE_STYLES: Record<EdgeKind | 'none' | 'unset', EdgeStyle> = {
  drip: {
    label: 'Drip',
    hint: 'eaves or gutter: water runs off here',
    colour: '#1864ab',
    width: 6,
    cap: 'butt',
  },
  kerb: {
    label: 'Kerb',
    hint: 'verge: a raised edge holds the water in',
    colour: '#c2410c',
    width: 4,
    dash: '12 6',
    cap: 'butt',
  },
  wall: {
    label: 'Wall',
    hint: 'abutment: laminated up the wall as an upstand',
    colour: '#5f3dc4',
    width: 3,
    hatch: true,
    cap: 'butt',
  },
  angle: {
    label: 'Angle',
    hint: 'internal angle trim',
    colour: '#2b8a3e',
    width: 4,
    dash: '1 7',
    cap: 'round',
  },
  none: {
    label: 'No trim',
    hint: 'meets another area',
    colour: '#868e96',
    width: 1.5,
    dash: '3 3',
    cap: 'butt',
  },
  unset: {
    label: 'Not classified yet',
    hint: 'choose its kind in the form',
    colour: '#e03131',
    width: 2,
    dash: '8 3 2 3',
    cap: 'butt',
  },
};

export function styleOf(kind: SideKind): EdgeStyle {
  if (kind === null) {
    return EDGE_STYLES.unset;
  }
  return EDGE_STYLES[kind];
}

export const SIDE_KIND_OPTIONS: { value: EdgeKind | 'none'; label: string }[] = [
  { value: 'drip', label: 'Drip' },
  { value: 'kerb', label: 'Kerb' },
  { value: 'wall', label: 'Wall (upstand)' },
  { value: 'angle', label: 'Angle' },
  { value: 'none', label: 'No trim' },
];

export const EDGE_KIND_OPTIONS: { value: EdgeKind; label: string }[] = [
  { value: 'drip', label: 'Drip' },
  { value: 'kerb', label: 'Kerb' },
  { value: 'wall', label: 'Wall (upstand)' },
  { value: 'angle', label: 'Angle' },
];
