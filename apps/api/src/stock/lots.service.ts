import { Inject, Injectable, NotFoundException } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { Decimal, MaterialKind } from '@potlife/domain';
import { DataSource, EntityManager } from 'typeorm';
import type { AuthUser } from '../common/current-user';
import { RuleViolation } from '../common/http-exception.filter';
import { ENV, Env } from '../config/env';
import { LotActionDto, LotDetailResponse, LotResponse, LotsQueryDto } from './dto/lot.dto';
import { IdempotencyService } from './idempotency.service';
import { LabelData, renderLabels } from './labels';
import { LedgerService, lotLabel } from './ledger.service';
import { StockReader } from './stock-reader.service';

export type LotAction = 'quarantine' | 'release' | 'clear-flag';

/** "25 kg", "12.5 m²", "4 each". */
export const quantityText = (q: string, unit: string) => `${new Decimal(q).toString()} ${unit === 'm2' ? 'm²' : unit}`;

@Injectable()
export class LotsService {
  constructor(
    @InjectDataSource() private readonly db: DataSource,
    private readonly ledger: LedgerService,
    private readonly reader: StockReader,
    private readonly idempotency: IdempotencyService,
    @Inject(ENV) private readonly env: Env,
  ) {}

  list(companyId: string, q: LotsQueryDto): Promise<LotResponse[]> {
    return this.reader.lots(this.db.manager, companyId, q);
  }

  get(companyId: string, id: string): Promise<LotDetailResponse> {
    return this.reader.lotDetail(this.db.manager, companyId, id);
  }

  /** Quarantine (set aside, not to be used), release (back to available) or clear the exposure flag; each with the note why. */
  act(user: AuthUser, id: string, action: LotAction, dto: LotActionDto, key: string | undefined): Promise<LotDetailResponse> {
    return this.idempotency.run(
      { companyId: user.companyId, userId: user.id, key, route: `POST /api/lots/{id}/${action}`, request: { id, ...dto } },
      async (m) => {
        const lots = await this.ledger.lockLots(m, user.companyId, [id]);
        const lot = lots.get(id)!;
        const name = lotLabel(lot);
        switch (action) {
          case 'quarantine':
            if (lot.status === 'written-off') {
              throw new RuleViolation(`${name} has been written off; there is nothing to quarantine.`, 'lot_written_off');
            }
            if (lot.status === 'quarantined') {
              throw new RuleViolation(`${name} is already quarantined.`, 'already_quarantined');
            }
            await m.query(`UPDATE lots SET status = 'quarantined', updated_at = now() WHERE id = $1`, [id]);
            await this.event(m, user, id, 'quarantined', dto.note);
            break;
          case 'release':
            if (lot.status !== 'quarantined') {
              throw new RuleViolation(`${name} is not quarantined.`, 'not_quarantined');
            }
            await m.query(`UPDATE lots SET status = 'available', updated_at = now() WHERE id = $1`, [id]);
            await this.event(m, user, id, 'released', dto.note);
            break;
          case 'clear-flag':
            if (!lot.exposureFlagged) {
              throw new RuleViolation(`${name} has no exposure flag to clear.`, 'not_flagged');
            }
            await m.query(`UPDATE lots SET exposure_flagged = false, exposure_reason = NULL, exposure_flagged_at = NULL, updated_at = now() WHERE id = $1`, [id]);
            await this.event(m, user, id, 'flag-cleared', dto.note);
            break;
        }
        return this.reader.lotDetail(m, user.companyId, id);
      },
    );
  }

  private async event(m: EntityManager, user: AuthUser, lotId: string, kind: string, note: string): Promise<void> {
    await m.query(`INSERT INTO lot_events (company_id, lot_id, kind, note, user_id) VALUES ($1, $2, $3, $4, $5)`, [user.companyId, lotId, kind, note, user.id]);
  }

  /** Label data for lots; `perPack` gives one label per pack received (receipt labels), else `copies` of one label with the lot's quantity. */
  async labelData(m: EntityManager, companyId: string, filter: { lotIds?: string[]; receiptId?: string }, perPack: boolean, copies = 1): Promise<LabelData[]> {
    const rows: {
      lotId: string;
      materialName: string;
      materialCode: string;
      materialKind: MaterialKind;
      hazardClass: string;
      unNumber: string | null;
      stockUnit: string;
      batchNumber: string | null;
      expiresOn: string | null;
      receivedOn: string;
      quantity: string;
      receiptNumber: number | null;
      packsReceived: number | null;
      packSize: string | null;
    }[] = await m.query(
      `SELECT l.id AS "lotId", mt.name AS "materialName", mt.code AS "materialCode", mt.kind AS "materialKind", mt.hazard_class AS "hazardClass",
              mt.un_number AS "unNumber", mt.stock_unit AS "stockUnit", l.batch_number AS "batchNumber", l.expires_on::text AS "expiresOn",
              l.received_on::text AS "receivedOn", l.quantity::text AS quantity, r.number AS "receiptNumber",
              rl.packs_received AS "packsReceived", rl.pack_size::text AS "packSize"
         FROM lots l JOIN materials mt ON mt.id = l.material_id
         LEFT JOIN receipts r ON r.id = l.receipt_id
         LEFT JOIN receipt_lines rl ON rl.lot_id = l.id
        WHERE l.company_id = $1 AND ${filter.receiptId ? 'l.receipt_id = $2' : 'l.id = ANY($2)'}
        ORDER BY rl.line_no NULLS LAST, l.created_at`,
      [companyId, filter.receiptId ?? filter.lotIds ?? []],
    );
    const labels: LabelData[] = [];
    for (const r of rows) {
      const base = {
        lotId: r.lotId,
        url: `${this.env.PUBLIC_URL}/stock/lots/${r.lotId}`,
        materialName: r.materialName,
        materialCode: r.materialCode,
        materialKind: r.materialKind,
        hazardClass: r.hazardClass,
        unNumber: r.unNumber,
        batchNumber: r.batchNumber,
        expiresOn: r.expiresOn,
        receivedOn: r.receivedOn,
        receiptNumber: r.receiptNumber,
      };
      if (perPack && r.packsReceived && r.packSize) {
        for (let i = 1; i <= r.packsReceived; i++) {
          labels.push({ ...base, quantityText: quantityText(r.packSize, r.stockUnit), packText: `Pack ${i} of ${r.packsReceived}` });
        }
      } else {
        for (let i = 0; i < copies; i++) {
          labels.push({ ...base, quantityText: quantityText(r.quantity, r.stockUnit), packText: null });
        }
      }
    }
    return labels;
  }

  async lotLabel(companyId: string, id: string, copies: number): Promise<Buffer> {
    const labels = await this.labelData(this.db.manager, companyId, { lotIds: [id] }, false, copies);
    if (labels.length === 0) {
      throw new NotFoundException('Lot not found');
    }
    return renderLabels(labels);
  }
}
