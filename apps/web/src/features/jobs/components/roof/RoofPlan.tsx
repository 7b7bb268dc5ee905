import { Box, Group, Paper, Stack, Text } from '@mantine/core';
import { useRef, useState, type MouseEvent } from 'react';
import { EdgeLine } from './EdgeLine';
import { EDGE_STYLES, styleOf, type EdgeStyle } from './edge-styles';
import { layOut, scaleBarMetres, viewport, type Bounds, type PlanPoint } from './plan-layout';
import { snapToGrid, type PointDraft, type RoofDraft, type RoofPreview } from './roof-model';
import { formatArea, formatLength } from '../../utils/format';

export interface DrawingState {
  areaKey: string;
  /** grid step, m, as a decimal string */
  step: string;
}

interface RoofPlanProps {
  draft: RoofDraft;
  preview: RoofPreview;
  drawing?: DrawingState | null;
  /** a grid point clicked while drawing */
  onAddPoint?: (point: PointDraft) => void;
  /** the area whose card is being edited, drawn a little stronger */
  focusedAreaKey?: string | null;
}

const DRAWING_CANVAS: Bounds = { minX: 0, minY: 0, maxX: 16, maxY: 10 };
const EMPTY_CANVAS: Bounds = { minX: 0, minY: 0, maxX: 10, maxY: 6 };

function gridStepFor(scale: number): number {
  for (const step of [0.5, 1, 2, 5, 10]) {
    if (step * scale >= 14) {
      return step;
    }
  }
  return 20;
}

function range(from: number, to: number, step: number): number[] {
  const out: number[] = [];
  for (let v = Math.ceil(from / step) * step; v <= to + 1e-9; v += step) {
    out.push(Math.round(v * 1000) / 1000);
  }
  return out;
}

/** A short sample of an edge style, for the legend. */
export function EdgeSample({ style }: { style: EdgeStyle }) {
  return (
    <svg width={44} height={18} aria-hidden focusable="false">
      <EdgeLine from={{ x: 4, y: 7 }} to={{ x: 40, y: 7 }} style={style} outward={{ x: 0, y: 1 }} />
    </svg>
  );
}

/** The roof to scale: each area with its dimensions, each edge in its kind's style, problems where they are. */
export function RoofPlan({
  draft,
  preview,
  drawing = null,
  onAddPoint,
  focusedAreaKey = null,
}: RoofPlanProps) {
  const svgRef = useRef<SVGSVGElement>(null);
  const [hover, setHover] = useState<PointDraft | null>(null);
  const plan = layOut(draft.areas);
  const view = viewport(plan.bounds, drawing ? DRAWING_CANVAS : (plan.bounds ?? EMPTY_CANVAS));
  const { bounds, scale } = view;
  // While drawing, the grid lines are the snapping step when they are far enough apart to click.
  const step = drawing ? Number(drawing.step) : 0;
  const grid = drawing && step * scale >= 10 ? step : gridStepFor(scale);
  const xs = range(bounds.minX, bounds.maxX, grid);
  const ys = range(bounds.minY, bounds.maxY, grid);
  const labelEvery = grid * Math.max(1, Math.ceil(40 / (grid * scale)));
  const bar = scaleBarMetres(bounds.maxX - bounds.minX);

  const drawingArea = drawing ? draft.areas.find((a) => a.key === drawing.areaKey) : undefined;

  const metresAt = (event: MouseEvent<SVGSVGElement>): PlanPoint | null => {
    const svg = svgRef.current;
    const ctm = svg?.getScreenCTM();
    if (!svg || !ctm) {
      return null;
    }
    const p = new DOMPoint(event.clientX, event.clientY).matrixTransform(ctm.inverse());
    return view.toMetres({ x: p.x, y: p.y });
  };

  const onClick = (event: MouseEvent<SVGSVGElement>) => {
    if (!drawing || !onAddPoint) {
      return;
    }
    const m = metresAt(event);
    if (m) {
      onAddPoint(snapToGrid(m.x, m.y, drawing.step));
    }
  };

  const onMove = (event: MouseEvent<SVGSVGElement>) => {
    if (!drawing) {
      return;
    }
    const m = metresAt(event);
    setHover(m ? snapToGrid(m.x, m.y, drawing.step) : null);
  };

  const summary = plan.areas
    .map((a) => {
      const m2 = preview.areas[a.index]?.areaM2;
      return `${a.name}${m2 ? ` ${formatArea(m2)}` : ''}`;
    })
    .join(', ');

  return (
    <Stack gap="sm">
      <Paper withBorder radius="md" p={0} style={{ overflow: 'hidden' }} bg="white">
        <svg
          ref={svgRef}
          viewBox={`0 0 ${view.width} ${view.height}`}
          width="100%"
          role="img"
          aria-label={`Roof plan${summary ? `: ${summary}` : ''}`}
          data-testid="roof-plan"
          style={{ display: 'block', cursor: drawing ? 'crosshair' : 'default', touchAction: 'manipulation' }}
          onClick={onClick}
          onMouseMove={onMove}
          onMouseLeave={() => setHover(null)}
        >
          <defs>
            <pattern
              id="plan-problem"
              width="8"
              height="8"
              patternUnits="userSpaceOnUse"
              patternTransform="rotate(45)"
            >
              <rect width="8" height="8" fill="#fff5f5" />
              <line x1="0" y1="0" x2="0" y2="8" stroke="#ffa8a8" strokeWidth="3" />
            </pattern>
          </defs>
          {/* The grid, a metre (or the drawing step) apart, numbered along the edges. */}
          <g aria-hidden>
            {xs.map((x) => {
              const p = view.toPx({ x, y: bounds.minY });
              const q = view.toPx({ x, y: bounds.maxY });
              const major = Math.abs(x / labelEvery - Math.round(x / labelEvery)) < 1e-6;
              return (
                <g key={`x${x}`}>
                  <line
                    x1={p.x}
                    y1={p.y + 12}
                    x2={q.x}
                    y2={q.y - 12}
                    stroke={major ? '#dee2e6' : '#f1f3f5'}
                    strokeWidth={1}
                  />
                  {major ? (
                    <text x={p.x} y={p.y + 40} fontSize={10} textAnchor="middle" fill="#868e96">
                      {x}
                    </text>
                  ) : null}
                </g>
              );
            })}
            {ys.map((y) => {
              const p = view.toPx({ x: bounds.minX, y });
              const q = view.toPx({ x: bounds.maxX, y });
              const major = Math.abs(y / labelEvery - Math.round(y / labelEvery)) < 1e-6;
              return (
                <g key={`y${y}`}>
                  <line
                    x1={p.x - 12}
                    y1={p.y}
                    x2={q.x + 12}
                    y2={q.y}
                    stroke={major ? '#dee2e6' : '#f1f3f5'}
                    strokeWidth={1}
                  />
                  {major ? (
                    <text x={p.x - 38} y={p.y + 3} fontSize={10} textAnchor="end" fill="#868e96">
                      {y}
                    </text>
                  ) : null}
                </g>
              );
            })}
          </g>

          {plan.areas.map((area) => {
            const check = preview.areas[area.index];
            const bad = !!check?.problem;
            const px = area.outline.map(view.toPx);
            const focused = area.key === focusedAreaKey;
            const labelAt = view.toPx(area.centre);
            return (
              <g
                key={area.key}
                data-testid={`plan-area-${area.index + 1}`}
                data-problem={bad ? 'true' : undefined}
              >
                {px.length >= 3 ? (
                  <polygon
                    points={px.map((p) => `${p.x},${p.y}`).join(' ')}
                    fill={bad ? 'url(#plan-problem)' : focused ? '#fff5e8' : '#f3f5f5'}
                    stroke={bad ? '#e03131' : 'none'}
                    strokeWidth={bad ? 1.5 : 0}
                  />
                ) : null}
                {area.sides.map((side) => {
                  const from = view.toPx(side.from);
                  const to = view.toPx(side.to);
                  const outward = { x: side.outward.x, y: -side.outward.y };
                  // Clear of a wall's hatching.
                  const off = side.kind === 'wall' ? 28 : 16;
                  const mid = {
                    x: (from.x + to.x) / 2 + outward.x * off,
                    y: (from.y + to.y) / 2 + outward.y * off,
                  };
                  return (
                    <g key={side.index}>
                      <EdgeLine from={from} to={to} style={styleOf(side.kind)} outward={outward} />
                      {side.length !== null && Math.hypot(to.x - from.x, to.y - from.y) > 28 ? (
                        <text
                          x={mid.x}
                          y={mid.y + 4}
                          fontSize={11}
                          fontWeight={600}
                          textAnchor="middle"
                          fill="#2f3a3b"
                          stroke="white"
                          strokeWidth={3}
                          paintOrder="stroke"
                        >
                          {formatLength(side.length)}
                        </text>
                      ) : null}
                    </g>
                  );
                })}
                <text
                  x={labelAt.x}
                  y={labelAt.y - 4}
                  fontSize={12}
                  fontWeight={700}
                  textAnchor="middle"
                  fill="#1e2728"
                >
                  {area.name || `Area ${area.index + 1}`}
                </text>
                <text
                  x={labelAt.x}
                  y={labelAt.y + 12}
                  fontSize={11}
                  textAnchor="middle"
                  fill={bad ? '#c92a2a' : '#424f50'}
                  fontWeight={bad ? 700 : 400}
                >
                  {bad ? '⚠ problem: see the form' : check?.areaM2 ? formatArea(check.areaM2) : ''}
                </text>
                {check?.fall ? (
                  <text
                    x={labelAt.x}
                    y={labelAt.y + 26}
                    fontSize={10}
                    textAnchor="middle"
                    fill={check.fall.level === 'ok' ? '#2b8a3e' : '#c92a2a'}
                  >
                    {`fall ${check.fall.ratio}${check.fall.level === 'ok' ? '' : ' ⚠'}`}
                  </text>
                ) : null}
              </g>
            );
          })}

          {drawingArea
            ? drawingArea.points.map((p, i) => {
                const x = Number(p.x);
                const y = Number(p.y);
                if (!Number.isFinite(x) || !Number.isFinite(y)) {
                  return null;
                }
                const at = view.toPx({ x, y });
                return (
                  <g key={i}>
                    <circle cx={at.x} cy={at.y} r={5} fill="#d4740b" stroke="white" strokeWidth={1.5} />
                    <text x={at.x + 7} y={at.y - 7} fontSize={10} fontWeight={700} fill="#8c4a0a">
                      {i + 1}
                    </text>
                  </g>
                );
              })
            : null}
          {drawing && hover
            ? (() => {
                const at = view.toPx({ x: Number(hover.x), y: Number(hover.y) });
                return (
                  <g pointerEvents="none">
                    <circle cx={at.x} cy={at.y} r={6} fill="none" stroke="#d4740b" strokeWidth={2} />
                    <text x={at.x + 9} y={at.y + 14} fontSize={10} fill="#6b390c">
                      {`${hover.x}, ${hover.y}`}
                    </text>
                  </g>
                );
              })()
            : null}

          {/* Scale bar. */}
          <g aria-hidden>
            {(() => {
              const start = { x: view.width - 24 - bar * scale - 30, y: 18 };
              const length = bar * scale;
              return (
                <>
                  <rect x={start.x} y={start.y - 5} width={length} height={5} fill="#424f50" />
                  <rect
                    x={start.x + length / 2}
                    y={start.y - 5}
                    width={length / 2}
                    height={5}
                    fill="white"
                    stroke="#424f50"
                  />
                  <text x={start.x + length + 6} y={start.y} fontSize={10} fill="#424f50">
                    {`${bar} m`}
                  </text>
                </>
              );
            })()}
          </g>
        </svg>
      </Paper>
      <PlanLegend />
      {drawing ? (
        <Text size="xs" c="dimmed">
          Click the grid to add corners in order round the area; each snaps to {drawing.step} m. x runs left
          to right, y bottom to top.
        </Text>
      ) : null}
    </Stack>
  );
}

export function PlanLegend() {
  const kinds = ['drip', 'kerb', 'wall', 'angle', 'none', 'unset'] as const;
  return (
    <Box component="ul" aria-label="Legend of edge kinds" m={0} p={0} style={{ listStyle: 'none' }}>
      <Group gap="md" wrap="wrap">
        {kinds.map((kind) => (
          <Group key={kind} component="li" gap={6} wrap="nowrap">
            <EdgeSample style={EDGE_STYLES[kind]} />
            <Text size="xs" fw={600}>
              {EDGE_STYLES[kind].label}
            </Text>
          </Group>
        ))}
      </Group>
    </Box>
  );
}
