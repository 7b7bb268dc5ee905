import type { PlanPoint } from './plan-layout';
import type { EdgeStyle } from './edge-styles';

const HATCH_EVERY_PX = 9;
const HATCH_LENGTH_PX = 8;

interface EdgeLineProps {
  from: PlanPoint;
  to: PlanPoint;
  style: EdgeStyle;
  /** unit vector out of the area, in pixels' orientation (y down) */
  outward?: PlanPoint;
}

/** One edge in its kind's style; a wall gets short hatch strokes on its outer side. */
export function EdgeLine({ from, to, style, outward }: EdgeLineProps) {
  const dx = to.x - from.x;
  const dy = to.y - from.y;
  const length = Math.hypot(dx, dy);
  const hatches: PlanPoint[] = [];
  if (style.hatch && outward && length > 0) {
    const n = Math.floor(length / HATCH_EVERY_PX);
    for (let i = 1; i < n; i++) {
      hatches.push({ x: from.x + (dx * i) / n, y: from.y + (dy * i) / n });
    }
  }
  return (
    <g>
      <line
        x1={from.x}
        y1={from.y}
        x2={to.x}
        y2={to.y}
        stroke={style.colour}
        strokeWidth={style.width}
        strokeDasharray={style.dash}
        strokeLinecap={style.cap}
      />
      {outward
        ? hatches.map((p, i) => (
            <line
              key={i}
              x1={p.x}
              y1={p.y}
              // Slanted hatching, as walls are drawn on plans.
              x2={p.x + outward.x * HATCH_LENGTH_PX + (dx / length) * 4}
              y2={p.y + outward.y * HATCH_LENGTH_PX + (dy / length) * 4}
              stroke={style.colour}
              strokeWidth={1.4}
            />
          ))
        : null}
    </g>
  );
}
