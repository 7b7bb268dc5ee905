import { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Estimate options: an estimate costed on supplier prices or on the stock the job can reserve
 * (estimates.cost_basis; each pack row says where its cost came from, a stock row names its lot
 * and the lot's unit cost), and a catalogue field for what a trim piece is (a length, an external
 * or an internal corner) instead of reading it from the trim's name.
 */
export class EstimateOptions1764605000000 implements MigrationInterface {
  name = 'EstimateOptions1764605000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      ALTER TABLE estimates
        ADD COLUMN cost_basis varchar(8) NOT NULL DEFAULT 'supplier' CHECK (cost_basis IN ('supplier', 'stock'))`);
    await q.query(`ALTER TABLE estimate_materials ADD COLUMN stock_quantity numeric NOT NULL DEFAULT 0 CHECK (stock_quantity >= 0)`);
    await q.query(`
      ALTER TABLE estimate_packs
        ADD COLUMN source varchar(8) NOT NULL DEFAULT 'supplier' CHECK (source IN ('supplier', 'stock')),
        ADD COLUMN lot_id uuid REFERENCES lots(id) ON DELETE SET NULL,
        ADD COLUMN batch_number varchar(60),
        ADD COLUMN unit_cost numeric(14,4) CHECK (unit_cost >= 0),
        ADD CONSTRAINT estimate_packs_stock_lot CHECK (source = 'supplier' OR unit_cost IS NOT NULL)`);
    await q.query(`
      ALTER TABLE materials
        ADD COLUMN trim_piece varchar(16) CHECK (trim_piece IN ('length', 'external-corner', 'internal-corner')),
        ADD CONSTRAINT materials_trim_piece_only_trims CHECK (trim_piece IS NULL OR kind = 'trim')`);
    // The old rule, once, so nothing changes: a trim with "corner" in its name is a corner piece,
    // "internal" in the name makes it internal, otherwise external; every other trim is a length.
    await q.query(`
      UPDATE materials SET trim_piece = CASE
          WHEN name ~* '\\mcorner' AND name ~* '\\minternal\\M' THEN 'internal-corner'
          WHEN name ~* '\\mcorner' THEN 'external-corner'
          ELSE 'length' END
        WHERE kind = 'trim'`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE materials DROP CONSTRAINT materials_trim_piece_only_trims, DROP COLUMN trim_piece`);
    await q.query(`
      ALTER TABLE estimate_packs DROP CONSTRAINT estimate_packs_stock_lot,
        DROP COLUMN unit_cost, DROP COLUMN batch_number, DROP COLUMN lot_id, DROP COLUMN source`);
    await q.query(`ALTER TABLE estimate_materials DROP COLUMN stock_quantity`);
    await q.query(`ALTER TABLE estimates DROP COLUMN cost_basis`);
  }
}
