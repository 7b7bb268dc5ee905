// Benchmark of the costing engine: node bench/domain.mjs (after npm run build -w @potlife/domain).
// Estimates a roof of 40 areas and 120 edges, then 1,000 such roofs, and compares with the same
// arithmetic in plain JS numbers. Prints figures from this one run; it is not a timed test.
import { createRequire } from 'node:module';
import { performance } from 'node:perf_hooks';

const require = createRequire(import.meta.url);
const domain = require('../packages/domain/dist');
const { estimateRoof, packsForEstimate, priceEstimate, DEFAULT_BUILD_UP: B } = domain;

// ── Roofs ────────────────────────────────────────────────────────────────────
let seed = 20250301;
function random() {
  // mulberry32: the same roofs every run
  seed = (seed + 0x6d2b79f5) | 0;
  let t = seed;
  t = Math.imul(t ^ (t >>> 15), t | 1);
  t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
  return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
}
const cm = (min, max) => Math.round((min + random() * (max - min)) * 100) / 100;

function makeRoof() {
  const areas = [];
  for (let i = 0; i < 40; i++) {
    if (i % 2 === 0) {
      areas.push({ name: `Area ${i + 1}`, lengthM: String(cm(2, 12)), widthM: String(cm(1.5, 8)) });
    } else {
      // An L-shape with 6 corners.
      const x0 = cm(0, 50);
      const y0 = cm(0, 50);
      const w = cm(4, 10);
      const h = cm(4, 10);
      const a = cm(1, w - 1);
      const b = cm(1, h - 1);
      areas.push({
        name: `Area ${i + 1}`,
        polygon: [
          [x0, y0],
          [x0 + w, y0],
          [x0 + w, y0 + b],
          [x0 + a, y0 + b],
          [x0 + a, y0 + h],
          [x0, y0 + h],
        ].map(([x, y]) => [String(Math.round(x * 100) / 100), String(Math.round(y * 100) / 100)]),
      });
    }
  }
  const kinds = ['drip', 'kerb', 'wall', 'kerb', 'drip', 'angle'];
  const edges = [];
  for (let i = 0; i < 120; i++) {
    const kind = kinds[i % kinds.length];
    const edge = { kind, lengthM: String(cm(0.5, 14)) };
    if (kind === 'wall') {
      edge.upstandM = String(cm(0.15, 0.3));
    }
    edges.push(edge);
  }
  return { areas, edges, pipes: 6, outlets: 4, airC: '14' };
}

// ── The same arithmetic in plain numbers ─────────────────────────────────────
function cross(o, a, b) {
  return (a[0] - o[0]) * (b[1] - o[1]) - (a[1] - o[1]) * (b[0] - o[0]);
}
function touch(a, b, c, d) {
  if (
    Math.max(a[0], b[0]) < Math.min(c[0], d[0]) ||
    Math.max(c[0], d[0]) < Math.min(a[0], b[0]) ||
    Math.max(a[1], b[1]) < Math.min(c[1], d[1]) ||
    Math.max(c[1], d[1]) < Math.min(a[1], b[1])
  ) {
    return false;
  }
  const d1 = Math.sign(cross(c, d, a));
  const d2 = Math.sign(cross(c, d, b));
  const d3 = Math.sign(cross(a, b, c));
  const d4 = Math.sign(cross(a, b, d));
  return d1 * d2 < 0 && d3 * d4 < 0;
}
function polygonAreaNumber(raw) {
  const p = raw.map(([x, y]) => [Number(x), Number(y)]);
  const n = p.length;
  for (let i = 0; i < n; i++) {
    for (let j = i + 2; j < n; j++) {
      if (!(i === 0 && j === n - 1) && touch(p[i], p[(i + 1) % n], p[j], p[(j + 1) % n])) {
        throw new Error('not simple');
      }
    }
  }
  let twice = 0;
  for (let i = 0; i < n; i++) {
    const a = p[i];
    const b = p[(i + 1) % n];
    twice += a[0] * b[1] - b[0] * a[1];
  }
  return Math.abs(twice) / 2;
}
const trimLengths = (run) => (run === 0 ? 0 : Math.max(1, Math.ceil((run - B.trimLapM) / (B.trimLengthM - B.trimLapM))));
function catalystPct(air) {
  let pct = B.catalystBands[0].percent;
  for (const band of B.catalystBands) {
    if (air >= band.fromC) {
      pct = band.percent;
    }
  }
  return pct;
}
function estimateNumber(roof) {
  let deck = 0;
  for (const a of roof.areas) {
    deck += a.polygon ? polygonAreaNumber(a.polygon) : Number(a.lengthM) * Number(a.widthM);
  }
  let upstand = 0;
  let trimM = 0;
  let joints = 0;
  let batten = 0;
  let nails = 0;
  const lengths = { drip: 0, kerb: 0, wall: 0, angle: 0 };
  for (const e of roof.edges) {
    const len = Number(e.lengthM);
    if (e.kind === 'wall') {
      upstand += len * (e.upstandM === undefined ? B.upstandM : Number(e.upstandM));
    }
    const n = trimLengths(len);
    lengths[e.kind] += n;
    trimM += len;
    joints += Math.max(n - 1, 0);
    batten += len * B.battenMPerEdgeM[e.kind];
    nails += len * B.nailsPerEdgeM[e.kind];
  }
  let corners = 0;
  const takes = (k) => k === 'drip' || k === 'kerb';
  roof.edges.forEach((e, i) => {
    if (takes(e.kind) && takes(roof.edges[(i + 1) % roof.edges.length].kind)) {
      corners += 1;
    }
  });
  const laminated = deck + upstand;
  const factor = B.rollWidthM / (B.rollWidthM - B.lapM);
  const matBefore = laminated * B.layers * factor;
  const mat = matBefore * (1 + B.matWastagePct / 100);
  const waste = 1 + B.resinWastagePct / 100;
  const baseResin = matBefore * (B.matGsm / 1000) * B.resinToGlass * waste;
  const bandage =
    trimM * B.bandageMPerEdgeM + joints * B.bandageMPerTrimJoint + corners * B.bandageMPerCorner + roof.pipes * B.bandageMPerPipe + roof.outlets * B.bandageMPerOutlet;
  const bandageResin =
    ((bandage * B.bandageWidthMm) / 1000) * (B.bandageGsm / 1000) * B.resinToGlass * waste +
    (roof.pipes * B.extraResinKgPerPipe + roof.outlets * B.extraResinKgPerOutlet) * waste;
  const topcoat = laminated * B.topcoatKgPerM2;
  const catalyst = ((baseResin + bandageResin + topcoat) * catalystPct(Number(roof.airC))) / 100;
  return {
    deck,
    laminated,
    mat,
    baseResin,
    bandageResin,
    topcoat,
    catalyst,
    lengths,
    corners,
    bandage,
    acetone: laminated * B.acetoneLPerM2,
    adhesive: Math.ceil(trimM / B.adhesiveTrimMPerCartridge),
    batten,
    nails: Math.ceil(nails),
    hours: laminated * B.labourHoursPerM2 + trimM * B.labourHoursPerTrimM,
  };
}

// ── Timing ───────────────────────────────────────────────────────────────────
function median(xs) {
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m] : (s[m - 1] + s[m]) / 2;
}
function perRoof(fn, roof, runs) {
  for (let i = 0; i < 50; i++) {
    fn(roof);
  }
  const times = [];
  for (let i = 0; i < runs; i++) {
    const t = performance.now();
    fn(roof);
    times.push(performance.now() - t);
  }
  return median(times);
}
function allRoofs(fn, roofs) {
  const t = performance.now();
  for (const r of roofs) {
    fn(r);
  }
  return performance.now() - t;
}

const roof = makeRoof();
const roofs = Array.from({ length: 1000 }, makeRoof);

// The two must agree before their times mean anything.
const d = estimateRoof(roof);
const n = estimateNumber(roof);
const line = (role) => d.lines.find((l) => l.role === role).quantity.toNumber();
const checks = [
  ['laminated m²', d.laminatedAreaM2.toNumber(), n.laminated],
  ['mat m²', line('mat'), n.mat],
  ['base resin kg', line('base-resin'), n.baseResin],
  ['bandage resin kg', line('bandage-resin'), n.bandageResin],
  ['catalyst kg', line('catalyst'), n.catalyst],
  ['drip trim lengths', line('trim:drip'), n.lengths.drip],
  ['nails', line('nails'), n.nails],
  ['labour h', d.labour.totalHours.toNumber(), n.hours],
];
for (const [name, a, b] of checks) {
  if (Math.abs(a - b) > 1e-6 * Math.max(1, Math.abs(b))) {
    throw new Error(`The baseline disagrees on ${name}: ${a} against ${b}`);
  }
}

const runs = 1000;
const withPrice = (r) => {
  const e = estimateRoof(r);
  packsForEstimate(e);
  return priceEstimate(e.lines.map((l) => ({ quantity: l.quantity, unitCost: '1.23' })), e.labour.totalHours, '32', '20');
};
const decimalMedian = perRoof(estimateRoof, roof, runs);
const numberMedian = perRoof(estimateNumber, roof, runs);
const pricedMedian = perRoof(withPrice, roof, runs);
const decimalAll = allRoofs(estimateRoof, roofs);
const numberAll = allRoofs(estimateNumber, roofs);

const ms = (x) => `${x.toFixed(3)} ms`;
console.log(`Costing engine benchmark (Node ${process.version}): a roof of ${roof.areas.length} areas (half L-shaped polygons) and ${roof.edges.length} edges`);
console.log(`  baseline agrees with the decimal engine on ${checks.length} quantities (laminated ${d.laminatedAreaM2.toFixed(2)} m², base resin ${d.lines[1].quantity.toFixed(2)} kg)`);
console.log('');
console.log(`  median per roof, estimateRoof (decimal.js) ${ms(decimalMedian).padStart(12)}   goal < 5 ms: ${decimalMedian < 5 ? 'met' : 'NOT met'}`);
console.log(`  median per roof, plain JS numbers          ${ms(numberMedian).padStart(12)}`);
console.log(`  ratio decimal / numbers                    ${(decimalMedian / numberMedian).toFixed(1).padStart(9)} ×`);
console.log(`  median per roof, estimate + packs + price  ${ms(pricedMedian).padStart(12)}`);
console.log('');
console.log(`  1,000 roofs, estimateRoof (decimal.js)     ${ms(decimalAll).padStart(12)}   goal < 2 s: ${decimalAll < 2000 ? 'met' : 'NOT met'}`);
console.log(`  1,000 roofs, plain JS numbers              ${ms(numberAll).padStart(12)}`);
console.log(`  ratio decimal / numbers                    ${(decimalAll / numberAll).toFixed(1).padStart(9)} ×`);
