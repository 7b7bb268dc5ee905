import { BadRequestException, Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { checkStorageTemperature, Decimal } from '@potlife/domain';
import { DataSource, EntityManager } from 'typeorm';
import type { AuthUser } from '../common/current-user';
import { RuleViolation } from '../common/http-exception.filter';
import {
  CreateReadingDto,
  ImportReadingsDto,
  ImportReadingsResponse,
  ReadingResponse,
  ReadingsChartResponse,
  ReadingsQueryDto,
  RecordReadingResponse,
  TemperatureBandResponse,
} from './dto/temperature.dto';
import { ExposureService } from './exposure.service';
import { IdempotencyService } from './idempotency.service';
import { CsvShapeError, parseLoggerCsv } from './logger-csv';

const DAY_MS = 86_400_000;

@Injectable()
export class TemperaturesService {
  constructor(
    @InjectDataSource() private readonly db: DataSource,
    private readonly exposure: ExposureService,
    private readonly idempotency: IdempotencyService,
  ) {}

  /** A reading typed in. Out of a stored material's range, the lots there are flagged and listed. */
  record(user: AuthUser, dto: CreateReadingDto, key: string | undefined): Promise<RecordReadingResponse> {
    const takenAt = new Date(dto.takenAt);
    if (takenAt.getTime() > Date.now() + 5 * 60_000) {
      throw new BadRequestException({ message: 'takenAt: must not be in the future', code: 'validation_failed' });
    }
    return this.idempotency.run({ companyId: user.companyId, userId: user.id, key, route: 'POST /api/temperature-readings', request: dto }, async (m) => {
      const done = await this.exposure.record(m, { companyId: user.companyId, userId: user.id }, dto.locationId, [
        { takenAt, temperatureC: new Decimal(dto.temperatureC).toFixed(2), source: 'manual', note: dto.note ?? null },
      ]);
      const saved = done.saved[0];
      if (!saved) {
        throw new RuleViolation('There is already a reading for this location at that time.', 'duplicate_reading');
      }
      const [loc] = (await m.query(`SELECT name FROM locations WHERE id = $1`, [dto.locationId])) as { name: string }[];
      return {
        reading: {
          id: saved.id,
          locationId: dto.locationId,
          locationName: loc!.name,
          takenAt: saved.takenAt.toISOString(),
          temperatureC: saved.temperatureC,
          source: 'manual',
          note: saved.note ?? null,
          outOfBand: null,
        },
        flaggedLots: done.flagged,
      };
    });
  }

  /** A data logger's CSV: bad rows are left out and listed with their line; the rest are saved together. */
  import(user: AuthUser, dto: ImportReadingsDto, key: string | undefined): Promise<ImportReadingsResponse> {
    let parsed: ReturnType<typeof parseLoggerCsv>;
    try {
      parsed = parseLoggerCsv(dto.csv);
    } catch (err) {
      if (err instanceof CsvShapeError) {
        throw new BadRequestException({ message: `csv: ${err.message}`, code: 'validation_failed' });
      }
      throw err;
    }
    const work = async (m: EntityManager): Promise<ImportReadingsResponse> => {
      const done = await this.exposure.record(
        m,
        { companyId: user.companyId, userId: user.id },
        dto.locationId,
        parsed.readings.map((r) => ({ takenAt: r.takenAt, temperatureC: r.temperatureC, source: 'import' as const, row: r.row })),
        { dryRun: dto.dryRun },
      );
      const times = done.saved.map((s) => s.takenAt.getTime());
      return {
        dryRun: dto.dryRun ?? false,
        rows: parsed.rows,
        imported: done.saved.length,
        errors: parsed.errors,
        duplicates: done.duplicates.map((d) => ({ row: d.row ?? 0, message: `a reading for ${d.takenAt.toISOString()} is already held; skipped` })),
        firstTakenAt: times.length ? new Date(Math.min(...times)).toISOString() : null,
        lastTakenAt: times.length ? new Date(Math.max(...times)).toISOString() : null,
        flaggedLots: done.flagged,
      };
    };
    if (dto.dryRun) {
      // A preview writes nothing, so it needs no key.
      return this.db.transaction(work);
    }
    return this.idempotency.run(
      { companyId: user.companyId, userId: user.id, key, route: 'POST /api/temperature-readings/import', request: dto },
      work,
    );
  }

  /** Readings for the chart, with the band allowed by what is stored at the location now. */
  async chart(companyId: string, q: ReadingsQueryDto): Promise<ReadingsChartResponse> {
    const to = q.to ? new Date(q.to) : new Date();
    const from = q.from ? new Date(q.from) : new Date(to.getTime() - 30 * DAY_MS);
    if (from > to) {
      throw new BadRequestException({ message: 'from: must be before to', code: 'validation_failed' });
    }
    const params: unknown[] = [companyId, from.toISOString(), to.toISOString()];
    if (q.locationId) {
      params.push(q.locationId);
      const found: unknown[] = await this.db.query(`SELECT 1 FROM locations WHERE company_id = $1 AND id = $2`, [companyId, q.locationId]);
      if (found.length === 0) {
        throw new BadRequestException({ message: 'locationId: no such location', code: 'validation_failed' });
      }
    }
    const rows: (Omit<ReadingResponse, 'takenAt' | 'outOfBand'> & { takenAt: Date })[] = await this.db.query(
      `SELECT r.id, r.location_id AS "locationId", l.name AS "locationName", r.taken_at AS "takenAt", r.temperature_c::text AS "temperatureC",
              r.source, r.note
         FROM temperature_readings r JOIN locations l ON l.id = r.location_id
        WHERE r.company_id = $1 AND r.taken_at >= $2 AND r.taken_at <= $3 ${q.locationId ? 'AND r.location_id = $4' : ''}
        ORDER BY r.taken_at DESC LIMIT 10000`,
      params,
    );
    const band = q.locationId ? await this.band(companyId, q.locationId) : null;
    return {
      locationId: q.locationId ?? null,
      from: from.toISOString(),
      to: to.toISOString(),
      band,
      readings: rows.reverse().map((r) => ({
        ...r,
        takenAt: r.takenAt.toISOString(),
        outOfBand: band && (band.minC !== null || band.maxC !== null) ? outside(r.temperatureC, band) : null,
      })),
    };
  }

  /** The strictest range of the materials stored at a location (and its bays and shelves) now: the highest minimum and the lowest maximum. */
  async band(companyId: string, locationId: string): Promise<TemperatureBandResponse> {
    const zone = await this.exposure.readingZone(this.db.manager, companyId, locationId);
    const rows: { name: string; minC: string | null; maxC: string | null }[] = await this.db.query(
      `SELECT DISTINCT mt.name, mt.storage_min_c::text AS "minC", mt.storage_max_c::text AS "maxC"
         FROM lot_balances b JOIN lots l ON l.id = b.lot_id JOIN materials mt ON mt.id = l.material_id
        WHERE b.company_id = $1 AND b.location_id = ANY($2) AND b.quantity > 0 ORDER BY mt.name`,
      [companyId, zone],
    );
    let min: Decimal | null = null;
    let max: Decimal | null = null;
    for (const r of rows) {
      if (r.minC !== null && (min === null || min.lt(r.minC))) {
        min = new Decimal(r.minC);
      }
      if (r.maxC !== null && (max === null || max.gt(r.maxC))) {
        max = new Decimal(r.maxC);
      }
    }
    return { minC: min ? min.toFixed(1) : null, maxC: max ? max.toFixed(1) : null, materials: rows.map((r) => r.name) };
  }
}

/** Whether a reading is outside a band (domain checkStorageTemperature); a band whose ends cross (materials that cannot share a place) has nothing inside it. */
function outside(reading: string, band: TemperatureBandResponse): boolean {
  try {
    return !checkStorageTemperature(reading, band.minC ?? '-273.15', band.maxC ?? '1000').ok;
  } catch {
    return true;
  }
}
