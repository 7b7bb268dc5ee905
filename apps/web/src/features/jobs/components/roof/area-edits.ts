import { emptySide, fitSides, type AreaDraft, type PointDraft } from './roof-model';

// Changes to one area that keep its sides in step with its corners.

/** A corner added at the end: the old closing side is split in two new, unclassified sides. */
export function appendPoint(area: AreaDraft, point: PointDraft): AreaDraft {
  const points = [...area.points, point];
  const n = area.points.length;
  if (n < 3) {
    return { ...area, points, sides: fitSides({ ...area, points }) };
  }
  return { ...area, points, sides: [...area.sides.slice(0, n - 1), emptySide(), emptySide()] };
}

/** Corner i removed: the side from it goes, the side into it now runs on to the next corner. */
export function removePoint(area: AreaDraft, index: number): AreaDraft {
  const points = area.points.filter((_, i) => i !== index);
  if (points.length < 3) {
    return { ...area, points, sides: [] };
  }
  const sides = area.sides.filter((_, i) => i !== index);
  const before = (index - 1 + area.points.length) % area.points.length;
  const merged = before === area.points.length - 1 ? sides.length - 1 : before;
  const next = sides.map((s, i) => (i === merged ? emptySide() : s));
  return { ...area, points, sides: fitSides({ ...area, points, sides: next }) };
}

export function setPoint(area: AreaDraft, index: number, point: PointDraft): AreaDraft {
  return { ...area, points: area.points.map((p, i) => (i === index ? point : p)) };
}

/**
 * A rectangle becomes a polygon with its four corners (length along x, width along y), keeping the
 * kinds of its sides; a polygon becomes a rectangle with its first four sides' kinds.
 */
export function changeShape(area: AreaDraft, shape: AreaDraft['shape']): AreaDraft {
  if (shape === area.shape) {
    return area;
  }
  if (shape === 'polygon') {
    const l = area.lengthM.trim();
    const w = area.widthM.trim();
    const points =
      l !== '' && w !== ''
        ? [
            { x: '0', y: '0' },
            { x: l, y: '0' },
            { x: l, y: w },
            { x: '0', y: w },
          ]
        : [];
    const next = { ...area, shape, points };
    return {
      ...next,
      sides: points.length === 4 ? area.sides.slice(0, 4) : fitSides({ ...next, sides: [] }),
    };
  }
  const next = { ...area, shape };
  return { ...next, sides: fitSides(next) };
}
