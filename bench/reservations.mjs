// Benchmark of reservations and of the estimate read, against a running API and its database.
//
//   API_URL=http://127.0.0.1:3000 DATABASE_URL=postgres://potlife@127.0.0.1:54329/potlife node bench/reservations.mjs
//
// It starts nothing: run the API first (`npm start` or `npm run dev`, or `node apps/api/dist/main.js`
// with its usual settings), then point this at it. Both URLs must be loopback addresses. The API's
// rate limit counts every request from 127.0.0.1: run the API with RATE_LIMIT_PER_MINUTE=5000 (or
// wait a minute between runs), or a burst may meet 429.
//
// What it does, all bounded (JOBS ≤ 500, READS ≤ 1000):
// 1. registers a new company "Bench Roofing <time>" through the API;
// 2. writes a small catalogue, one store and LOTS drums of 25 kg of resin straight into the tables
//    (as the ledger holds them: lot, receipt movement, balance), with supplier prices;
// 3. through the API: a customer, a build-up, one job with an L-shaped roof, its estimate accepted;
//    then copies that job and its estimate in SQL until there are JOBS jobs that each need a drum;
// 4. sends JOBS reservation requests at once and prints decisions per second and how much was
//    oversold (held beyond what the lots hold: must be 0);
// 5. reads one estimate READS times through GET /api/jobs/{id}/estimates/1 and fetches the same
//    rows with raw `pg` queries READS times, one at a time, and prints the ratio (goal ≤ 2×).
// The bench company stays in the database (the ledger is append-only); it is invented data.
import { createRequire } from 'node:module';
import { performance } from 'node:perf_hooks';

const require = createRequire(new URL('../apps/api/package.json', import.meta.url));
const { Client } = require('pg');

const API_URL = process.env.API_URL;
const DATABASE_URL = process.env.DATABASE_URL;
const JOBS = Math.min(Number(process.env.JOBS ?? 200), 500);
const LOTS = Math.min(Number(process.env.LOTS ?? 3), 50);
const READS = Math.min(Number(process.env.READS ?? 200), 1000);

if (!API_URL || !DATABASE_URL) {
  console.log(
    'bench/reservations.mjs starts nothing itself. Start the API, then run:\n' +
      '  API_URL=http://127.0.0.1:3000 DATABASE_URL=postgres://potlife@127.0.0.1:54329/potlife node bench/reservations.mjs\n' +
      'Optional: JOBS (200, at most 500), LOTS (3 drums of 25 kg), READS (200). Run the API with RATE_LIMIT_PER_MINUTE=5000.',
  );
  process.exit(0);
}
const LOOPBACK = new Set(['127.0.0.1', 'localhost', '[::1]', '::1']);
for (const [name, value] of [
  ['API_URL', API_URL],
  ['DATABASE_URL', DATABASE_URL],
]) {
  const host = new URL(value).hostname;
  if (!LOOPBACK.has(host)) {
    console.error(`${name} must point at this machine (127.0.0.1, localhost or ::1), not ${host}.`);
    process.exit(2);
  }
}

const stamp = Date.now().toString(36);
let token = '';

async function api(method, path, body, { expect } = {}) {
  const res = await fetch(`${API_URL}${path}`, {
    method,
    headers: { 'Content-Type': 'application/json', ...(token ? { Authorization: `Bearer ${token}` } : {}) },
    body: body === undefined ? undefined : JSON.stringify(body),
    signal: AbortSignal.timeout(60_000),
  });
  const text = await res.text();
  const json = text ? JSON.parse(text) : null;
  if (expect !== undefined && res.status !== expect) {
    if (res.status === 429) {
      throw new Error('The API refused with 429 (rate limit): start it with RATE_LIMIT_PER_MINUTE=5000 or wait a minute.');
    }
    throw new Error(`${method} ${path} answered ${res.status}: ${text.slice(0, 300)}`);
  }
  return { status: res.status, body: json };
}

const median = (xs) => {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)];
};
const p95 = (xs) => {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.floor(s.length * 0.95))];
};
const inDays = (n) => new Date(Date.now() + n * 86_400_000).toISOString().slice(0, 10);

const db = new Client({ connectionString: DATABASE_URL });
await db.connect();
try {
  // ── 1. A company of its own ─────────────────────────────────────────────────
  const reg = await api(
    'POST',
    '/api/auth/register',
    { companyName: `Bench Roofing ${stamp}`, name: 'Bench Owner', email: `bench.${stamp}@bench.test`, password: 'bench-password-long' },
    { expect: 201 },
  );
  token = reg.body.accessToken;
  const companyId = reg.body.user.companyId;
  const userId = reg.body.user.id;

  // ── 2. Catalogue, store and scarce stock, written as the ledger holds them ─
  const material = async (code, name, kind, unit, packs, extra = {}) =>
    (
      await db.query(
        `INSERT INTO materials (company_id, code, name, kind, stock_unit, pack_sizes, mat_gsm, trim_kind, trim_length_m, topcoat_colour)
         VALUES ($1, $2, $3, $4, $5, $6, $7, $8, $9, $10) RETURNING id`,
        [companyId, code, name, kind, unit, JSON.stringify(packs), extra.gsm ?? null, extra.trim ?? null, extra.trimLength ?? null, extra.colour ?? null],
      )
    ).rows[0].id;
  const resin = await material('B-RES', 'Bench resin', 'base-resin', 'kg', [{ size: '25', label: '25 kg drum' }]);
  const others = [
    await material('B-MAT', 'Bench mat 450', 'mat', 'm2', [{ size: '66.56', label: 'roll' }], { gsm: 450 }),
    await material('B-TOP', 'Bench topcoat', 'topcoat', 'kg', [{ size: '20', label: '20 kg' }, { size: '5', label: '5 kg' }], { colour: 'Slate grey' }),
    await material('B-CAT', 'Bench catalyst', 'catalyst', 'kg', [{ size: '1', label: '1 kg' }]),
    await material('B-DRIP', 'Bench drip trim', 'trim', 'each', [{ size: '1', label: '3 m' }], { trim: 'drip', trimLength: '3' }),
    await material('B-KERB', 'Bench kerb trim', 'trim', 'each', [{ size: '1', label: '3 m' }], { trim: 'kerb', trimLength: '3' }),
    await material('B-WALL', 'Bench wall trim', 'trim', 'each', [{ size: '1', label: '3 m' }], { trim: 'wall', trimLength: '3' }),
  ];
  const supplier = (await db.query(`INSERT INTO suppliers (company_id, name, lead_time_days) VALUES ($1, 'Bench Supply (invented)', 4) RETURNING id`, [companyId])).rows[0].id;
  for (const [id, size, price] of [
    [resin, '25', '88.00'],
    [others[0], '66.56', '120.00'],
    [others[1], '20', '140.00'],
    [others[1], '5', '40.00'],
    [others[2], '1', '9.50'],
    [others[3], '1', '14.00'],
    [others[4], '1', '15.00'],
    [others[5], '1', '13.50'],
  ]) {
    await db.query(`INSERT INTO supplier_prices (company_id, supplier_id, material_id, pack_size, pack_price, valid_from) VALUES ($1, $2, $3, $4, $5, '2020-01-01')`, [
      companyId,
      supplier,
      id,
      size,
      price,
    ]);
  }
  const store = (await db.query(`INSERT INTO locations (company_id, name, kind, allowed_hazard_classes) VALUES ($1, 'Bench store', 'store', '{none,3}') RETURNING id`, [companyId])).rows[0].id;
  for (let i = 0; i < LOTS; i++) {
    await db.query('BEGIN');
    const lot = (
      await db.query(
        `INSERT INTO lots (company_id, material_id, batch_number, received_on, expires_on, location_id, unit_cost, quantity)
         VALUES ($1, $2, $3, current_date, current_date + 120, $4, 3.52, 25) RETURNING id`,
        [companyId, resin, `BENCH-${i + 1}`, store],
      )
    ).rows[0].id;
    await db.query(
      `INSERT INTO stock_movements (company_id, operation_id, kind, lot_id, material_id, location_id, to_location_id, quantity, unit_cost, user_id)
       VALUES ($1, gen_random_uuid(), 'receipt', $2, $3, $4, $4, 25, 3.52, $5)`,
      [companyId, lot, resin, store, userId],
    );
    await db.query(`INSERT INTO lot_balances (company_id, lot_id, location_id, quantity) VALUES ($1, $2, $3, 25)`, [companyId, lot, store]);
    await db.query('COMMIT');
  }

  // ── 3. One job through the API, copied in SQL ───────────────────────────────
  const customer = (await api('POST', '/api/customers', { name: 'Bench Customer (invented)' }, { expect: 201 })).body.id;
  const buildUp = (await api('POST', '/api/build-ups', { name: `Bench build-up ${stamp}`, labourRate: '34.00', markupPct: '25' }, { expect: 201 })).body.id;
  const first = (
    await api('POST', '/api/jobs', { customerId: customer, siteAddress: '1 Bench Lane, Hollowmere', substrate: 'timber-deck', topcoatColour: 'Slate grey', buildUpId: buildUp, scheduledOn: inDays(10) }, { expect: 201 })
  ).body.id;
  await api(
    'PUT',
    `/api/jobs/${first}/roof`,
    {
      areas: [{ name: 'L roof', shape: 'polygon', points: [[0, 0], [8, 0], [8, 3], [3, 3], [3, 6], [0, 6]] }],
      edges: [
        { kind: 'drip', lengthM: '8' },
        { kind: 'kerb', lengthM: '3' },
        { kind: 'wall', lengthM: '5', upstandM: '0.2' },
        { kind: 'wall', lengthM: '3' },
        { kind: 'kerb', lengthM: '3' },
        { kind: 'drip', lengthM: '6' },
      ],
      pipes: 2,
      outlets: 1,
      corners: { external: 3, internal: 1 },
    },
    { expect: 200 },
  );
  await api('POST', `/api/jobs/${first}/estimates`, { airC: '14' }, { expect: 201 });
  await api('POST', `/api/jobs/${first}/estimates/1/accept`, undefined, { expect: 200 });
  await api('POST', `/api/jobs/${first}/status`, { status: 'quoted' }, { expect: 200 });
  await api('POST', `/api/jobs/${first}/status`, { status: 'won' }, { expect: 200 });
  // Each job needs a single drum: its estimate's resin is cut to one 25 kg pack.
  const estimate = (await db.query(`SELECT id FROM estimates WHERE job_id = $1`, [first])).rows[0].id;
  await db.query(
    `UPDATE estimate_materials SET pack_total = 25, quantity = 24 WHERE estimate_id = $1 AND material_id = $2`,
    [estimate, resin],
  );
  const jobIds = [first];
  const copy = (table, id, over) =>
    db.query(
      `INSERT INTO ${table} SELECT (jsonb_populate_record(NULL::${table}, to_jsonb(t) || $2::jsonb)).* FROM ${table} t WHERE t.id = $1 RETURNING id`,
      [id, JSON.stringify(over)],
    );
  const lines = (await db.query(`SELECT id FROM estimate_lines WHERE estimate_id = $1`, [estimate])).rows.map((r) => r.id);
  const mats = (await db.query(`SELECT id FROM estimate_materials WHERE estimate_id = $1`, [estimate])).rows.map((r) => r.id);
  const packs = (await db.query(`SELECT id, estimate_material_id FROM estimate_packs WHERE estimate_material_id = ANY($1)`, [mats])).rows;
  await db.query('BEGIN');
  for (let n = 2; n <= JOBS; n++) {
    const job = (await copy('jobs', first, { id: crypto.randomUUID(), number: n, title: `Bench job ${n}`, accepted_estimate_id: null })).rows[0].id;
    const est = (await copy('estimates', estimate, { id: crypto.randomUUID(), job_id: job })).rows[0].id;
    for (const l of lines) {
      await copy('estimate_lines', l, { id: crypto.randomUUID(), estimate_id: est });
    }
    for (const mid of mats) {
      const newMat = (await copy('estimate_materials', mid, { id: crypto.randomUUID(), estimate_id: est })).rows[0].id;
      for (const p of packs.filter((p) => p.estimate_material_id === mid)) {
        await copy('estimate_packs', p.id, { id: crypto.randomUUID(), estimate_material_id: newMat });
      }
    }
    await db.query(`UPDATE jobs SET accepted_estimate_id = $2 WHERE id = $1`, [job, est]);
    jobIds.push(job);
  }
  await db.query('COMMIT');

  // ── 4. The burst ────────────────────────────────────────────────────────────
  const started = performance.now();
  const results = await Promise.all(jobIds.map((id) => api('POST', `/api/jobs/${id}/reservations`)));
  const seconds = (performance.now() - started) / 1000;
  const statuses = {};
  let heldKg = 0;
  let shortJobs = 0;
  for (const r of results) {
    statuses[r.status] = (statuses[r.status] ?? 0) + 1;
    const m = r.body?.materials?.find((x) => x.material.id === resin);
    if (m) {
      heldKg += Number(m.held);
      shortJobs += m.shortfall ? 1 : 0;
    }
  }
  const { rows: over } = await db.query(
    `SELECT coalesce(sum(greatest(h.held - l.quantity, 0)), 0)::text AS oversold, coalesce(sum(h.held), 0)::text AS held, (SELECT sum(quantity) FROM lots WHERE company_id = $1)::text AS stock
       FROM (SELECT lot_id, sum(quantity - issued_quantity) AS held FROM reservations WHERE company_id = $1 AND status = 'held' GROUP BY lot_id) h
       JOIN lots l ON l.id = h.lot_id`,
    [companyId],
  );
  console.log(`Reservations: ${JOBS} requests at once for ${LOTS} drums of 25 kg (each job needs one)`);
  console.log(`  answers: ${JSON.stringify(statuses)} in ${seconds.toFixed(2)} s → ${(JOBS / seconds).toFixed(1)} decisions per second`);
  console.log(`  held ${over[0].held} kg of ${over[0].stock} kg (responses say ${heldKg} kg); ${shortJobs} jobs see a shortfall`);
  console.log(`  oversold: ${over[0].oversold} kg (must be 0)`);

  // ── 5. The estimate read against raw pg ─────────────────────────────────────
  const raw = async () => {
    const e = (await db.query(`SELECT * FROM estimates WHERE company_id = $1 AND job_id = $2 AND version = 1`, [companyId, first])).rows[0];
    // One connection runs one query at a time, so these go one after another.
    const l = await db.query(`SELECT * FROM estimate_lines WHERE estimate_id = $1 ORDER BY position`, [e.id]);
    const m = await db.query(`SELECT * FROM estimate_materials WHERE estimate_id = $1 ORDER BY position`, [e.id]);
    const p = await db.query(
      `SELECT p.* FROM estimate_packs p JOIN estimate_materials em ON em.id = p.estimate_material_id WHERE em.estimate_id = $1 ORDER BY p.pack_size DESC`,
      [e.id],
    );
    const names = await db.query(
      `SELECT id, name FROM materials WHERE id IN (SELECT material_id FROM estimate_lines WHERE estimate_id = $1) UNION ALL SELECT id, name FROM users WHERE id = $2`,
      [e.id, e.created_by],
    );
    const job = await db.query(`SELECT id, company_id, accepted_estimate_id FROM jobs WHERE id = $1 AND company_id = $2`, [first, companyId]);
    return l.rows.length + m.rows.length + p.rows.length + names.rows.length + job.rows.length;
  };
  const viaApi = async () => {
    const r = await api('GET', `/api/jobs/${first}/estimates/1`, undefined, { expect: 200 });
    return r.body.lines.length;
  };
  for (let i = 0; i < 20; i++) {
    await raw();
    await viaApi();
  }
  const tApi = [];
  const tRaw = [];
  for (let i = 0; i < READS; i++) {
    let t0 = performance.now();
    await viaApi();
    tApi.push(performance.now() - t0);
    t0 = performance.now();
    await raw();
    tRaw.push(performance.now() - t0);
  }
  const ratio = median(tApi) / median(tRaw);
  console.log(`Estimate read, ${READS} times one after another (the same rows: estimate, lines, materials, packs, names, job)`);
  console.log(`  API  median ${median(tApi).toFixed(2)} ms, p95 ${p95(tApi).toFixed(2)} ms`);
  console.log(`  pg   median ${median(tRaw).toFixed(2)} ms, p95 ${p95(tRaw).toFixed(2)} ms`);
  console.log(`  ratio ${ratio.toFixed(2)}× (goal ≤ 2×)`);
  if (Number(over[0].oversold) !== 0) {
    process.exitCode = 1;
  }
} finally {
  await db.end();
}
