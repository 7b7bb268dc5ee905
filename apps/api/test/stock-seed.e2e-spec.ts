import { DataSource } from 'typeorm';
import { seedCatalogue } from '../src/database/seeds/catalogue';
import { seedDemoCompany } from '../src/database/seeds/demo-company';
import { seedStock } from '../src/database/seeds/stock';
import { createTestApp, TestApp } from './app';
import { sql } from './stock-fixtures';

/** The demo stock: a real ledger, staggered expiry, a flagged excursion; safe to run twice. */
describe('demo stock seed', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());

  const run = () =>
    t.app.get(DataSource).transaction(async (m) => {
      const ctx = await seedDemoCompany(m);
      await seedCatalogue(m, ctx);
      await seedStock(m, ctx);
      return ctx;
    });

  const counts = async () =>
    (
      await sql<Record<string, number>>(
        t,
        `SELECT (SELECT count(*)::int FROM locations) AS locations, (SELECT count(*)::int FROM receipts) AS receipts,
                (SELECT count(*)::int FROM lots) AS lots, (SELECT count(*)::int FROM stock_movements) AS movements,
                (SELECT count(*)::int FROM temperature_readings) AS readings, (SELECT count(*)::int FROM lot_events) AS events`,
      )
    )[0]!;

  it('builds the demo stock once, and a second run changes nothing', async () => {
    const ctx = await run();
    const first = await counts();
    expect(first.locations).toBe(8);
    expect(first.receipts).toBe(5);
    expect(first.lots).toBeGreaterThanOrEqual(15);
    expect(first.readings).toBeGreaterThan(400);
    await run();
    expect(await counts()).toEqual(first);

    // the ledger is real: cached balances are the sums of movements
    const drift = await sql(
      t,
      `SELECT b.lot_id FROM lot_balances b
        LEFT JOIN (SELECT lot_id, location_id, sum(quantity) AS q FROM stock_movements GROUP BY lot_id, location_id) s
          ON s.lot_id = b.lot_id AND s.location_id = b.location_id
        WHERE b.quantity <> coalesce(s.q, 0)`,
    );
    expect(drift).toEqual([]);

    const lots = await sql<{ expired: number; soon: number; flagged: number; fitCatalyst: number; refused: number }>(
      t,
      `SELECT (SELECT count(*)::int FROM lots WHERE expires_on < current_date AND quantity > 0) AS expired,
              (SELECT count(*)::int FROM lots WHERE expires_on BETWEEN current_date AND current_date + 30 AND quantity > 0) AS soon,
              (SELECT count(*)::int FROM lots l JOIN materials m ON m.id = l.material_id WHERE l.exposure_flagged AND m.kind = 'catalyst') AS flagged,
              (SELECT count(*)::int FROM lots l JOIN materials m ON m.id = l.material_id WHERE NOT l.exposure_flagged AND m.kind = 'catalyst') AS "fitCatalyst",
              (SELECT coalesce(sum(packs_refused), 0)::int FROM receipt_lines) AS refused`,
    );
    // the catalyst received after the warm afternoon is not flagged: it was not there then
    expect(lots[0]).toEqual({ expired: 1, soon: 2, flagged: 2, fitCatalyst: 1, refused: 1 });
    const van = await sql(t, `SELECT 1 FROM lot_balances b JOIN locations l ON l.id = b.location_id WHERE l.name = 'Van 1' AND b.quantity > 0`);
    expect(van).toHaveLength(2);
    expect(ctx.companyId).toBeTruthy();
  });
});
