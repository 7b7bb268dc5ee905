import { MigrationInterface, QueryRunner } from 'typeorm';

/** The catalogue: materials, suppliers, their contacts and price history; shared by catalogue, suppliers, stock, jobs and purchasing. */
export class Catalogue1764601000000 implements MigrationInterface {
  name = 'Catalogue1764601000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE TABLE materials (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        company_id uuid NOT NULL REFERENCES companies(id) ON DELETE CASCADE,
        code varchar(40) NOT NULL,
        name varchar(160) NOT NULL,
        kind varchar(20) NOT NULL CHECK (kind IN ('mat','bandage','base-resin','topcoat','catalyst','trim','outlet','acetone','adhesive','batten','fixing','other')),
        stock_unit varchar(8) NOT NULL CHECK (stock_unit IN ('kg','L','m2','m','each')),
        pack_sizes jsonb NOT NULL DEFAULT '[]',
        lot_tracked boolean NOT NULL DEFAULT true,
        shelf_life_days int CHECK (shelf_life_days > 0),
        storage_min_c numeric(5,1),
        storage_max_c numeric(5,1),
        hazard_class varchar(4) NOT NULL DEFAULT 'none',
        un_number varchar(6),
        packing_group varchar(3) CHECK (packing_group IN ('I','II','III')),
        flash_point_c numeric(5,1),
        is_accelerator boolean NOT NULL DEFAULT false,
        reorder_level numeric(14,3) NOT NULL DEFAULT 0 CHECK (reorder_level >= 0),
        reorder_quantity numeric(14,3) NOT NULL DEFAULT 0 CHECK (reorder_quantity >= 0),
        mat_gsm int CHECK (mat_gsm > 0),
        roll_width_m numeric(6,3) CHECK (roll_width_m > 0),
        trim_kind varchar(10) CHECK (trim_kind IN ('drip','kerb','wall','angle')),
        trim_length_m numeric(6,3) CHECK (trim_length_m > 0),
        topcoat_colour varchar(60),
        litres_per_kg numeric(8,4) CHECK (litres_per_kg > 0),
        active boolean NOT NULL DEFAULT true,
        notes text,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now(),
        CHECK (storage_min_c IS NULL OR storage_max_c IS NULL OR storage_min_c <= storage_max_c)
      )`);
    await q.query(`CREATE UNIQUE INDEX materials_company_code_key ON materials (company_id, lower(code))`);
    await q.query(`CREATE INDEX materials_company_kind_idx ON materials (company_id, kind)`);
    await q.query(`
      CREATE TABLE suppliers (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        company_id uuid NOT NULL REFERENCES companies(id) ON DELETE CASCADE,
        name varchar(160) NOT NULL,
        order_email varchar(320),
        phone varchar(40),
        address text,
        lead_time_days int NOT NULL DEFAULT 3 CHECK (lead_time_days >= 0),
        active boolean NOT NULL DEFAULT true,
        notes text,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now()
      )`);
    await q.query(`CREATE UNIQUE INDEX suppliers_company_name_key ON suppliers (company_id, lower(name))`);
    await q.query(`
      CREATE TABLE supplier_contacts (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        company_id uuid NOT NULL REFERENCES companies(id) ON DELETE CASCADE,
        supplier_id uuid NOT NULL REFERENCES suppliers(id) ON DELETE CASCADE,
        name varchar(120) NOT NULL,
        email varchar(320),
        phone varchar(40),
        role varchar(60),
        created_at timestamptz NOT NULL DEFAULT now()
      )`);
    await q.query(`CREATE INDEX supplier_contacts_supplier_idx ON supplier_contacts (supplier_id)`);
    // Price history: a new price is a new row from its valid_from date; rows are never updated.
    await q.query(`
      CREATE TABLE supplier_prices (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        company_id uuid NOT NULL REFERENCES companies(id) ON DELETE CASCADE,
        supplier_id uuid NOT NULL REFERENCES suppliers(id) ON DELETE CASCADE,
        material_id uuid NOT NULL REFERENCES materials(id) ON DELETE CASCADE,
        pack_size numeric(14,3) NOT NULL CHECK (pack_size > 0),
        pack_price numeric(14,2) NOT NULL CHECK (pack_price >= 0),
        valid_from date NOT NULL,
        supplier_code varchar(60),
        created_by uuid REFERENCES users(id),
        created_at timestamptz NOT NULL DEFAULT now(),
        UNIQUE (supplier_id, material_id, pack_size, valid_from)
      )`);
    await q.query(`CREATE INDEX supplier_prices_material_idx ON supplier_prices (company_id, material_id, valid_from DESC)`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE supplier_prices`);
    await q.query(`DROP TABLE supplier_contacts`);
    await q.query(`DROP TABLE suppliers`);
    await q.query(`DROP TABLE materials`);
  }
}
