import { BadRequestException, Injectable, NotFoundException } from '@nestjs/common';
import { Decimal } from '@potlife/domain';
import { EntityManager } from 'typeorm';
import { RuleViolation } from '../common/http-exception.filter';
import type { WriteOffReason } from './entities/stock-movement.entity';
import { LedgerContext, LedgerService, lotLabel, LotRow, NewMovement, placedMaterial } from './ledger.service';
import { lotIsUsable } from './stock-reader.service';
import { expiryInfo } from './stock-dates';

/** What an operation appended. */
export interface Posted {
  operationId: string;
  /** the new movements' ids, in the order appended */
  ids: string[];
  lotId: string;
  warnings: string[];
}

export interface TransferInput {
  lotId: string;
  fromLocationId: string;
  toLocationId: string;
  quantity: Decimal;
  note?: string | null;
}

export interface AdjustmentInput {
  lotId: string;
  locationId: string;
  /** signed: + found more, − found less */
  quantity: Decimal;
  reason: string;
  note?: string | null;
  countId?: string | null;
}

export interface WriteOffInput {
  lotId: string;
  locationId: string;
  /** more than 0: how much is written off */
  quantity: Decimal;
  reason: WriteOffReason;
  note?: string | null;
}

export interface IssueInput {
  lotId: string;
  fromLocationId: string;
  /** more than 0 */
  quantity: Decimal;
  jobId: string;
  note?: string | null;
}

export interface ReturnInput {
  lotId: string;
  toLocationId: string;
  /** more than 0 */
  quantity: Decimal;
  jobId: string;
  note?: string | null;
}

const positive = (q: Decimal, field = 'quantity') => {
  if (!q.isFinite() || q.lte(0)) {
    throw new BadRequestException({ message: `${field}: must be more than 0`, code: 'validation_failed' });
  }
  return q;
};

/**
 * The stock-changing operations, each inside the caller's transaction (the EntityManager): lock,
 * check, append. Used by StockService for the routes and the jobs module, and by the demo seed.
 */
@Injectable()
export class MovementsService {
  constructor(private readonly ledger: LedgerService) {}

  /** Moves part or all of a lot from one location to another: two movements, out and in. */
  async transfer(m: EntityManager, ctx: LedgerContext, input: TransferInput): Promise<Posted> {
    const q = positive(input.quantity);
    if (input.fromLocationId === input.toLocationId) {
      throw new BadRequestException({ message: 'toLocationId: must be a different location from fromLocationId', code: 'validation_failed' });
    }
    const lots = await this.ledger.lockLots(m, ctx.companyId, [input.lotId]);
    const lot = lots.get(input.lotId)!;
    const locations = await this.ledger.lockLocations(m, ctx.companyId, [input.fromLocationId, input.toLocationId], [input.toLocationId]);
    await this.ledger.assertNotBeingCounted(m, ctx.companyId, [input.fromLocationId, input.toLocationId]);
    const balances = await this.ledger.lockBalances(m, [lot.id]);
    const rows: NewMovement[] = [
      { kind: 'transfer', lotId: lot.id, locationId: input.fromLocationId, fromLocationId: input.fromLocationId, toLocationId: input.toLocationId, quantity: q.neg(), note: input.note },
      { kind: 'transfer', lotId: lot.id, locationId: input.toLocationId, fromLocationId: input.fromLocationId, toLocationId: input.toLocationId, quantity: q, note: input.note },
    ];
    this.ledger.validate(lots, balances, locations, rows);
    const warnings = await this.ledger.checkPuts(
      m,
      ctx.companyId,
      [{ lotId: lot.id, locationId: input.toLocationId, quantity: q, material: placedMaterial(lot) }],
      locations,
      [{ lotId: lot.id, locationId: input.fromLocationId, delta: q.neg() }],
    );
    const res = await this.ledger.append(m, ctx, lots, balances, locations, rows);
    await this.ledger.followLot(m, lot, balances, input.fromLocationId, input.toLocationId);
    return { ...res, lotId: lot.id, warnings };
  }

  /** Corrects a lot's balance at a location by a signed quantity, with the reason. */
  async adjust(m: EntityManager, ctx: LedgerContext, input: AdjustmentInput): Promise<Posted> {
    if (input.quantity.isZero()) {
      throw new BadRequestException({ message: 'quantity: must not be zero', code: 'validation_failed' });
    }
    const lots = await this.ledger.lockLots(m, ctx.companyId, [input.lotId]);
    const locations = await this.ledger.lockLocations(m, ctx.companyId, [input.locationId]);
    await this.ledger.assertNotBeingCounted(m, ctx.companyId, [input.locationId]);
    const balances = await this.ledger.lockBalances(m, [input.lotId]);
    const res = await this.ledger.append(m, ctx, lots, balances, locations, [
      { kind: 'adjustment', lotId: input.lotId, locationId: input.locationId, quantity: input.quantity, reason: input.reason, note: input.note, countId: input.countId },
    ]);
    return { ...res, lotId: input.lotId, warnings: [] };
  }

  /** Writes stock off (expired, damaged, temperature). A lot written off to nothing is marked written off. */
  async writeOff(m: EntityManager, ctx: LedgerContext, input: WriteOffInput): Promise<Posted> {
    const q = positive(input.quantity);
    const lots = await this.ledger.lockLots(m, ctx.companyId, [input.lotId]);
    const lot = lots.get(input.lotId)!;
    const locations = await this.ledger.lockLocations(m, ctx.companyId, [input.locationId]);
    await this.ledger.assertNotBeingCounted(m, ctx.companyId, [input.locationId]);
    const balances = await this.ledger.lockBalances(m, [lot.id]);
    const res = await this.ledger.append(m, ctx, lots, balances, locations, [
      { kind: 'write-off', lotId: lot.id, locationId: input.locationId, fromLocationId: input.locationId, quantity: q.neg(), reason: input.reason, note: input.note },
    ]);
    if (new Decimal(lot.quantity).isZero() && lot.status !== 'written-off') {
      await m.query(`UPDATE lots SET status = 'written-off', updated_at = now() WHERE id = $1`, [lot.id]);
      await m.query(`INSERT INTO lot_events (company_id, lot_id, kind, note, user_id, created_at) VALUES ($1, $2, 'written-off', $3, $4, coalesce($5::timestamptz, now()))`, [
        ctx.companyId,
        lot.id,
        `${input.reason}${input.note ? `: ${input.note}` : ''}`,
        ctx.userId,
        ctx.at ?? null,
      ]);
    }
    return { ...res, lotId: lot.id, warnings: [] };
  }

  /** Sends stock to a job. Refuses a lot that is quarantined, exposure-flagged or expired. */
  async issue(m: EntityManager, ctx: LedgerContext, input: IssueInput): Promise<Posted> {
    const q = positive(input.quantity);
    const lots = await this.ledger.lockLots(m, ctx.companyId, [input.lotId]);
    const lot = lots.get(input.lotId)!;
    assertUsable(lot);
    const locations = await this.ledger.lockLocations(m, ctx.companyId, [input.fromLocationId]);
    await this.ledger.assertNotBeingCounted(m, ctx.companyId, [input.fromLocationId]);
    const balances = await this.ledger.lockBalances(m, [lot.id]);
    const res = await this.ledger.append(m, ctx, lots, balances, locations, [
      { kind: 'issue', lotId: lot.id, locationId: input.fromLocationId, fromLocationId: input.fromLocationId, quantity: q.neg(), jobId: input.jobId, note: input.note },
    ]);
    return { ...res, lotId: lot.id, warnings: [] };
  }

  /** Brings stock back from a job into a location: no more than the job took of the lot, and placed by the same rules as a delivery. */
  async return(m: EntityManager, ctx: LedgerContext, input: ReturnInput): Promise<Posted> {
    const q = positive(input.quantity);
    const lots = await this.ledger.lockLots(m, ctx.companyId, [input.lotId]);
    const lot = lots.get(input.lotId)!;
    const [{ out }] = (await m.query(
      `SELECT coalesce(-sum(quantity), 0)::text AS out FROM stock_movements WHERE company_id = $1 AND lot_id = $2 AND job_id = $3`,
      [ctx.companyId, lot.id, input.jobId],
    )) as [{ out: string }];
    if (q.gt(out)) {
      throw new RuleViolation(
        `${lotLabel(lot)}: the job has ${new Decimal(out).toString()} of this lot out, so ${q.toString()} cannot come back from it.`,
        'return_exceeds_issue',
      );
    }
    const locations = await this.ledger.lockLocations(m, ctx.companyId, [input.toLocationId], [input.toLocationId]);
    await this.ledger.assertNotBeingCounted(m, ctx.companyId, [input.toLocationId]);
    const balances = await this.ledger.lockBalances(m, [lot.id]);
    const warnings = await this.ledger.checkPuts(m, ctx.companyId, [{ lotId: lot.id, locationId: input.toLocationId, quantity: q, material: placedMaterial(lot) }], locations);
    const res = await this.ledger.append(m, ctx, lots, balances, locations, [
      { kind: 'return', lotId: lot.id, locationId: input.toLocationId, toLocationId: input.toLocationId, quantity: q, jobId: input.jobId, note: input.note },
    ]);
    return { ...res, lotId: lot.id, warnings };
  }

  /**
   * Reverses a movement with a new one of the opposite sign (both legs of a transfer). A reversal
   * restores what the ledger said before, so it is not checked for segregation or capacity; it
   * may not take a balance below zero, and it is refused while a count of the location is open.
   */
  async reverse(m: EntityManager, ctx: LedgerContext, movementId: string, note: string): Promise<Posted> {
    const [target] = (await m.query(`SELECT lot_id AS "lotId" FROM stock_movements WHERE company_id = $1 AND id = $2`, [ctx.companyId, movementId])) as {
      lotId: string;
    }[];
    if (!target) {
      throw new NotFoundException('Movement not found');
    }
    // Lock the lot first: every reversal of its movements then runs one at a time.
    const lots = await this.ledger.lockLots(m, ctx.companyId, [target.lotId]);
    const [orig] = (await m.query(
      `SELECT id, operation_id AS "operationId", kind, lot_id AS "lotId", location_id AS "locationId", from_location_id AS "fromLocationId",
              to_location_id AS "toLocationId", quantity::text AS quantity, job_id AS "jobId", receipt_line_id AS "receiptLineId",
              count_id AS "countId", reverses_movement_id AS "reversesMovementId"
         FROM stock_movements WHERE company_id = $1 AND id = $2`,
      [ctx.companyId, movementId],
    )) as MovementRecord[];
    if (orig!.reversesMovementId) {
      throw new RuleViolation('This movement is itself a reversal and cannot be reversed: post the movement again instead.', 'already_reversal');
    }
    const legs: MovementRecord[] =
      orig!.kind === 'transfer'
        ? await m.query(
            `SELECT id, operation_id AS "operationId", kind, lot_id AS "lotId", location_id AS "locationId", from_location_id AS "fromLocationId",
                    to_location_id AS "toLocationId", quantity::text AS quantity, job_id AS "jobId", receipt_line_id AS "receiptLineId",
                    count_id AS "countId", reverses_movement_id AS "reversesMovementId"
               FROM stock_movements WHERE company_id = $1 AND operation_id = $2 AND kind = 'transfer' AND lot_id = $3 AND reverses_movement_id IS NULL
              ORDER BY quantity`,
            [ctx.companyId, orig!.operationId, orig!.lotId],
          )
        : [orig!];
    const done: { id: string }[] = await m.query(`SELECT id FROM stock_movements WHERE reverses_movement_id = ANY($1)`, [legs.map((l) => l.id)]);
    if (done.length > 0) {
      throw new RuleViolation('This movement has already been reversed.', 'already_reversed');
    }
    const locationIds = [...new Set(legs.map((l) => l.locationId))];
    const locations = await this.ledger.lockLocations(m, ctx.companyId, locationIds);
    await this.ledger.assertNotBeingCounted(m, ctx.companyId, locationIds);
    const balances = await this.ledger.lockBalances(m, [target.lotId]);
    const rows: NewMovement[] = legs
      .map((leg) => ({
        kind: leg.kind === 'transfer' ? ('transfer' as const) : ('adjustment' as const),
        lotId: leg.lotId,
        locationId: leg.locationId,
        fromLocationId: leg.kind === 'transfer' ? leg.toLocationId : null,
        toLocationId: leg.kind === 'transfer' ? leg.fromLocationId : null,
        quantity: new Decimal(leg.quantity).neg(),
        reason: `reversal of ${leg.kind}`,
        note,
        jobId: leg.jobId,
        receiptLineId: leg.receiptLineId,
        countId: leg.countId,
        reversesMovementId: leg.id,
      }))
      // stock going back in first, so the out leg of a transfer reversal never sees a dip
      .sort((a, b) => b.quantity.comparedTo(a.quantity));
    const res = await this.ledger.append(m, ctx, lots, balances, locations, rows);
    const lot = lots.get(target.lotId)!;
    if (orig!.kind === 'transfer' && orig!.fromLocationId && orig!.toLocationId) {
      await this.ledger.followLot(m, lot, balances, orig!.toLocationId, orig!.fromLocationId);
    }
    return { ...res, lotId: target.lotId, warnings: [] };
  }
}

interface MovementRecord {
  id: string;
  operationId: string;
  kind: NewMovement['kind'];
  lotId: string;
  locationId: string;
  fromLocationId: string | null;
  toLocationId: string | null;
  quantity: string;
  jobId: string | null;
  receiptLineId: string | null;
  countId: string | null;
  reversesMovementId: string | null;
}

/** Refuses to issue a lot that is not usable today, saying why and what to do. */
export function assertUsable(lot: LotRow): void {
  if (lotIsUsable(lot.status, lot.exposureFlagged, lot.expiresOn)) {
    return;
  }
  const name = lotLabel(lot);
  if (lot.status === 'quarantined') {
    throw new RuleViolation(`${name} is quarantined: release it before it goes to a job.`, 'lot_not_usable');
  }
  if (lot.status === 'written-off') {
    throw new RuleViolation(`${name} has been written off.`, 'lot_not_usable');
  }
  if (lot.exposureFlagged) {
    throw new RuleViolation(`${name} is flagged "check before use" (stored outside its temperature range): check it and clear the flag, or quarantine it.`, 'lot_not_usable');
  }
  throw new RuleViolation(`${name} expired on ${expiryInfo(lot.expiresOn).expiresOn}: it must not be used; write it off.`, 'lot_not_usable');
}
