import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { countVariance, Decimal, roundMoney } from '@potlife/domain';
import { DataSource, EntityManager } from 'typeorm';
import type { AuthUser } from '../common/current-user';
import { RuleViolation } from '../common/http-exception.filter';
import type { CountStatus } from './entities/stock-count.entity';
import {
  ApproveCountDto,
  CountEntryDto,
  CountEntriesDto,
  CountLineResponse,
  CountResponse,
  CountsQueryDto,
  CountSummaryResponse,
  OpenCountDto,
  RejectCountDto,
  SubmitCountDto,
} from './dto/count.dto';
import { IdempotencyService } from './idempotency.service';
import { balanceKey, LedgerService, NewMovement } from './ledger.service';
import { StockReader } from './stock-reader.service';

interface CountRow {
  id: string;
  number: number;
  status: CountStatus;
  locationId: string | null;
  scopeName: string | null;
  note: string | null;
  openedAt: Date;
  openedByName: string;
  submittedAt: Date | null;
  submittedByName: string | null;
  decidedAt: Date | null;
  decidedByName: string | null;
  decisionNote: string | null;
  lineCount: number;
  countedCount: number;
}

/**
 * Counts. How movements and a count fit together (the choice made here):
 *
 * - While a count is **open** (being counted), every movement at its locations is refused
 *   (LedgerService.assertNotBeingCounted). The expected figures snapshot at opening therefore
 *   stay the ledger's figures for as long as people are counting, and what they count is
 *   compared with exactly what the ledger says.
 * - Once **submitted**, stock may move again (jobs go on while the owner looks at it). On
 *   approval each line posts an adjustment of counted − expected (domain countVariance), the
 *   variance only, on top of whatever moved since: the balance becomes counted + the movements
 *   after submission, which is what is on the shelf. An adjustment that would take a balance
 *   below zero (stock counted has since gone out) is refused; the owner reopens the count.
 * - **Reopening** takes the expected figures afresh from the ledger and clears the counted ones:
 *   the location is counted again. Only one open or submitted count may cover a location.
 */
@Injectable()
export class CountsService {
  constructor(
    @InjectDataSource() private readonly db: DataSource,
    private readonly ledger: LedgerService,
    private readonly reader: StockReader,
    private readonly idempotency: IdempotencyService,
  ) {}

  open(user: AuthUser, dto: OpenCountDto, key: string | undefined): Promise<CountResponse> {
    return this.idempotency.run({ companyId: user.companyId, userId: user.id, key, route: 'POST /api/stock-counts', request: dto }, async (m) => {
      await m.query(`SELECT pg_advisory_xact_lock(hashtext('stock_counts:' || $1::text))`, [user.companyId]);
      const all = await this.ledger.allLocations(m, user.companyId);
      let scope: string[];
      if (dto.locationId) {
        if (!all.has(dto.locationId)) {
          throw new NotFoundException('Location not found');
        }
        scope = [dto.locationId];
        for (let grew = true; grew; ) {
          grew = false;
          for (const loc of all.values()) {
            if (loc.parentId && scope.includes(loc.parentId) && !scope.includes(loc.id)) {
              scope.push(loc.id);
              grew = true;
            }
          }
        }
      } else {
        scope = [...all.keys()];
      }
      if (scope.length === 0) {
        throw new RuleViolation('There are no locations to count yet: add the store and its locations first.', 'nothing_to_count');
      }
      // Lock the locations: no movement there can slip in between the snapshot and the count.
      await this.ledger.lockLocations(m, user.companyId, scope);
      const [clash] = (await m.query(
        `SELECT c.number, c.status, l.name FROM stock_count_locations scl JOIN stock_counts c ON c.id = scl.count_id JOIN locations l ON l.id = scl.location_id
          WHERE c.company_id = $1 AND c.status IN ('open', 'submitted') AND scl.location_id = ANY($2) ORDER BY c.number LIMIT 1`,
        [user.companyId, scope],
      )) as { number: number; status: string; name: string }[];
      if (clash) {
        throw new RuleViolation(
          `${clash.name} is already in count ${clash.number}, which is ${clash.status === 'open' ? 'being counted' : 'awaiting approval'}: finish that one first.`,
          'count_overlaps',
        );
      }
      const [{ next }] = (await m.query(`SELECT coalesce(max(number), 0) + 1 AS next FROM stock_counts WHERE company_id = $1`, [user.companyId])) as [
        { next: number },
      ];
      const [{ id }] = (await m.query(
        `INSERT INTO stock_counts (company_id, number, location_id, status, note, opened_by) VALUES ($1, $2, $3, 'open', $4, $5) RETURNING id`,
        [user.companyId, next, dto.locationId ?? null, dto.note ?? null, user.id],
      )) as [{ id: string }];
      await m.query(`INSERT INTO stock_count_locations (count_id, location_id) SELECT $1, unnest($2::uuid[])`, [id, scope]);
      await this.snapshot(m, user.companyId, id, scope);
      return this.read(m, user, id);
    });
  }

  /** Expected figures: every lot with stock at the count's locations, as the ledger has it now. */
  private async snapshot(m: EntityManager, companyId: string, countId: string, scope: string[]): Promise<void> {
    await m.query(
      `INSERT INTO stock_count_lines (company_id, count_id, lot_id, location_id, expected_quantity, unit_cost)
       SELECT b.company_id, $2, b.lot_id, b.location_id, b.quantity, l.unit_cost
         FROM lot_balances b JOIN lots l ON l.id = b.lot_id
        WHERE b.company_id = $1 AND b.location_id = ANY($3) AND b.quantity > 0`,
      [companyId, countId, scope],
    );
  }

  async list(user: AuthUser, q: CountsQueryDto): Promise<CountSummaryResponse[]> {
    const rows = await this.rows(this.db.manager, user.companyId, q.status ? { status: q.status } : {});
    return rows.map((r) => this.summary(r));
  }

  get(user: AuthUser, id: string): Promise<CountResponse> {
    return this.read(this.db.manager, user, id);
  }

  /** PATCH /api/stock-counts/{id}: saves counted quantities while the count is open. */
  enter(user: AuthUser, id: string, dto: CountEntriesDto): Promise<CountResponse> {
    return this.db.transaction(async (m) => {
      await this.lockOpen(m, user.companyId, id);
      await this.saveEntries(m, user, id, dto.lines);
      return this.read(m, user, id);
    });
  }

  submit(user: AuthUser, id: string, dto: SubmitCountDto, key: string | undefined): Promise<CountResponse> {
    return this.idempotency.run(
      { companyId: user.companyId, userId: user.id, key, route: 'POST /api/stock-counts/{id}/submit', request: { id, ...dto } },
      async (m) => {
        await this.lockOpen(m, user.companyId, id);
        if (dto.lines?.length) {
          await this.saveEntries(m, user, id, dto.lines);
        }
        const missing: { name: string; batch: string | null; location: string }[] = await m.query(
          `SELECT mt.name, l.batch_number AS batch, loc.name AS location FROM stock_count_lines cl
             JOIN lots l ON l.id = cl.lot_id JOIN materials mt ON mt.id = l.material_id JOIN locations loc ON loc.id = cl.location_id
            WHERE cl.count_id = $1 AND cl.counted_quantity IS NULL ORDER BY loc.name, mt.name`,
          [id],
        );
        if (missing.length > 0) {
          const list = missing
            .slice(0, 5)
            .map((x) => `${x.name}${x.batch ? ` ${x.batch}` : ''} at ${x.location}`)
            .join('; ');
          throw new RuleViolation(
            `${missing.length} line${missing.length === 1 ? ' is' : 's are'} not counted yet (${list}${missing.length > 5 ? '; …' : ''}): enter 0 for what is not there.`,
            'count_incomplete',
          );
        }
        await m.query(`UPDATE stock_counts SET status = 'submitted', submitted_by = $2, submitted_at = now() WHERE id = $1`, [id, user.id]);
        return this.read(m, user, id);
      },
    );
  }

  /** The owner approves: each variance posts as an adjustment with the reason "count <number>". */
  approve(user: AuthUser, id: string, dto: ApproveCountDto, key: string | undefined): Promise<CountResponse> {
    return this.idempotency.run(
      { companyId: user.companyId, userId: user.id, key, route: 'POST /api/stock-counts/{id}/approve', request: { id, ...dto } },
      async (m) => {
        const count = await this.lock(m, user.companyId, id);
        if (count.status !== 'submitted') {
          throw new RuleViolation(`Count ${count.number} is ${count.status}: only a submitted count can be approved.`, 'count_not_submitted');
        }
        const lines: { lotId: string; locationId: string; expected: string; counted: string; unitCost: string }[] = await m.query(
          `SELECT lot_id AS "lotId", location_id AS "locationId", expected_quantity::text AS expected, counted_quantity::text AS counted, unit_cost::text AS "unitCost"
             FROM stock_count_lines WHERE count_id = $1 ORDER BY lot_id, location_id`,
          [id],
        );
        const rows: NewMovement[] = [];
        for (const l of lines) {
          const v = countVariance(l.expected, l.counted, l.unitCost);
          if (v.kind !== 'match') {
            rows.push({
              kind: 'adjustment',
              lotId: l.lotId,
              locationId: l.locationId,
              quantity: v.varianceQuantity,
              reason: `count ${count.number}`,
              note: dto.note ?? null,
              countId: id,
            });
          }
        }
        if (rows.length > 0) {
          const lots = await this.ledger.lockLots(m, user.companyId, rows.map((r) => r.lotId));
          const locations = await this.ledger.lockLocations(m, user.companyId, [...new Set(rows.map((r) => r.locationId))]);
          const balances = await this.ledger.lockBalances(m, [...lots.keys()]);
          // Losses last within a lot and location is not needed: each line is its own (lot, location).
          rows.sort((a, b) => balanceKey(a.lotId, a.locationId).localeCompare(balanceKey(b.lotId, b.locationId)));
          await this.ledger.append(m, { companyId: user.companyId, userId: user.id }, lots, balances, locations, rows);
        }
        await m.query(`UPDATE stock_counts SET status = 'approved', decided_by = $2, decided_at = now(), decision_note = $3 WHERE id = $1`, [
          id,
          user.id,
          dto.note ?? null,
        ]);
        return this.read(m, user, id);
      },
    );
  }

  /** The owner sends a count back: reopen (count again, expected taken afresh) or cancel it. */
  reject(user: AuthUser, id: string, dto: RejectCountDto, key: string | undefined): Promise<CountResponse> {
    return this.idempotency.run(
      { companyId: user.companyId, userId: user.id, key, route: 'POST /api/stock-counts/{id}/reject', request: { id, ...dto } },
      async (m) => {
        const count = await this.lock(m, user.companyId, id);
        if (dto.action === 'cancel') {
          if (count.status !== 'open' && count.status !== 'submitted') {
            throw new RuleViolation(`Count ${count.number} is ${count.status} and cannot be cancelled.`, 'count_closed');
          }
          await m.query(`UPDATE stock_counts SET status = 'cancelled', decided_by = $2, decided_at = now(), decision_note = $3 WHERE id = $1`, [id, user.id, dto.note]);
          return this.read(m, user, id);
        }
        if (count.status !== 'submitted') {
          throw new RuleViolation(`Count ${count.number} is ${count.status}: only a submitted count can be reopened.`, 'count_not_submitted');
        }
        const scope: { locationId: string }[] = await m.query(`SELECT location_id AS "locationId" FROM stock_count_locations WHERE count_id = $1`, [id]);
        const ids = scope.map((s) => s.locationId);
        await this.ledger.lockLocations(m, user.companyId, ids);
        await m.query(`DELETE FROM stock_count_lines WHERE count_id = $1`, [id]);
        await this.snapshot(m, user.companyId, id, ids);
        await m.query(
          `UPDATE stock_counts SET status = 'open', submitted_by = NULL, submitted_at = NULL, opened_at = now(), decision_note = $2 WHERE id = $1`,
          [id, dto.note],
        );
        return this.read(m, user, id);
      },
    );
  }

  private async lock(m: EntityManager, companyId: string, id: string): Promise<{ number: number; status: CountStatus }> {
    const [row] = (await m.query(`SELECT number, status FROM stock_counts WHERE company_id = $1 AND id = $2 FOR UPDATE`, [companyId, id])) as {
      number: number;
      status: CountStatus;
    }[];
    if (!row) {
      throw new NotFoundException('Count not found');
    }
    return row;
  }

  private async lockOpen(m: EntityManager, companyId: string, id: string): Promise<void> {
    const row = await this.lock(m, companyId, id);
    if (row.status !== 'open') {
      throw new RuleViolation(`Count ${row.number} is ${row.status}: counted figures can only be entered while it is open.`, 'count_not_open');
    }
  }

  private async saveEntries(m: EntityManager, user: AuthUser, countId: string, entries: readonly CountEntryDto[]): Promise<void> {
    const scope = new Set(
      ((await m.query(`SELECT location_id AS id FROM stock_count_locations WHERE count_id = $1`, [countId])) as { id: string }[]).map((r) => r.id),
    );
    for (const [i, e] of entries.entries()) {
      const [line] = (await m.query(`SELECT id FROM stock_count_lines WHERE count_id = $1 AND lot_id = $2 AND location_id = $3`, [
        countId,
        e.lotId,
        e.locationId,
      ])) as { id: string }[];
      if (line) {
        await m.query(`UPDATE stock_count_lines SET counted_quantity = $2, counted_by = $3, counted_at = now() WHERE id = $1`, [line.id, e.countedQuantity, user.id]);
        continue;
      }
      // A lot found on the shelf that the ledger did not put there when the count opened.
      if (!scope.has(e.locationId)) {
        throw new RuleViolation(`lines[${i}].locationId: that location is not part of this count.`, 'not_in_count', 422);
      }
      const [lot] = (await m.query(
        `SELECT l.unit_cost::text AS "unitCost", coalesce(b.quantity, 0)::text AS balance FROM lots l
           LEFT JOIN lot_balances b ON b.lot_id = l.id AND b.location_id = $3
          WHERE l.company_id = $1 AND l.id = $2`,
        [user.companyId, e.lotId, e.locationId],
      )) as { unitCost: string; balance: string }[];
      if (!lot) {
        throw new NotFoundException(`Lot not found (lines[${i}].lotId)`);
      }
      await m.query(
        `INSERT INTO stock_count_lines (company_id, count_id, lot_id, location_id, expected_quantity, counted_quantity, unit_cost, found_during_count, counted_by, counted_at)
         VALUES ($1, $2, $3, $4, $5, $6, $7, true, $8, now())`,
        [user.companyId, countId, e.lotId, e.locationId, lot.balance, e.countedQuantity, lot.unitCost, user.id],
      );
    }
  }

  private async rows(m: EntityManager, companyId: string, f: { id?: string; status?: CountStatus }): Promise<CountRow[]> {
    const where = ['c.company_id = $1'];
    const params: unknown[] = [companyId];
    if (f.id) {
      params.push(f.id);
      where.push(`c.id = $${params.length}`);
    }
    if (f.status) {
      params.push(f.status);
      where.push(`c.status = $${params.length}`);
    }
    return m.query(
      `SELECT c.id, c.number, c.status, c.location_id AS "locationId", loc.name AS "scopeName", c.note, c.opened_at AS "openedAt",
              coalesce(uo.name, '') AS "openedByName", c.submitted_at AS "submittedAt", us.name AS "submittedByName",
              c.decided_at AS "decidedAt", ud.name AS "decidedByName", c.decision_note AS "decisionNote",
              (SELECT count(*)::int FROM stock_count_lines x WHERE x.count_id = c.id) AS "lineCount",
              (SELECT count(*)::int FROM stock_count_lines x WHERE x.count_id = c.id AND x.counted_quantity IS NOT NULL) AS "countedCount"
         FROM stock_counts c LEFT JOIN locations loc ON loc.id = c.location_id
         LEFT JOIN users uo ON uo.id = c.opened_by LEFT JOIN users us ON us.id = c.submitted_by LEFT JOIN users ud ON ud.id = c.decided_by
        WHERE ${where.join(' AND ')} ORDER BY c.number DESC`,
      params,
    );
  }

  private summary(r: CountRow): CountSummaryResponse {
    return {
      id: r.id,
      number: r.number,
      status: r.status,
      locationId: r.locationId,
      scopeName: r.scopeName ?? 'Everything',
      note: r.note,
      openedAt: r.openedAt.toISOString(),
      openedByName: r.openedByName,
      submittedAt: r.submittedAt?.toISOString() ?? null,
      submittedByName: r.submittedByName,
      decidedAt: r.decidedAt?.toISOString() ?? null,
      decidedByName: r.decidedByName,
      decisionNote: r.decisionNote,
      lineCount: r.lineCount,
      countedCount: r.countedCount,
    };
  }

  /** A count as `user` may see it: while open, only an owner sees the expected figures (blind entry). */
  private async read(m: EntityManager, user: AuthUser, id: string): Promise<CountResponse> {
    const [row] = await this.rows(m, user.companyId, { id });
    if (!row) {
      throw new NotFoundException('Count not found');
    }
    const visible = row.status !== 'open' || user.role === 'owner';
    const lines: {
      id: string;
      lotId: string;
      batchNumber: string | null;
      materialId: string;
      materialName: string;
      materialCode: string;
      stockUnit: string;
      locationId: string;
      locationName: string;
      expected: string;
      counted: string | null;
      unitCost: string;
      foundDuringCount: boolean;
      countedAt: Date | null;
    }[] = await m.query(
      `SELECT cl.id, cl.lot_id AS "lotId", l.batch_number AS "batchNumber", l.material_id AS "materialId", mt.name AS "materialName",
              mt.code AS "materialCode", mt.stock_unit AS "stockUnit", cl.location_id AS "locationId", loc.name AS "locationName",
              cl.expected_quantity::text AS expected, cl.counted_quantity::text AS counted, cl.unit_cost::text AS "unitCost",
              cl.found_during_count AS "foundDuringCount", cl.counted_at AS "countedAt"
         FROM stock_count_lines cl JOIN lots l ON l.id = cl.lot_id JOIN materials mt ON mt.id = l.material_id JOIN locations loc ON loc.id = cl.location_id
        WHERE cl.count_id = $1 ORDER BY loc.name, mt.name, l.expires_on NULLS LAST, l.batch_number`,
      [id],
    );
    let value = new Decimal(0);
    let losses = 0;
    let surpluses = 0;
    const shown: CountLineResponse[] = lines.map((l) => {
      const v = l.counted !== null ? countVariance(l.expected, l.counted, l.unitCost) : null;
      if (v && visible) {
        value = value.plus(v.varianceValue);
        losses += v.kind === 'loss' ? 1 : 0;
        surpluses += v.kind === 'surplus' ? 1 : 0;
      }
      return {
        id: l.id,
        lotId: l.lotId,
        batchNumber: l.batchNumber,
        materialId: l.materialId,
        materialName: l.materialName,
        materialCode: l.materialCode,
        stockUnit: l.stockUnit,
        locationId: l.locationId,
        locationName: l.locationName,
        expectedQuantity: visible ? l.expected : null,
        countedQuantity: l.counted,
        varianceQuantity: visible && v ? v.varianceQuantity.toFixed(3) : null,
        varianceValue: visible && v ? v.varianceValue.toFixed(2) : null,
        varianceKind: visible && v ? v.kind : null,
        unitCost: l.unitCost,
        foundDuringCount: l.foundDuringCount,
        countedAt: l.countedAt?.toISOString() ?? null,
      };
    });
    const scope: { name: string }[] = await m.query(
      `SELECT l.name FROM stock_count_locations s JOIN locations l ON l.id = s.location_id WHERE s.count_id = $1 ORDER BY l.name`,
      [id],
    );
    const adjustments =
      row.status === 'approved' ? (await this.reader.movements(m, user.companyId, { countId: id, limit: 1000 })).items : [];
    return {
      ...this.summary(row),
      expectedVisible: visible,
      locationNames: scope.map((s) => s.name),
      lines: shown,
      totals: {
        lines: lines.length,
        counted: lines.filter((l) => l.counted !== null).length,
        losses,
        surpluses,
        varianceValue: visible ? roundMoney(value).toFixed(2) : null,
      },
      adjustments,
    };
  }
}
