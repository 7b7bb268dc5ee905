import { Injectable, NotFoundException } from '@nestjs/common';
import { checkStorageTemperature, Decimal } from '@potlife/domain';
import { randomUUID } from 'node:crypto';
import { EntityManager } from 'typeorm';
import type { FlaggedLotResponse } from './dto/temperature.dto';
import { lotLabel } from './ledger.service';
import { zoneMembers, PlaceNode } from './placement';

export interface ReadingInput {
  takenAt: Date;
  temperatureC: string;
  source: 'manual' | 'import';
  note?: string | null;
  /** the line of an imported file, for messages */
  row?: number;
}

export interface SavedReading extends ReadingInput {
  id: string;
}

export interface Recorded {
  saved: SavedReading[];
  /** readings already held for that moment at that location, not saved again */
  duplicates: ReadingInput[];
  flagged: FlaggedLotResponse[];
}

/** Below any storage temperature there is and above any there is: one end of a range left open. */
const OPEN_MIN = '-273.15';
const OPEN_MAX = '1000';

const fmt = (d: Date) => d.toISOString().slice(0, 16).replace('T', ' ');

/**
 * Temperature readings and the exposure flag. A reading outside a material's storage range
 * (domain checkStorageTemperature) flags every lot of that material that was stored at the
 * location (or a bay or shelf inside it) at the moment of the reading — worked out from the ledger, so an imported logger file
 * flags what was there then, even if it has moved since — as "check before use".
 * No constructor dependencies: the demo seed uses it too.
 */
@Injectable()
export class ExposureService {
  async record(
    m: EntityManager,
    ctx: { companyId: string; userId: string | null },
    locationId: string,
    readings: readonly ReadingInput[],
    opts: { dryRun?: boolean } = {},
  ): Promise<Recorded> {
    const [loc] = (await m.query(`SELECT name FROM locations WHERE company_id = $1 AND id = $2`, [ctx.companyId, locationId])) as { name: string }[];
    if (!loc) {
      throw new NotFoundException('Location not found');
    }
    const times = readings.map((r) => r.takenAt.toISOString());
    const held = new Set(
      (
        (await m.query(`SELECT taken_at AS t FROM temperature_readings WHERE location_id = $1 AND taken_at = ANY($2::timestamptz[])`, [locationId, times])) as {
          t: Date;
        }[]
      ).map((r) => r.t.getTime()),
    );
    const fresh: ReadingInput[] = [];
    const duplicates: ReadingInput[] = [];
    const seen = new Set<number>();
    for (const r of readings) {
      const t = r.takenAt.getTime();
      if (held.has(t) || seen.has(t)) {
        duplicates.push(r);
      } else {
        seen.add(t);
        fresh.push(r);
      }
    }
    const saved: SavedReading[] = fresh.map((r) => ({ ...r, id: randomUUID() }));
    if (!opts.dryRun) {
      for (let i = 0; i < saved.length; i += 1000) {
        const chunk = saved.slice(i, i + 1000);
        await m.query(
          `INSERT INTO temperature_readings (id, company_id, location_id, taken_at, temperature_c, source, note, user_id)
           SELECT * FROM unnest($1::uuid[], $2::uuid[], $3::uuid[], $4::timestamptz[], $5::numeric[], $6::varchar[], $7::text[], $8::uuid[])`,
          [
            chunk.map((r) => r.id),
            chunk.map(() => ctx.companyId),
            chunk.map(() => locationId),
            chunk.map((r) => r.takenAt.toISOString()),
            chunk.map((r) => r.temperatureC),
            chunk.map((r) => r.source),
            chunk.map((r) => r.note ?? null),
            chunk.map(() => ctx.userId),
          ],
        );
      }
    }
    const flagged = await this.flag(m, ctx, locationId, loc.name, saved, opts.dryRun ?? false);
    return { saved, duplicates, flagged };
  }

  /**
   * Where a reading applies: the location and the bays and shelves inside it (open parts of the
   * same room). A cabinet or store inside it keeps its own temperature and takes its own readings.
   */
  async readingZone(m: EntityManager, companyId: string, locationId: string): Promise<string[]> {
    const rows: PlaceNode[] = await m.query(
      `SELECT id, name, kind, parent_id AS "parentId", capacity_litres::text AS "capacityLitres", allowed_hazard_classes AS "allowedHazardClasses", active
         FROM locations WHERE company_id = $1`,
      [companyId],
    );
    const nodes = new Map(rows.map((r) => [r.id, r]));
    const self = nodes.get(locationId);
    return self ? [...zoneMembers(self, nodes)] : [locationId];
  }

  private async flag(
    m: EntityManager,
    ctx: { companyId: string; userId: string | null },
    locationId: string,
    locationName: string,
    readings: readonly SavedReading[],
    dryRun: boolean,
  ): Promise<FlaggedLotResponse[]> {
    if (readings.length === 0) {
      return [];
    }
    const sorted = [...readings].sort((a, b) => a.takenAt.getTime() - b.takenAt.getTime());
    const last = sorted[sorted.length - 1]!.takenAt;
    const members = await this.readingZone(m, ctx.companyId, locationId);
    const moves: { lotId: string; quantity: string; at: Date }[] = await m.query(
      `SELECT lot_id AS "lotId", quantity::text AS quantity, created_at AS at FROM stock_movements
        WHERE company_id = $1 AND location_id = ANY($2) AND created_at <= $3 ORDER BY created_at, id`,
      [ctx.companyId, members, last.toISOString()],
    );
    if (moves.length === 0) {
      return [];
    }
    const lotIds = [...new Set(moves.map((mv) => mv.lotId))];
    const lots: {
      id: string;
      materialName: string;
      batchNumber: string | null;
      minC: string | null;
      maxC: string | null;
      quantity: string;
      status: string;
      exposureFlagged: boolean;
    }[] = await m.query(
      `SELECT l.id, mt.name AS "materialName", l.batch_number AS "batchNumber", mt.storage_min_c::text AS "minC", mt.storage_max_c::text AS "maxC",
              l.quantity::text AS quantity, l.status, l.exposure_flagged AS "exposureFlagged"
         FROM lots l JOIN materials mt ON mt.id = l.material_id WHERE l.company_id = $1 AND l.id = ANY($2)`,
      [ctx.companyId, lotIds],
    );
    const byId = new Map(lots.filter((l) => l.minC !== null || l.maxC !== null).map((l) => [l.id, l]));
    if (byId.size === 0) {
      return [];
    }
    const balance = new Map<string, Decimal>();
    const hits = new Map<string, { reading: SavedReading; exposure: string; message: string }>();
    let k = 0;
    for (const r of sorted) {
      while (k < moves.length && moves[k]!.at.getTime() <= r.takenAt.getTime()) {
        const mv = moves[k++]!;
        balance.set(mv.lotId, (balance.get(mv.lotId) ?? new Decimal(0)).plus(mv.quantity));
      }
      for (const [lotId, q] of balance) {
        const lot = byId.get(lotId);
        if (!lot || q.lte(0) || hits.has(lotId)) {
          continue;
        }
        const check = checkStorageTemperature(r.temperatureC, lot.minC ?? OPEN_MIN, lot.maxC ?? OPEN_MAX);
        if (!check.ok) {
          hits.set(lotId, { reading: r, exposure: check.exposure, message: `${locationName}, ${fmt(r.takenAt)} UTC: ${check.message}` });
        }
      }
    }
    // Lots used up or written off since have nothing left to check.
    const live = [...hits.entries()].filter(([id]) => {
      const lot = byId.get(id)!;
      return new Decimal(lot.quantity).gt(0) && lot.status !== 'written-off';
    });
    if (live.length === 0) {
      return [];
    }
    const ids = live.map(([id]) => id).sort();
    const locked = dryRun
      ? lots.filter((l) => ids.includes(l.id))
      : ((await m.query(`SELECT id, exposure_flagged AS "exposureFlagged" FROM lots WHERE id = ANY($1) ORDER BY id FOR UPDATE`, [ids])) as {
          id: string;
          exposureFlagged: boolean;
        }[]);
    const already = new Set(locked.filter((l) => l.exposureFlagged).map((l) => l.id));
    const out: FlaggedLotResponse[] = [];
    for (const [lotId, hit] of live) {
      const lot = byId.get(lotId)!;
      const fresh = !already.has(lotId);
      if (fresh && !dryRun) {
        await m.query(`UPDATE lots SET exposure_flagged = true, exposure_reason = $2, exposure_flagged_at = $3, updated_at = now() WHERE id = $1`, [
          lotId,
          hit.message,
          hit.reading.takenAt.toISOString(),
        ]);
        await m.query(`INSERT INTO lot_events (company_id, lot_id, kind, note, reading_id, user_id) VALUES ($1, $2, 'flagged', $3, $4, $5)`, [
          ctx.companyId,
          lotId,
          hit.message,
          hit.reading.id,
          ctx.userId,
        ]);
      }
      out.push({
        lotId,
        materialName: lot.materialName,
        batchNumber: lot.batchNumber,
        exposure: hit.exposure,
        message: `${lotLabel(lot)}: ${hit.message}`,
        readingId: hit.reading.id,
        takenAt: hit.reading.takenAt.toISOString(),
        newlyFlagged: fresh,
      });
    }
    return out.sort((a, b) => a.materialName.localeCompare(b.materialName));
  }
}
