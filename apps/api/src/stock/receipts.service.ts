import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { Decimal, roundMoney } from '@potlife/domain';
import { DataSource, EntityManager } from 'typeorm';
import type { AuthUser } from '../common/current-user';
import { FileContent, FilesService, UploadedFileInput } from '../files/files.service';
import { CreateReceiptDto, ReceiptLineResponse, ReceiptPageResponse, ReceiptResponse, ReceiptsQueryDto } from './dto/receipt.dto';
import { IdempotencyService } from './idempotency.service';
import { renderLabels } from './labels';
import { LotsService } from './lots.service';
import { ReceivingService } from './receiving.service';
import { money } from './stock-reader.service';

@Injectable()
export class ReceiptsService {
  constructor(
    @InjectDataSource() private readonly db: DataSource,
    private readonly receiving: ReceivingService,
    private readonly idempotency: IdempotencyService,
    private readonly files: FilesService,
    private readonly lots: LotsService,
  ) {}

  /** POST /api/receipts: books a delivery in and stocks its lots, in one transaction. */
  create(user: AuthUser, dto: CreateReceiptDto, key: string | undefined): Promise<ReceiptResponse> {
    return this.idempotency.run({ companyId: user.companyId, userId: user.id, key, route: 'POST /api/receipts', request: dto }, async (m) => {
      const done = await this.receiving.post(m, user.companyId, user, dto);
      return { ...(await this.read(m, user.companyId, done.receiptId)), warnings: done.warnings };
    });
  }

  async list(companyId: string, q: ReceiptsQueryDto): Promise<ReceiptPageResponse> {
    const where = ['r.company_id = $1'];
    const params: unknown[] = [companyId];
    const add = (sql: string, v: unknown) => {
      params.push(v);
      where.push(sql.replaceAll('?', `$${params.length}`));
    };
    if (q.supplierId) {
      add('r.supplier_id = ?', q.supplierId);
    }
    if (q.from) {
      add('r.received_on >= ?::date', q.from);
    }
    if (q.to) {
      add('r.received_on <= ?::date', q.to);
    }
    if (q.q) {
      add(
        `(r.supplier_name ILIKE ? OR r.delivery_note_number ILIKE ? OR EXISTS (SELECT 1 FROM receipt_lines x WHERE x.receipt_id = r.id AND x.batch_number ILIKE ?))`,
        `%${q.q.replace(/[%_\\]/g, '\\$&')}%`,
      );
    }
    const [{ total }] = (await this.db.query(`SELECT count(*)::int AS total FROM receipts r WHERE ${where.join(' AND ')}`, params)) as [{ total: number }];
    const rows: {
      id: string;
      number: number;
      supplierName: string | null;
      deliveryNoteNumber: string | null;
      receivedOn: string;
      lineCount: number;
      packsReceived: number;
      packsRefused: number;
      totalValue: string;
      hasDeliveryNote: boolean;
      receivedByName: string;
      createdAt: Date;
    }[] = await this.db.query(
      `SELECT r.id, r.number, r.supplier_name AS "supplierName", r.delivery_note_number AS "deliveryNoteNumber", r.received_on::text AS "receivedOn",
              (SELECT count(*)::int FROM receipt_lines x WHERE x.receipt_id = r.id) AS "lineCount",
              (SELECT coalesce(sum(packs_received), 0)::int FROM receipt_lines x WHERE x.receipt_id = r.id) AS "packsReceived",
              (SELECT coalesce(sum(packs_refused), 0)::int FROM receipt_lines x WHERE x.receipt_id = r.id) AS "packsRefused",
              (SELECT coalesce(sum(quantity * unit_cost), 0)::text FROM receipt_lines x WHERE x.receipt_id = r.id) AS "totalValue",
              r.delivery_note_file_id IS NOT NULL AS "hasDeliveryNote", coalesce(u.name, '') AS "receivedByName", r.created_at AS "createdAt"
         FROM receipts r LEFT JOIN users u ON u.id = r.received_by
        WHERE ${where.join(' AND ')}
        ORDER BY r.received_on DESC, r.number DESC
        LIMIT ${q.limit ?? 50} OFFSET ${q.offset ?? 0}`,
      params,
    );
    return {
      total,
      items: rows.map((r) => ({ ...r, totalValue: roundMoney(r.totalValue).toFixed(2), createdAt: r.createdAt.toISOString() })),
    };
  }

  get(companyId: string, id: string): Promise<ReceiptResponse> {
    return this.read(this.db.manager, companyId, id);
  }

  /** A receipt with its lines, as the routes answer it. */
  async read(m: EntityManager, companyId: string, id: string): Promise<ReceiptResponse> {
    const [r] = (await m.query(
      `SELECT r.id, r.number, r.supplier_id AS "supplierId", r.supplier_name AS "supplierName", r.delivery_note_number AS "deliveryNoteNumber",
              r.received_on::text AS "receivedOn", r.note, r.received_by AS "receivedById", coalesce(u.name, '') AS "receivedByName",
              r.created_at AS "createdAt", f.original_name AS "fileName", f.content_type AS "contentType", f.size_bytes AS "sizeBytes",
              f.created_at AS "uploadedAt"
         FROM receipts r LEFT JOIN users u ON u.id = r.received_by LEFT JOIN stored_files f ON f.id = r.delivery_note_file_id
        WHERE r.company_id = $1 AND r.id = $2`,
      [companyId, id],
    )) as {
      id: string;
      number: number;
      supplierId: string | null;
      supplierName: string | null;
      deliveryNoteNumber: string | null;
      receivedOn: string;
      note: string | null;
      receivedById: string;
      receivedByName: string;
      createdAt: Date;
      fileName: string | null;
      contentType: string | null;
      sizeBytes: number | null;
      uploadedAt: Date | null;
    }[];
    if (!r) {
      throw new NotFoundException('Receipt not found');
    }
    const lines: (Omit<ReceiptLineResponse, 'value'>)[] = await m.query(
      `SELECT rl.id, rl.line_no AS "lineNo", rl.material_id AS "materialId", mt.code AS "materialCode", mt.name AS "materialName",
              mt.stock_unit AS "stockUnit", rl.purchase_order_line_id AS "purchaseOrderLineId", rl.batch_number AS "batchNumber",
              rl.expires_on::text AS "expiresOn", rl.expiry_computed AS "expiryComputed", rl.packs_received AS "packsReceived",
              rl.pack_size::text AS "packSize", rl.packs_refused AS "packsRefused", rl.refused_reason AS "refusedReason",
              rl.quantity::text AS quantity, rl.unit_cost::text AS "unitCost", rl.location_id AS "locationId", loc.name AS "locationName",
              rl.lot_id AS "lotId", rl.over_delivery_allowed_by IS NOT NULL AS "overDeliveryAllowed"
         FROM receipt_lines rl JOIN materials mt ON mt.id = rl.material_id LEFT JOIN locations loc ON loc.id = rl.location_id
        WHERE rl.company_id = $1 AND rl.receipt_id = $2 ORDER BY rl.line_no`,
      [companyId, id],
    );
    let total = new Decimal(0);
    for (const l of lines) {
      total = total.plus(new Decimal(l.quantity).times(l.unitCost));
    }
    return {
      id: r.id,
      number: r.number,
      supplierId: r.supplierId,
      supplierName: r.supplierName,
      deliveryNoteNumber: r.deliveryNoteNumber,
      receivedOn: r.receivedOn,
      note: r.note,
      receivedById: r.receivedById,
      receivedByName: r.receivedByName,
      createdAt: r.createdAt.toISOString(),
      deliveryNote:
        r.fileName && r.contentType && r.uploadedAt
          ? { fileName: r.fileName, contentType: r.contentType, sizeBytes: r.sizeBytes ?? 0, uploadedAt: r.uploadedAt.toISOString(), url: `/api/receipts/${r.id}/delivery-note` }
          : null,
      lines: lines.map((l) => ({ ...l, value: money(l.quantity, l.unitCost) })),
      totalValue: roundMoney(total).toFixed(2),
      labelsUrl: `/api/receipts/${r.id}/labels.pdf`,
      warnings: [],
    };
  }

  /**
   * Stores the delivery note (PDF, JPEG or PNG by its bytes; the interceptor has capped it at
   * 10 MB) and attaches it, replacing an earlier one (whose file is kept).
   */
  async attachDeliveryNote(user: AuthUser, id: string, upload: UploadedFileInput | undefined): Promise<ReceiptResponse> {
    return this.db.transaction(async (m) => {
      const found: unknown[] = await m.query(`SELECT 1 FROM receipts WHERE company_id = $1 AND id = $2 FOR UPDATE`, [user.companyId, id]);
      if (found.length === 0) {
        throw new NotFoundException('Receipt not found');
      }
      const file = await this.files.store(m, user.companyId, user.id, upload, { folder: 'delivery-notes', what: 'The delivery note', field: 'file' });
      try {
        await m.query(`UPDATE receipts SET delivery_note_file_id = $2 WHERE id = $1`, [id, file.id]);
        return await this.read(m, user.companyId, id);
      } catch (err) {
        await this.files.discard(file.storageKey);
        throw err;
      }
    });
  }

  async deliveryNote(companyId: string, id: string): Promise<FileContent> {
    const [r] = (await this.db.query(`SELECT delivery_note_file_id AS "fileId", number FROM receipts WHERE company_id = $1 AND id = $2`, [companyId, id])) as {
      fileId: string | null;
      number: number;
    }[];
    if (!r) {
      throw new NotFoundException('Receipt not found');
    }
    if (!r.fileId) {
      throw new NotFoundException('This receipt has no delivery note yet: upload one');
    }
    return this.files.read(this.db.manager, companyId, r.fileId);
  }

  /** A label per pack received, to stick on each drum, tin and roll. */
  async labels(companyId: string, id: string): Promise<{ pdf: Buffer; number: number }> {
    const [r] = (await this.db.query(`SELECT number FROM receipts WHERE company_id = $1 AND id = $2`, [companyId, id])) as { number: number }[];
    if (!r) {
      throw new NotFoundException('Receipt not found');
    }
    const labels = await this.lots.labelData(this.db.manager, companyId, { receiptId: id }, true);
    return { pdf: await renderLabels(labels), number: r.number };
  }
}
