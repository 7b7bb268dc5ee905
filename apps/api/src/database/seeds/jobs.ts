import { BuildUpRates, Decimal, JobStatus, StoredEdge, StoredRoof } from '@potlife/domain';
import dayjs from 'dayjs';
import { EntityManager } from 'typeorm';
import { defaultRates, toDomainBuildUp } from '../../build-ups/build-ups.service';
import { BuildUp } from '../../build-ups/entities/build-up.entity';
import { CatalogueService } from '../../catalogue/catalogue.service';
import { Material } from '../../catalogue/entities/material.entity';
import { SupplierPricesService } from '../../suppliers/supplier-prices.service';
import { SuppliersService } from '../../suppliers/suppliers.service';
import { CostingService } from '../../costing/costing.service';
import { Job, Substrate } from '../../jobs/entities/job.entity';
import { writeEstimate } from '../../jobs/estimates.service';
import type { JobsService } from '../../jobs/jobs.service';
import { ReservationsService } from '../../jobs/reservations/reservations.service';
import { SiteStockService } from '../../jobs/reservations/site-stock.service';
import { summariseRoof } from '../../jobs/roof/roof';
import { IdempotencyService } from '../../stock/idempotency.service';
import { LedgerService } from '../../stock/ledger.service';
import { MovementsService } from '../../stock/movements.service';
import { StockReader } from '../../stock/stock-reader.service';
import { StockService } from '../../stock/stock.service';
import type { SeedContext } from './demo-company';

// The demo scenario is invented: customers, sites and crews in the invented town of Hollowmere.

const CUSTOMERS = [
  {
    name: 'Priya Lennox',
    email: 'priya.lennox@example.test',
    phone: '01632 960 301',
    billingAddress: '18 Tanner’s Walk, Hollowmere HM2 4RE',
  },
  {
    name: 'Harrow Lane Surgery',
    contactName: 'Ada Hollis (practice manager)',
    email: 'practice@harrowlane.test',
    phone: '01632 960 118',
    billingAddress: '3 Harrow Lane, Hollowmere HM2 7PD',
  },
  {
    name: 'Hollowmere Community Hall Trust',
    contactName: 'Geraint Pell',
    email: 'bookings@hollowmerehall.test',
    phone: '01632 960 455',
    billingAddress: 'The Hall, Chapel Green, Hollowmere HM1 1CG',
  },
  {
    name: 'Fenn Yard Joinery',
    contactName: 'Bea Corran',
    email: 'office@fennyard.test',
    phone: '01632 960 532',
    billingAddress: 'Unit 2, Fenn Yard, Hollowmere HM5 9FY',
  },
  {
    name: 'Tom and Iris Wendle',
    email: 'wendles@example.test',
    phone: '07700 900 417',
    billingAddress: '41 Wendle Road, Hollowmere HM3 2WR',
  },
  {
    name: 'Sorrel Mews Lettings',
    contactName: 'Cass Ferrand',
    email: 'lettings@sorrelmews.test',
    phone: '01632 960 688',
    billingAddress: '9 Sorrel Mews, Hollowmere HM4 6SM',
  },
];

const BUILD_UPS: {
  name: string;
  description: string;
  rates: Partial<BuildUpRates>;
  labourRate: string;
  markupPct: string;
}[] = [
  {
    name: 'Standard deck, one layer 450 g',
    description: 'One layer of 450 g/m² mat at 2.5:1 on a sound timber or OSB deck, topcoat over all.',
    rates: {},
    labourRate: '34.00',
    markupPct: '28',
  },
  {
    name: 'Walkway, two layers 450 g',
    description: 'Two layers of 450 g/m² mat for a roof that is walked on, with more labour per m².',
    rates: { layers: '2', labourHoursPerM2: '0.55', topcoatKgPerM2: '0.6' },
    labourRate: '34.00',
    markupPct: '28',
  },
];

const edge = (kind: StoredEdge['kind'], lengthM: string, more: Partial<StoredEdge> = {}): StoredEdge => ({
  kind,
  lengthM,
  upstandM: null,
  areaIndex: 0,
  side: null,
  label: null,
  ...more,
});

const rectangle = (
  name: string,
  lengthM: string,
  widthM: string,
  edges: StoredEdge[],
  more: Partial<StoredRoof> = {},
): StoredRoof => ({
  areas: [{ name, shape: 'rectangle', lengthM, widthM, fall: { riseMm: '100', runM: widthM } }],
  edges,
  pipes: 0,
  outlets: 0,
  corners: null,
  notes: null,
  ...more,
});

/** The L-shaped extension: a wall abutment along the inside corner, two pipes and an outlet. */
const L_SHAPED: StoredRoof = {
  areas: [
    {
      name: 'L-shaped extension',
      shape: 'polygon',
      points: [
        ['0', '0'],
        ['9', '0'],
        ['9', '4'],
        ['4', '4'],
        ['4', '7.5'],
        ['0', '7.5'],
      ],
      fall: { riseMm: '120', runM: '4' },
    },
  ],
  edges: [
    edge('drip', '9', { side: 0, label: 'Front gutter' }),
    edge('kerb', '4', { side: 1 }),
    edge('wall', '5', { side: 2, upstandM: '0.2', label: 'House wall' }),
    edge('wall', '3.5', { side: 3, upstandM: '0.2', label: 'House wall' }),
    edge('kerb', '4', { side: 4 }),
    edge('drip', '7.5', { side: 5, label: 'Side gutter' }),
  ],
  pipes: 2,
  outlets: 1,
  corners: { external: 3, internal: 1 },
  notes: 'Soil pipe and boiler flue through the roof; outlet to the side gutter.',
};

const around = (
  l: string,
  w: string,
  kinds: [StoredEdge['kind'], StoredEdge['kind'], StoredEdge['kind'], StoredEdge['kind']],
) => [
  edge(kinds[0], l, { side: 0 }),
  edge(kinds[1], w, { side: 1, ...(kinds[1] === 'wall' ? { upstandM: '0.15' } : {}) }),
  edge(kinds[2], l, { side: 2, ...(kinds[2] === 'wall' ? { upstandM: '0.15' } : {}) }),
  edge(kinds[3], w, { side: 3, ...(kinds[3] === 'wall' ? { upstandM: '0.15' } : {}) }),
];

interface DemoJob {
  title: string;
  customer: string;
  site: string;
  substrate: Substrate;
  status: JobStatus;
  /** days from the seed's day; null: not scheduled */
  day: number | null;
  crew: string | null;
  colour: string;
  buildUp: 0 | 1;
  roof: StoredRoof | null;
  airC?: string;
  stock?: 'reserve' | 'issue' | 'issue-and-return';
  notes?: string;
  /** hours the crew booked: [days from the seed's day, who, hours, note] */
  labour?: [number, string, string, string?][];
}

const JOBS: DemoJob[] = [
  {
    title: 'Garage roof, 7 Larch Row',
    customer: 'Tom and Iris Wendle',
    site: '7 Larch Row, Hollowmere HM3 5LR',
    substrate: 'existing-felt',
    status: 'enquiry',
    day: null,
    crew: null,
    colour: 'Charcoal',
    buildUp: 0,
    roof: null,
    notes: 'Old felt blistered; survey booked.',
  },
  {
    title: 'Dormer roof, 22 Quarry Lane',
    customer: 'Sorrel Mews Lettings',
    site: '22 Quarry Lane, Hollowmere HM4 1QL',
    substrate: 'osb',
    status: 'enquiry',
    day: null,
    crew: null,
    colour: 'Slate grey',
    buildUp: 0,
    roof: rectangle('Dormer', '3.2', '2.4', around('3.2', '2.4', ['drip', 'kerb', 'wall', 'kerb'])),
  },
  {
    title: 'Rear extension, 5 Pell Street',
    customer: 'Priya Lennox',
    site: '5 Pell Street, Hollowmere HM2 3PS',
    substrate: 'timber-deck',
    status: 'quoted',
    day: 30,
    crew: null,
    colour: 'Slate grey',
    buildUp: 0,
    roof: rectangle('Extension', '5.4', '3.6', around('5.4', '3.6', ['drip', 'kerb', 'wall', 'kerb'])),
  },
  {
    title: 'Waiting room roof, Harrow Lane Surgery',
    customer: 'Harrow Lane Surgery',
    site: '3 Harrow Lane, Hollowmere HM2 7PD',
    substrate: 'asphalt',
    status: 'won',
    day: 24,
    crew: 'Jonah Brill and Bea Tarrant',
    colour: 'Slate grey',
    buildUp: 0,
    roof: rectangle('Waiting room', '8', '6', around('8', '6', ['drip', 'kerb', 'drip', 'wall']), {
      outlets: 2,
    }),
    airC: '12',
  },
  {
    title: 'L-shaped extension, 18 Tanner’s Walk',
    customer: 'Priya Lennox',
    site: '18 Tanner’s Walk, Hollowmere HM2 4RE',
    substrate: 'timber-deck',
    status: 'scheduled',
    day: 9,
    crew: 'Jonah Brill and Bea Tarrant',
    colour: 'Slate grey',
    buildUp: 0,
    roof: L_SHAPED,
    airC: '14',
    stock: 'reserve',
  },
  {
    title: 'Hall walkway, Chapel Green',
    customer: 'Hollowmere Community Hall Trust',
    site: 'The Hall, Chapel Green, Hollowmere HM1 1CG',
    substrate: 'concrete',
    status: 'scheduled',
    day: 12,
    crew: 'Sol Okon and Ravi Dent',
    colour: 'Moss green',
    buildUp: 1,
    roof: rectangle('Walkway roof', '28', '9', around('28', '9', ['drip', 'kerb', 'drip', 'kerb']), {
      pipes: 4,
      outlets: 3,
    }),
    stock: 'reserve',
    notes: 'Big roof: more than the store holds; order before the job.',
  },
  {
    title: 'Bay window roof, 3 Orchard Rise',
    customer: 'Tom and Iris Wendle',
    site: '3 Orchard Rise, Hollowmere HM3 8OR',
    substrate: 'timber-deck',
    status: 'scheduled',
    day: 5,
    crew: 'Sol Okon',
    colour: 'Charcoal',
    buildUp: 0,
    roof: rectangle('Bay', '2.6', '1.2', around('2.6', '1.2', ['drip', 'kerb', 'wall', 'kerb'])),
    stock: 'reserve',
  },
  {
    title: 'Workshop roof, Unit 2 Fenn Yard',
    customer: 'Fenn Yard Joinery',
    site: 'Unit 2, Fenn Yard, Hollowmere HM5 9FY',
    substrate: 'old-grp',
    status: 'in-progress',
    day: 0,
    crew: 'Jonah Brill and Bea Tarrant',
    colour: 'Slate grey',
    buildUp: 0,
    roof: rectangle('Workshop', '7.5', '5', around('7.5', '5', ['drip', 'kerb', 'drip', 'kerb']), {
      pipes: 1,
    }),
    airC: '11',
    stock: 'issue',
    labour: [
      [0, 'Jonah Brill', '4', 'Stripped the old topcoat back and ground the laps'],
      [0, 'Bea Tarrant', '4'],
    ],
  },
  {
    title: 'Kitchen flat roof, 41 Wendle Road',
    customer: 'Tom and Iris Wendle',
    site: '41 Wendle Road, Hollowmere HM3 2WR',
    substrate: 'timber-deck',
    status: 'complete',
    day: -6,
    crew: 'Sol Okon and Ravi Dent',
    colour: 'Slate grey',
    buildUp: 0,
    roof: rectangle('Kitchen', '4.8', '3.5', around('4.8', '3.5', ['drip', 'kerb', 'wall', 'kerb']), {
      pipes: 1,
      outlets: 1,
    }),
    stock: 'issue-and-return',
    // More than the estimate's 8.6 h: the topcoat went on the next morning after a damp evening.
    labour: [
      [-6, 'Sol Okon', '4.5'],
      [-6, 'Ravi Dent', '4.5'],
      [-5, 'Sol Okon', '1.5', 'Topcoat after the dew had gone'],
    ],
  },
  {
    title: 'Summerhouse roof, Hollowmere Allotments',
    customer: 'Hollowmere Community Hall Trust',
    site: 'Plot 14, Hollowmere Allotments, HM1 4AL',
    substrate: 'osb',
    status: 'invoiced',
    day: -40,
    crew: 'Sol Okon',
    colour: 'Moss green',
    buildUp: 0,
    roof: rectangle('Summerhouse', '3', '2.5', around('3', '2.5', ['drip', 'kerb', 'drip', 'kerb'])),
    labour: [[-40, 'Sol Okon', '4']],
  },
  {
    title: 'Garden room, 9 Sorrel Mews',
    customer: 'Sorrel Mews Lettings',
    site: '9 Sorrel Mews, Hollowmere HM4 6SM',
    substrate: 'osb',
    status: 'lost',
    day: null,
    crew: null,
    colour: 'Charcoal',
    buildUp: 0,
    roof: rectangle('Garden room', '4', '3', around('4', '3', ['drip', 'kerb', 'wall', 'kerb'])),
    notes: 'Customer chose a single-ply roof.',
  },
  {
    title: 'Shop canopy, 2 Market Row',
    customer: 'Fenn Yard Joinery',
    site: '2 Market Row, Hollowmere HM1 2MR',
    substrate: 'timber-deck',
    status: 'cancelled',
    day: 16,
    crew: null,
    colour: 'Charcoal',
    buildUp: 0,
    roof: rectangle('Canopy', '6', '1.5', around('6', '1.5', ['drip', 'kerb', 'wall', 'kerb'])),
    notes: 'Building work postponed by the landlord.',
  },
];

/** The statuses a job passes through to reach its own, in order. */
function pathTo(status: JobStatus): JobStatus[] {
  const main: JobStatus[] = ['enquiry', 'quoted', 'won', 'scheduled', 'in-progress', 'complete', 'invoiced'];
  switch (status) {
    case 'lost':
      return ['enquiry', 'quoted', 'lost'];
    case 'cancelled':
      return ['enquiry', 'quoted', 'won', 'cancelled'];
    default:
      return main.slice(0, main.indexOf(status) + 1);
  }
}

/**
 * Demo data for jobs: a dozen jobs at every stage, among them an L-shaped roof with a wall
 * abutment, pipes and an outlet, a completed job with issues and returns, and one short of stock.
 * Estimates are costed from the demo catalogue; stock is reserved and issued from the demo lots
 * (when the stock seed has made them). Safe to run twice: a job already there is left alone.
 */
export async function seedJobs(m: EntityManager, ctx: SeedContext): Promise<void> {
  const { companyId } = ctx;
  await m.query(
    `INSERT INTO company_settings (company_id, reservation_margin_days, quote_validity_days, updated_by) VALUES ($1, 7, 30, $2)
     ON CONFLICT (company_id) DO NOTHING`,
    [companyId, ctx.userIds.owner],
  );

  const buildUps: BuildUp[] = [];
  for (const b of BUILD_UPS) {
    const repo = m.getRepository(BuildUp);
    const found = await repo
      .createQueryBuilder('b')
      .where('b.company_id = :companyId AND lower(b.name) = lower(:name)', { companyId, name: b.name })
      .getOne();
    buildUps.push(
      found ??
        (await repo.save(
          repo.create({
            companyId,
            name: b.name,
            description: b.description,
            rates: { ...defaultRates(), ...b.rates },
            labourRate: b.labourRate,
            markupPct: b.markupPct,
            vatRatePct: '20',
            active: true,
          }),
        )),
    );
  }

  const customerIds = new Map<string, string>();
  for (const c of CUSTOMERS) {
    const [found] = (await m.query(`SELECT id FROM customers WHERE company_id = $1 AND name = $2`, [
      companyId,
      c.name,
    ])) as { id: string }[];
    const id =
      found?.id ??
      (
        (await m.query(
          `INSERT INTO customers (company_id, name, contact_name, email, phone, billing_address) VALUES ($1, $2, $3, $4, $5, $6) RETURNING id`,
          [companyId, c.name, c.contactName ?? null, c.email, c.phone, c.billingAddress],
        )) as [{ id: string }]
      )[0].id;
    customerIds.set(c.name, id);
  }

  // The services of the jobs and stock modules, built by hand over this transaction.
  const ledger = new LedgerService();
  const stock = new StockService(
    m.connection,
    ledger,
    new MovementsService(ledger),
    new StockReader(),
    new IdempotencyService(m.connection),
  );
  const costing = new CostingService(
    m.getRepository(Material),
    new SuppliersService(
      m.connection,
      new SupplierPricesService(m.connection, new CatalogueService(m.connection)),
    ),
  );
  const reservations = new ReservationsService(
    m.connection,
    undefined as unknown as JobsService,
    stock,
    costing,
  );
  const site = new SiteStockService(
    m.connection,
    undefined as unknown as JobsService,
    reservations,
    stock,
    undefined as unknown as IdempotencyService,
  );
  const estimator = { companyId, id: ctx.userIds.estimator };
  const storeman = { companyId, id: ctx.userIds.storeman };
  const today = dayjs();

  // Nearest job dates first, so they have the first pick of the stock.
  const order = [...JOBS].sort((a, b) => (a.day ?? 999) - (b.day ?? 999));
  for (const d of order) {
    const [exists] = (await m.query(`SELECT id FROM jobs WHERE company_id = $1 AND title = $2`, [
      companyId,
      d.title,
    ])) as { id: string }[];
    if (exists) {
      continue;
    }
    const buildUp = buildUps[d.buildUp]!;
    if (d.roof) {
      summariseRoof(d.roof, toDomainBuildUp(buildUp.rates)); // the domain checks the demo roofs as it would a typed one
    }
    const [{ next }] = (await m.query(
      `SELECT coalesce(max(number), 0) + 1 AS next FROM jobs WHERE company_id = $1`,
      [companyId],
    )) as [{ next: number }];
    const path = pathTo(d.status);
    const started = ['in-progress', 'complete'].includes(d.status);
    const repo = m.getRepository(Job);
    const job = await repo.save(
      repo.create({
        companyId,
        number: next,
        customerId: customerIds.get(d.customer)!,
        title: d.title,
        siteAddress: d.site,
        substrate: d.substrate,
        scheduledOn: d.day === null ? null : today.add(d.day, 'day').format('YYYY-MM-DD'),
        estimatorId: ctx.userIds.estimator,
        crew: d.crew,
        topcoatColour: d.colour,
        buildUpId: buildUp.id,
        // A started job is seeded in progress so stock can go out, then moved on.
        status: started ? 'in-progress' : d.status,
        statusChangedAt: new Date(),
        roof: d.roof,
        roofUpdatedAt: d.roof ? new Date() : null,
        acceptedEstimateId: null,
        notes: d.notes ?? null,
        createdBy: ctx.userIds.estimator,
      }),
    );
    for (const [i, to] of path.entries()) {
      await m.query(
        `INSERT INTO job_status_changes (company_id, job_id, from_status, to_status, changed_by, reason) VALUES ($1, $2, $3, $4, $5, $6)`,
        [
          companyId,
          job.id,
          i === 0 ? null : path[i - 1],
          to,
          ctx.userIds.estimator,
          to === 'lost' || to === 'cancelled' ? (d.notes ?? null) : null,
        ],
      );
    }
    for (const [day, who, hours, note] of d.labour ?? []) {
      await m.query(
        `INSERT INTO job_labour_entries (company_id, job_id, worked_on, hours, crew_member, note, created_by) VALUES ($1, $2, $3, $4, $5, $6, $7)`,
        [
          companyId,
          job.id,
          today.add(day, 'day').format('YYYY-MM-DD'),
          hours,
          who,
          note ?? null,
          ctx.userIds.estimator,
        ],
      );
    }
    if (!d.roof || d.status === 'enquiry') {
      continue;
    }
    const estimateId = await writeEstimate(m, costing, {
      companyId,
      userId: ctx.userIds.estimator,
      job,
      buildUp,
      airC: d.airC ?? '20',
      note: null,
    });
    job.acceptedEstimateId = estimateId;
    await repo.save(job);
    await m.query(`UPDATE estimates SET accepted_at = now(), accepted_by = $2 WHERE id = $1`, [
      estimateId,
      ctx.userIds.estimator,
    ]);
    if (!d.stock) {
      continue;
    }
    await reservations.reserveIn(m, estimator, job);
    if (d.stock === 'reserve') {
      continue;
    }
    // Send out what is held, as the storeman would from the pick list.
    const held = (await reservations.heldRows(m, companyId, job.id)).filter((r) => r.status === 'held');
    if (held.length > 0) {
      const balances = await stock.lotBalances(
        m,
        companyId,
        held.map((r) => r.lotId),
      );
      const lines = held
        .map((r) => ({
          lotId: r.lotId,
          quantity: new Decimal(r.quantity).minus(r.issuedQuantity).toString(),
          fromLocationId: balances
            .find((b) => b.lotId === r.lotId)
            ?.places.find((p) => new Decimal(p.quantity).gte(new Decimal(r.quantity).minus(r.issuedQuantity)))
            ?.locationId,
        }))
        .filter(
          (l): l is { lotId: string; quantity: string; fromLocationId: string } =>
            !!l.fromLocationId && new Decimal(l.quantity).gt(0),
        );
      if (lines.length) {
        await site.issueIn(m, storeman, job, { lines, note: `Loaded for ${d.crew ?? 'the crew'}` });
      }
      if (d.stock === 'issue-and-return') {
        job.status = 'complete';
        await repo.save(job);
        // A part-used drum of resin weighed back, and one unopened trim length.
        const back: { lotId: string; partQuantity?: string; fullPacks?: number }[] = [];
        const out: { lotId: string; kind: string; quantity: string }[] = await m.query(
          `SELECT sm.lot_id AS "lotId", mt.kind, (-sum(sm.quantity))::text AS quantity
             FROM stock_movements sm JOIN materials mt ON mt.id = sm.material_id
            WHERE sm.job_id = $1 AND sm.kind = 'issue' GROUP BY sm.lot_id, mt.kind ORDER BY mt.kind, sm.lot_id`,
          [job.id],
        );
        const resin = out.find((o) => o.kind === 'base-resin');
        const part = resin
          ? new Decimal(resin.quantity).times('0.2').toDecimalPlaces(1, Decimal.ROUND_DOWN)
          : new Decimal(0);
        if (resin && part.gt(0)) {
          back.push({
            lotId: resin.lotId,
            partQuantity: new Decimal(resin.quantity)
              .times('0.2')
              .toDecimalPlaces(1, Decimal.ROUND_DOWN)
              .toString(),
          });
        }
        const trim = out.find((o) => o.kind === 'trim' && new Decimal(o.quantity).gte(2));
        if (trim) {
          back.push({ lotId: trim.lotId, fullPacks: 1 });
        }
        if (back.length) {
          await site.returnIn(m, storeman, job, { lines: back, note: 'Back from site after the job' });
        }
      }
    }
    if (job.status !== d.status) {
      job.status = d.status;
      await repo.save(job);
    }
    await reservations.onStatusChange(m, job, ctx.userIds.estimator);
  }
}
