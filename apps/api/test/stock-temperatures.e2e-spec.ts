import { auth, createTestApp, TestApp } from './app';
import { createLocation, insertMaterial, insertJob, receive, stockWorld, StockWorld } from './stock-fixtures';
import { DataSource } from 'typeorm';
import { StockService } from '../src/stock/stock.service';

const ago = (minutes: number) => new Date(Date.now() - minutes * 60_000).toISOString();

/** Temperature readings, the exposure flag ("check before use") and data-logger imports. */
describe('temperatures', () => {
  let t: TestApp;
  let w: StockWorld;
  beforeAll(async () => {
    t = await createTestApp();
    w = await stockWorld(t);
  });
  afterAll(() => t.close());

  const reading = (body: Record<string, unknown>, who = w.storeman) => t.http().post('/api/temperature-readings').set(auth(who)).send(body);

  it('a reading above a material’s range flags the lots stored there then, and lists them', async () => {
    const shed = await createLocation(t, w.owner, { name: 'Resin shed', kind: 'store' });
    const r = await receive(t, w.storeman, [
      { materialId: w.material.resin, locationId: shed, packs: 2, packSize: '25', batch: 'HOT-1' },
      { materialId: w.material.mat, locationId: shed, packs: 1, packSize: '30' },
    ]);
    const resinLot = r.lines[0]!.lotId;
    const fine = await reading({ locationId: shed, temperatureC: '24.5', takenAt: ago(-1) }).expect(201);
    expect(fine.body.flaggedLots).toEqual([]);
    // resin stored 5–25 °C: 27.5 °C is too warm (domain checkStorageTemperature); the mat has no range
    const hot = await reading({ locationId: shed, temperatureC: '27.5', takenAt: new Date().toISOString(), note: 'door left open' }).expect(201);
    expect(hot.body.reading).toMatchObject({ locationId: shed, locationName: 'Resin shed', temperatureC: '27.50', source: 'manual', note: 'door left open' });
    expect(hot.body.flaggedLots).toEqual([
      expect.objectContaining({ lotId: resinLot, batchNumber: 'HOT-1', exposure: 'too-warm', newlyFlagged: true, readingId: hot.body.reading.id }),
    ]);
    expect(hot.body.flaggedLots[0].message).toMatch(/27\.5 °C is above the 25 °C the material may be stored at/);

    const lot = await t.http().get(`/api/lots/${resinLot}`).set(auth(w.estimator)).expect(200);
    expect(lot.body).toMatchObject({ exposureFlagged: true, usable: false });
    expect(lot.body.exposureReason).toMatch(/Resin shed/);
    expect(lot.body.events.map((e: { kind: string }) => e.kind)).toEqual(['flagged']);
    const ov = await t.http().get('/api/stock/overview').set(auth(w.storeman)).expect(200);
    expect(ov.body.temperatureAlerts).toEqual([expect.objectContaining({ lotId: resinLot, locationNames: ['Resin shed'] })]);

    // a flagged lot cannot go to a job until checked
    const stock = t.app.get(StockService);
    const jobId = await insertJob(t, w.companyId);
    await expect(
      t.app.get(DataSource).transaction((m) => stock.issueToJob(m, w.companyId, { id: w.storeman.user.id }, { lotId: resinLot, quantity: '1', jobId, fromLocationId: shed })),
    ).rejects.toThrow(/check before use/);

    // a second excursion does not flag it twice
    const again = await reading({ locationId: shed, temperatureC: '28', takenAt: ago(-2) }).expect(201);
    expect(again.body.flaggedLots).toEqual([expect.objectContaining({ lotId: resinLot, newlyFlagged: false })]);

    const cleared = await t.http().post(`/api/lots/${resinLot}/clear-flag`).set(auth(w.storeman)).send({ note: 'Lids sealed, resin clear, gel test fine' }).expect(200);
    expect(cleared.body).toMatchObject({ exposureFlagged: false, exposureReason: null, usable: true });
    expect(cleared.body.events.map((e: { kind: string; note: string }) => [e.kind, e.note])).toEqual([
      ['flagged', expect.stringMatching(/27\.5 °C/)],
      ['flag-cleared', 'Lids sealed, resin clear, gel test fine'],
    ]);
    await t.http().post(`/api/lots/${resinLot}/clear-flag`).set(auth(w.storeman)).send({ note: 'again' }).expect(409);
    await t.http().post(`/api/lots/${resinLot}/clear-flag`).set(auth(w.estimator)).send({ note: 'x' }).expect(403);
    await t.http().post(`/api/lots/${resinLot}/clear-flag`).set(auth(w.storeman)).send({}).expect(400);
  });

  it('flags what was there at the time of the reading: not what came after, and what has moved since', async () => {
    const shed = await createLocation(t, w.owner, { name: 'Timing shed', kind: 'store' });
    const early = await receive(t, w.storeman, [{ materialId: w.material.resin, locationId: shed, packs: 1, packSize: '25' }]);
    await new Promise((r) => setTimeout(r, 50));
    const between = new Date().toISOString();
    await new Promise((r) => setTimeout(r, 50));
    const late = await receive(t, w.storeman, [{ materialId: w.material.resin, locationId: shed, packs: 1, packSize: '25' }]);
    // the early lot leaves before anyone types the reading in
    await t.http().post('/api/stock-movements').set(auth(w.storeman)).send({ kind: 'transfer', lotId: early.lines[0]!.lotId, fromLocationId: shed, toLocationId: w.location.bayA, quantity: '25' }).expect(201);
    const res = await reading({ locationId: shed, temperatureC: '31', takenAt: between }).expect(201);
    expect(res.body.flaggedLots.map((f: { lotId: string }) => f.lotId)).toEqual([early.lines[0]!.lotId]);
    const lateLot = await t.http().get(`/api/lots/${late.lines[0]!.lotId}`).set(auth(w.storeman)).expect(200);
    expect(lateLot.body.exposureFlagged).toBe(false);
  });

  it('a reading in a store covers its bays and shelves, not a cabinet inside it', async () => {
    const store = await createLocation(t, w.owner, { name: 'Logger store', kind: 'store' });
    const bay = await createLocation(t, w.owner, { name: 'Logger store bay', kind: 'bay', parentId: store });
    const cab = await createLocation(t, w.owner, { name: 'Logger store cabinet', kind: 'flammables-cabinet', parentId: store });
    const inBay = await receive(t, w.storeman, [{ materialId: w.material.resin, locationId: bay, packs: 1, packSize: '25' }]);
    await receive(t, w.storeman, [{ materialId: w.material.resin, locationId: cab, packs: 1, packSize: '5' }]);
    const res = await reading({ locationId: store, temperatureC: '26', takenAt: new Date().toISOString() }).expect(201);
    expect(res.body.flaggedLots.map((f: { lotId: string }) => f.lotId)).toEqual([inBay.lines[0]!.lotId]);
    const band = await t.http().get(`/api/temperature-readings?locationId=${store}`).set(auth(w.storeman)).expect(200);
    expect(band.body.band).toMatchObject({ minC: '5.0', maxC: '25.0' });
  });

  it('too cold counts too, and the storeman may quarantine instead of clearing', async () => {
    const r = await receive(t, w.storeman, [{ materialId: w.material.catalyst, locationId: w.location.peroxide, packs: 3, packSize: '1' }]);
    // catalyst stored 0–25 °C: −2 °C is too cold
    const res = await reading({ locationId: w.location.peroxide, temperatureC: '-2', takenAt: new Date().toISOString() }).expect(201);
    expect(res.body.flaggedLots).toEqual([expect.objectContaining({ lotId: r.lines[0]!.lotId, exposure: 'too-cold' })]);
    const q = await t.http().post(`/api/lots/${r.lines[0]!.lotId}/quarantine`).set(auth(w.storeman)).send({ note: 'Frozen overnight; ask the maker' }).expect(200);
    expect(q.body).toMatchObject({ status: 'quarantined', exposureFlagged: true, usable: false });
    const ov = await t.http().get('/api/stock/overview').set(auth(w.storeman)).expect(200);
    expect(ov.body.temperatureAlerts.map((a: { lotId: string }) => a.lotId)).not.toContain(r.lines[0]!.lotId);
    const rel = await t.http().post(`/api/lots/${r.lines[0]!.lotId}/release`).set(auth(w.owner)).send({ note: 'maker says fine' }).expect(200);
    expect(rel.body).toMatchObject({ status: 'available', exposureFlagged: true });
    await t.http().post(`/api/lots/${r.lines[0]!.lotId}/release`).set(auth(w.owner)).send({ note: 'again' }).expect(409);
  });

  it('refuses a reading in the future and a second reading for the same moment', async () => {
    const at = ago(30);
    await reading({ locationId: w.location.van, temperatureC: '12', takenAt: at }).expect(201);
    expect((await reading({ locationId: w.location.van, temperatureC: '13', takenAt: at }).expect(409)).body.message).toMatch(/already a reading/);
    expect((await reading({ locationId: w.location.van, temperatureC: '13', takenAt: new Date(Date.now() + 3_600_000).toISOString() }).expect(400)).body.message).toMatch(/^takenAt:/);
    expect((await reading({ locationId: w.location.van, temperatureC: '13', takenAt: '2025-06-01 10:00' }).expect(400)).body.message).toMatch(/^takenAt:/);
  });

  describe('data logger CSV import', () => {
    it('imports the good rows, lists the bad ones by line, skips what is already held, and flags lots', async () => {
      const shed = await createLocation(t, w.owner, { name: 'Logger shed', kind: 'store' });
      const r = await receive(t, w.storeman, [{ materialId: w.material.resin, locationId: shed, packs: 1, packSize: '25' }], new Date(Date.now() - 3 * 86_400_000).toISOString().slice(0, 10));
      // the receipt is dated 3 days ago but booked now; the ledger says the lot arrived now
      const base = Date.now() - 60 * 60_000;
      const iso = (m: number) => new Date(base + m * 60_000).toISOString();
      const csv = [
        'timestamp,temperature',
        `${iso(0)},18.2`,
        `${iso(10)},warm`,
        `not-a-date,19`,
        `${iso(20)},19.4`,
        '',
        `${iso(30)},26.1`,
        `${iso(40)},999`,
      ].join('\n');
      const preview = await t.http().post('/api/temperature-readings/import').set(auth(w.storeman)).send({ locationId: shed, csv, dryRun: true }).expect(201);
      expect(preview.body).toMatchObject({ dryRun: true, rows: 6, imported: 3 });
      expect((await t.http().get(`/api/temperature-readings?locationId=${shed}&from=${iso(-5)}`).set(auth(w.storeman)).expect(200)).body.readings).toEqual([]);

      const res = await t.http().post('/api/temperature-readings/import').set(auth(w.storeman)).send({ locationId: shed, csv }).expect(201);
      expect(res.body).toMatchObject({ dryRun: false, rows: 6, imported: 3, duplicates: [], firstTakenAt: iso(0), lastTakenAt: iso(30) });
      expect(res.body.errors).toEqual([
        { row: 3, message: expect.stringMatching(/temperature "warm" is not a number/) },
        { row: 4, message: expect.stringMatching(/timestamp "not-a-date" is not a date and time/) },
        { row: 8, message: expect.stringMatching(/999\.00 °C is not a storage temperature/) },
      ]);
      // the lot arrived after these readings (the ledger's time), so none of them flags it
      expect(res.body.flaggedLots).toEqual([]);

      const again = await t.http().post('/api/temperature-readings/import').set(auth(w.storeman)).send({ locationId: shed, csv }).expect(201);
      expect(again.body.imported).toBe(0);
      expect(again.body.duplicates.map((d: { row: number }) => d.row)).toEqual([2, 5, 7]);

      const later = `timestamp,temperature\n${new Date().toISOString()},25.8\n`;
      const flagged = await t.http().post('/api/temperature-readings/import').set(auth(w.storeman)).send({ locationId: shed, csv: later }).expect(201);
      expect(flagged.body.flaggedLots).toEqual([expect.objectContaining({ lotId: r.lines[0]!.lotId, exposure: 'too-warm' })]);
    });

    it('answers 400 naming csv for a file without the two columns', async () => {
      const res = await t.http().post('/api/temperature-readings/import').set(auth(w.storeman)).send({ locationId: w.location.van, csv: 'when,reading\n1,2\n' }).expect(400);
      expect(res.body.message).toMatch(/^csv: the first line must name a timestamp column and a temperature column/);
      await t.http().post('/api/temperature-readings/import').set(auth(w.estimator)).send({ locationId: w.location.van, csv: 'timestamp,temperature\n' }).expect(403);
    });
  });

  it('the chart gives the readings and the strictest band of what is stored there', async () => {
    const shed = await createLocation(t, w.owner, { name: 'Chart shed', kind: 'store' });
    const warmish = await insertMaterial(t, w.companyId, { code: 'T-TOP', name: 'Test topcoat', kind: 'topcoat', stockUnit: 'kg', shelfLifeDays: 90, storageMinC: '10', storageMaxC: '30', hazardClass: '3' });
    await receive(t, w.storeman, [
      { materialId: w.material.resin, locationId: shed, packs: 1, packSize: '25' },
      { materialId: warmish, locationId: shed, packs: 1, packSize: '20' },
    ]);
    await reading({ locationId: shed, temperatureC: '8', takenAt: ago(120) }).expect(201);
    await reading({ locationId: shed, temperatureC: '18', takenAt: ago(60) }).expect(201);
    const chart = await t.http().get(`/api/temperature-readings?locationId=${shed}`).set(auth(w.estimator)).expect(200);
    // resin 5–25 °C and topcoat 10–30 °C: the band is 10–25 °C (the highest minimum, the lowest maximum)
    expect(chart.body.band).toEqual({ minC: '10.0', maxC: '25.0', materials: ['Test base resin', 'Test topcoat'] });
    expect(chart.body.readings.map((r: { temperatureC: string; outOfBand: boolean }) => [r.temperatureC, r.outOfBand])).toEqual([
      ['8.00', true],
      ['18.00', false],
    ]);
    const all = await t.http().get('/api/temperature-readings').set(auth(w.estimator)).expect(200);
    expect(all.body.band).toBeNull();
    expect(all.body.readings.length).toBeGreaterThanOrEqual(2);
    await t.http().get('/api/temperature-readings?from=2025-01-01').set(auth(w.estimator)).expect(400);
  });
});
