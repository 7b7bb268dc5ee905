import { BadRequestException, Injectable, NotFoundException } from '@nestjs/common';
import { Decimal, DEFAULT_SHELF_LIFE_DAYS, daysToExpiry, expiryDate, Numeric } from '@potlife/domain';
import { randomUUID } from 'node:crypto';
import { EntityManager } from 'typeorm';
import { Material } from '../catalogue/entities/material.entity';
import type { Role } from '../common/roles';
import { RuleViolation } from '../common/http-exception.filter';
import type { CreateReceiptDto } from './dto/receipt.dto';
import { LedgerService, LotRow, NewMovement } from './ledger.service';
import type { Put } from './placement';
import { EXPIRING_SOON_DAYS, today } from './stock-dates';

/** What the purchasing module knows of an order line a delivery is received against. */
export interface OrderLineFact {
  id: string;
  materialId: string;
  /** ordered, in the material's stock unit */
  orderedQuantity: Numeric;
}

export interface ReceiveOptions {
  /** the order lines the receipt's lines point at; without them a line with an order line is refused */
  orderLines?: readonly OrderLineFact[];
  /** backdates the receipt's movements (demo data only) */
  at?: Date;
}

export interface Received {
  receiptId: string;
  operationId: string;
  lotIds: string[];
  warnings: string[];
}

const bad = (field: string, message: string) => new BadRequestException({ message: `${field}: ${message}`, code: 'validation_failed' });

/**
 * Booking a delivery in: one transaction creates the receipt, a lot per line with packs accepted,
 * and a receipt movement per lot. Refused packs are recorded on the line and never stocked.
 * Expiry is the date given, or the received date + the material's shelf life (domain expiryDate;
 * the domain's defaults for resin, topcoat and catalyst when the material has none).
 */
@Injectable()
export class ReceivingService {
  constructor(private readonly ledger: LedgerService) {}

  async post(m: EntityManager, companyId: string, user: { id: string; role: Role }, input: CreateReceiptDto, opts: ReceiveOptions = {}): Promise<Received> {
    const day = today();
    if (input.receivedOn > day) {
      throw bad('receivedOn', 'must not be in the future');
    }
    let supplierName = input.supplierName ?? null;
    if (input.supplierId) {
      const [s] = (await m.query(`SELECT name FROM suppliers WHERE company_id = $1 AND id = $2`, [companyId, input.supplierId])) as { name: string }[];
      if (!s) {
        throw new NotFoundException('Supplier not found');
      }
      supplierName = supplierName ?? s.name;
    }
    if (!input.supplierId && !supplierName) {
      throw bad('supplierName', 'name who delivered it, or give supplierId');
    }

    const materialIds = [...new Set(input.lines.map((l) => l.materialId))];
    const materials = new Map(
      (await m.getRepository(Material).find({ where: materialIds.map((id) => ({ id, companyId })) })).map((mt) => [mt.id, mt]),
    );
    const warnings: string[] = [];
    const lines = [];
    for (const [i, line] of input.lines.entries()) {
      const f = (name: string) => `lines[${i}].${name}`;
      const mt = materials.get(line.materialId);
      if (!mt) {
        throw new NotFoundException(`Material not found (${f('materialId')})`);
      }
      if (!mt.active) {
        throw new RuleViolation(`${mt.name} is no longer in the catalogue's use: reactivate it before receiving it.`, 'material_inactive');
      }
      const packsRefused = line.packsRefused ?? 0;
      if (line.packsReceived + packsRefused === 0) {
        throw bad(f('packsReceived'), 'a line needs packs received or packs refused');
      }
      if (line.packsReceived > 0 && !line.locationId) {
        throw bad(f('locationId'), 'say where the packs are put away');
      }
      if (mt.lotTracked && line.packsReceived > 0 && !line.batchNumber) {
        throw bad(f('batchNumber'), `${mt.name} is tracked by lot: give the batch number printed on the packs`);
      }
      let expiresOn = line.expiresOn ?? null;
      let expiryComputed = false;
      if (!expiresOn) {
        const shelfLife = mt.shelfLifeDays ?? (DEFAULT_SHELF_LIFE_DAYS as Record<string, number>)[mt.kind] ?? null;
        if (shelfLife !== null) {
          expiresOn = expiryDate(input.receivedOn, shelfLife);
          expiryComputed = true;
        }
      }
      if (expiresOn && line.packsReceived > 0) {
        const left = daysToExpiry(expiresOn, input.receivedOn);
        if (left < 0) {
          throw new RuleViolation(
            `${mt.name}${line.batchNumber ? ` batch ${line.batchNumber}` : ''} expired on ${expiresOn}, before it was received: refuse it at the door (packsRefused).`,
            'expired_on_arrival',
          );
        }
        if (left <= EXPIRING_SOON_DAYS) {
          warnings.push(`${mt.name}${line.batchNumber ? ` batch ${line.batchNumber}` : ''} expires on ${expiresOn}, ${left} day${left === 1 ? '' : 's'} after delivery.`);
        }
      }
      const packSize = new Decimal(line.packSize);
      const quantity = packSize.times(line.packsReceived);
      let unitCost = line.unitCost ?? null;
      if (unitCost === null) {
        const [price] = input.supplierId
          ? ((await m.query(
              `SELECT pack_price::text AS price FROM supplier_prices
                WHERE company_id = $1 AND supplier_id = $2 AND material_id = $3 AND pack_size = $4::numeric AND valid_from <= $5::date
                ORDER BY valid_from DESC LIMIT 1`,
              [companyId, input.supplierId, mt.id, packSize.toString(), input.receivedOn],
            )) as { price: string }[])
          : [];
        if (!price) {
          throw bad(f('unitCost'), `give the cost per ${mt.stockUnit}: no price for a ${packSize.toString()} ${mt.stockUnit} pack from this supplier is on file`);
        }
        unitCost = new Decimal(price.price).div(packSize).toDecimalPlaces(4, Decimal.ROUND_HALF_UP).toFixed(4);
      }
      lines.push({ i, line, mt, packsRefused, expiresOn, expiryComputed, packSize, quantity, unitCost, overAllowedBy: null as string | null });
    }

    // The receipt number is taken under a per-company lock, which also makes receipts against
    // one order line run one after the other (so partial deliveries add up exactly).
    await m.query(`SELECT pg_advisory_xact_lock(hashtext('receipts:' || $1::text))`, [companyId]);

    const onOrder = lines.filter((l) => l.line.purchaseOrderLineId);
    if (onOrder.length > 0) {
      if (!opts.orderLines) {
        const l = onOrder[0]!;
        throw new RuleViolation(
          `lines[${l.i}].purchaseOrderLineId: purchase orders are not in Potlife yet; receive this delivery without an order line.`,
          'order_line_unknown',
          422,
        );
      }
      const ids = [...new Set(onOrder.map((l) => l.line.purchaseOrderLineId!))];
      const before: { id: string; received: string }[] = await m.query(
        `SELECT purchase_order_line_id AS id, sum(quantity)::text AS received FROM receipt_lines
          WHERE company_id = $1 AND purchase_order_line_id = ANY($2) GROUP BY purchase_order_line_id`,
        [companyId, ids],
      );
      for (const id of ids) {
        const fact = opts.orderLines.find((o) => o.id === id);
        const mine = onOrder.filter((l) => l.line.purchaseOrderLineId === id);
        if (!fact) {
          throw new RuleViolation(`lines[${mine[0]!.i}].purchaseOrderLineId: that order line was not found.`, 'order_line_unknown', 422);
        }
        const wrong = mine.find((l) => l.mt.id !== fact.materialId);
        if (wrong) {
          throw new RuleViolation(`lines[${wrong.i}]: ${wrong.mt.name} is not the material on that order line.`, 'order_line_material', 422);
        }
        const received = new Decimal(before.find((b) => b.id === id)?.received ?? 0);
        const now = mine.reduce((s, l) => s.plus(l.quantity), new Decimal(0));
        const ordered = new Decimal(fact.orderedQuantity);
        const over = received.plus(now).minus(ordered);
        if (over.gt(0)) {
          if (input.allowOverDelivery && user.role === 'owner') {
            for (const l of mine) {
              l.overAllowedBy = user.id;
            }
            warnings.push(`${mine[0]!.mt.name}: ${over.toString()} ${mine[0]!.mt.stockUnit} more than ordered, accepted by the owner.`);
          } else {
            throw new RuleViolation(
              `${mine[0]!.mt.name}: ordered ${ordered.toString()}, received before ${received.toString()}, this delivery ${now.toString()} — ${over.toString()} ${mine[0]!.mt.stockUnit} over the order. ` +
                (input.allowOverDelivery ? 'Only an owner can accept an over-delivery.' : 'Refuse the extra packs at the door, or an owner can accept the over-delivery.'),
              'over_delivery',
            );
          }
        }
      }
    }

    const stocked = lines.filter((l) => l.line.packsReceived > 0);
    const putIds = stocked.map((l) => l.line.locationId!);
    const locations = await this.ledger.lockLocations(m, companyId, putIds, putIds);
    await this.ledger.assertNotBeingCounted(m, companyId, putIds);
    const lotIds = stocked.map(() => randomUUID());
    const puts: Put[] = stocked.map((l, k) => ({
      lotId: lotIds[k]!,
      locationId: l.line.locationId!,
      quantity: l.quantity,
      material: { name: l.mt.name, hazardClass: l.mt.hazardClass, isAccelerator: l.mt.isAccelerator, stockUnit: l.mt.stockUnit, litresPerKg: l.mt.litresPerKg },
    }));
    warnings.push(...(await this.ledger.checkPuts(m, companyId, puts, locations)));

    const [{ next }] = (await m.query(`SELECT coalesce(max(number), 0) + 1 AS next FROM receipts WHERE company_id = $1`, [companyId])) as [{ next: number }];
    const receiptId = randomUUID();
    await m.query(
      `INSERT INTO receipts (id, company_id, number, supplier_id, supplier_name, delivery_note_number, received_on, note, received_by, created_at)
       VALUES ($1, $2, $3, $4, $5, $6, $7, $8, $9, coalesce($10::timestamptz, now()))`,
      [receiptId, companyId, next, input.supplierId ?? null, supplierName, input.deliveryNoteNumber ?? null, input.receivedOn, input.note ?? null, user.id, opts.at ?? null],
    );

    const lots = new Map<string, LotRow>();
    const rows: NewMovement[] = [];
    let k = 0;
    for (const l of lines) {
      let lotId: string | null = null;
      if (l.line.packsReceived > 0) {
        lotId = lotIds[k++]!;
        await m.query(
          `INSERT INTO lots (id, company_id, material_id, batch_number, received_on, expires_on, location_id, unit_cost, quantity, receipt_id, created_at)
           VALUES ($1, $2, $3, $4, $5, $6, $7, $8, 0, $9, coalesce($10::timestamptz, now()))`,
          [lotId, companyId, l.mt.id, l.line.batchNumber ?? null, input.receivedOn, l.expiresOn, l.line.locationId, l.unitCost, receiptId, opts.at ?? null],
        );
        lots.set(lotId, {
          id: lotId,
          companyId,
          materialId: l.mt.id,
          materialCode: l.mt.code,
          materialName: l.mt.name,
          materialKind: l.mt.kind,
          stockUnit: l.mt.stockUnit,
          hazardClass: l.mt.hazardClass,
          isAccelerator: l.mt.isAccelerator,
          litresPerKg: l.mt.litresPerKg,
          storageMinC: l.mt.storageMinC,
          storageMaxC: l.mt.storageMaxC,
          batchNumber: l.line.batchNumber ?? null,
          receivedOn: input.receivedOn,
          expiresOn: l.expiresOn,
          locationId: l.line.locationId!,
          status: 'available',
          unitCost: l.unitCost,
          quantity: '0',
          exposureFlagged: false,
          receiptId,
        });
      }
      const lineId = randomUUID();
      await m.query(
        `INSERT INTO receipt_lines (id, company_id, receipt_id, line_no, material_id, purchase_order_line_id, batch_number, expires_on, expiry_computed,
                                    packs_received, pack_size, packs_refused, refused_reason, quantity, unit_cost, location_id, lot_id, over_delivery_allowed_by)
         VALUES ($1, $2, $3, $4, $5, $6, $7, $8, $9, $10, $11, $12, $13, $14, $15, $16, $17, $18)`,
        [
          lineId,
          companyId,
          receiptId,
          l.i + 1,
          l.mt.id,
          l.line.purchaseOrderLineId ?? null,
          l.line.batchNumber ?? null,
          l.expiresOn,
          l.expiryComputed,
          l.line.packsReceived,
          l.packSize.toString(),
          l.packsRefused,
          l.line.refusedReason ?? null,
          l.quantity.toString(),
          l.unitCost,
          l.line.locationId ?? null,
          lotId,
          l.overAllowedBy,
        ],
      );
      if (lotId) {
        rows.push({ kind: 'receipt', lotId, locationId: l.line.locationId!, toLocationId: l.line.locationId!, quantity: l.quantity, receiptLineId: lineId });
      }
    }
    let operationId: string = randomUUID();
    if (rows.length > 0) {
      ({ operationId } = await this.ledger.append(m, { companyId, userId: user.id, at: opts.at, operationId }, lots, new Map(), locations, rows));
    }
    return { receiptId, operationId, lotIds, warnings: [...new Set(warnings)] };
  }
}
