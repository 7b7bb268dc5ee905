import { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The estimator's records: company settings for jobs, customers, build-ups, jobs with their roof
 * (jsonb) and status history, and estimates numbered by version with their take-off lines, the
 * materials to buy and the packs priced.
 */
export class Jobs1764604000000 implements MigrationInterface {
  name = 'Jobs1764604000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE TABLE company_settings (
        company_id uuid PRIMARY KEY REFERENCES companies(id) ON DELETE CASCADE,
        reservation_margin_days int NOT NULL DEFAULT 7 CHECK (reservation_margin_days BETWEEN 0 AND 365),
        quote_validity_days int NOT NULL DEFAULT 30 CHECK (quote_validity_days BETWEEN 1 AND 365),
        updated_by uuid REFERENCES users(id),
        updated_at timestamptz NOT NULL DEFAULT now()
      )`);
    await q.query(`
      CREATE TABLE customers (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        company_id uuid NOT NULL REFERENCES companies(id) ON DELETE CASCADE,
        name varchar(160) NOT NULL,
        contact_name varchar(120),
        email varchar(320),
        phone varchar(40),
        billing_address text,
        notes text,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now()
      )`);
    await q.query(`CREATE INDEX customers_company_name_idx ON customers (company_id, lower(name))`);
    await q.query(`
      CREATE TABLE build_ups (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        company_id uuid NOT NULL REFERENCES companies(id) ON DELETE CASCADE,
        name varchar(120) NOT NULL,
        description text,
        rates jsonb NOT NULL,
        labour_rate numeric(10,2) NOT NULL CHECK (labour_rate >= 0),
        markup_pct numeric(6,2) NOT NULL CHECK (markup_pct >= 0),
        vat_rate_pct numeric(5,2) NOT NULL DEFAULT 20 CHECK (vat_rate_pct >= 0 AND vat_rate_pct <= 100),
        active boolean NOT NULL DEFAULT true,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now()
      )`);
    await q.query(`CREATE UNIQUE INDEX build_ups_company_name_key ON build_ups (company_id, lower(name))`);
    await q.query(`
      CREATE TABLE jobs (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        company_id uuid NOT NULL REFERENCES companies(id) ON DELETE CASCADE,
        number int NOT NULL CHECK (number > 0),
        customer_id uuid NOT NULL REFERENCES customers(id),
        title varchar(160) NOT NULL,
        site_address text NOT NULL,
        substrate varchar(20) NOT NULL CHECK (substrate IN ('timber-deck','osb','existing-felt','asphalt','concrete','old-grp')),
        scheduled_on date,
        estimator_id uuid REFERENCES users(id),
        crew varchar(160),
        topcoat_colour varchar(60),
        build_up_id uuid REFERENCES build_ups(id),
        status varchar(12) NOT NULL DEFAULT 'enquiry'
          CHECK (status IN ('enquiry','quoted','won','scheduled','in-progress','complete','invoiced','lost','cancelled')),
        status_changed_at timestamptz NOT NULL DEFAULT now(),
        roof jsonb,
        roof_updated_at timestamptz,
        accepted_estimate_id uuid,
        notes text,
        created_by uuid REFERENCES users(id),
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now(),
        UNIQUE (company_id, number)
      )`);
    await q.query(`CREATE INDEX jobs_company_status_idx ON jobs (company_id, status)`);
    await q.query(`CREATE INDEX jobs_company_scheduled_idx ON jobs (company_id, scheduled_on)`);
    await q.query(`CREATE INDEX jobs_customer_idx ON jobs (customer_id)`);
    await q.query(`
      CREATE TABLE job_status_changes (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        company_id uuid NOT NULL REFERENCES companies(id) ON DELETE CASCADE,
        job_id uuid NOT NULL REFERENCES jobs(id) ON DELETE CASCADE,
        from_status varchar(12),
        to_status varchar(12) NOT NULL,
        reason text,
        changed_by uuid REFERENCES users(id),
        changed_at timestamptz NOT NULL DEFAULT now()
      )`);
    await q.query(`CREATE INDEX job_status_changes_job_idx ON job_status_changes (job_id, changed_at)`);
    await q.query(`
      CREATE TABLE estimates (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        company_id uuid NOT NULL REFERENCES companies(id) ON DELETE CASCADE,
        job_id uuid NOT NULL REFERENCES jobs(id) ON DELETE CASCADE,
        version int NOT NULL CHECK (version > 0),
        build_up_id uuid REFERENCES build_ups(id),
        build_up_name varchar(120) NOT NULL,
        build_up jsonb NOT NULL,
        roof jsonb NOT NULL,
        priced_on date NOT NULL,
        air_c numeric NOT NULL,
        catalyst_pct numeric NOT NULL,
        deck_area_m2 numeric NOT NULL,
        upstand_area_m2 numeric NOT NULL,
        laminated_area_m2 numeric NOT NULL,
        trim_m numeric NOT NULL,
        corners_external int NOT NULL,
        corners_internal int NOT NULL,
        corners_derived boolean NOT NULL,
        pipes int NOT NULL,
        outlets int NOT NULL,
        laminating_hours numeric NOT NULL,
        trim_hours numeric NOT NULL,
        labour_hours numeric NOT NULL,
        labour_rate numeric(10,2) NOT NULL,
        material_cost numeric(14,2) NOT NULL,
        labour_cost numeric(14,2) NOT NULL,
        markup_pct numeric(6,2) NOT NULL,
        markup numeric(14,2) NOT NULL,
        net numeric(14,2) NOT NULL,
        vat_rate_pct numeric(5,2) NOT NULL,
        vat numeric(14,2) NOT NULL,
        gross numeric(14,2) NOT NULL,
        unpriced int NOT NULL DEFAULT 0,
        cautions jsonb NOT NULL DEFAULT '[]',
        note text,
        created_by uuid REFERENCES users(id),
        created_at timestamptz NOT NULL DEFAULT now(),
        accepted_at timestamptz,
        accepted_by uuid REFERENCES users(id),
        UNIQUE (job_id, version)
      )`);
    await q.query(`CREATE INDEX estimates_company_idx ON estimates (company_id)`);
    await q.query(
      `ALTER TABLE jobs ADD CONSTRAINT jobs_accepted_estimate_fkey FOREIGN KEY (accepted_estimate_id) REFERENCES estimates(id) ON DELETE SET NULL`,
    );
    // The take-off as the costing engine gave it, one line per role, unrounded.
    await q.query(`
      CREATE TABLE estimate_lines (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        company_id uuid NOT NULL REFERENCES companies(id) ON DELETE CASCADE,
        estimate_id uuid NOT NULL REFERENCES estimates(id) ON DELETE CASCADE,
        position int NOT NULL,
        role varchar(20) NOT NULL,
        material_kind varchar(20) NOT NULL,
        description text NOT NULL,
        unit varchar(4) NOT NULL,
        quantity numeric NOT NULL CHECK (quantity >= 0),
        lengths int,
        metres numeric,
        material_id uuid REFERENCES materials(id) ON DELETE SET NULL,
        UNIQUE (estimate_id, role)
      )`);
    // What to buy: the lines of one catalogue material summed, in its stock unit, then packs.
    await q.query(`
      CREATE TABLE estimate_materials (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        company_id uuid NOT NULL REFERENCES companies(id) ON DELETE CASCADE,
        estimate_id uuid NOT NULL REFERENCES estimates(id) ON DELETE CASCADE,
        position int NOT NULL,
        roles text[] NOT NULL,
        material_kind varchar(20) NOT NULL,
        material_id uuid REFERENCES materials(id) ON DELETE SET NULL,
        material_name varchar(160),
        stock_unit varchar(8),
        quantity numeric NOT NULL CHECK (quantity >= 0),
        pack_total numeric,
        leftover numeric,
        cost numeric(14,2),
        problem text
      )`);
    await q.query(
      `CREATE INDEX estimate_materials_estimate_idx ON estimate_materials (estimate_id, position)`,
    );
    await q.query(`
      CREATE TABLE estimate_packs (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        company_id uuid NOT NULL REFERENCES companies(id) ON DELETE CASCADE,
        estimate_material_id uuid NOT NULL REFERENCES estimate_materials(id) ON DELETE CASCADE,
        pack_size numeric(14,3) NOT NULL CHECK (pack_size > 0),
        label varchar(80) NOT NULL,
        count int NOT NULL CHECK (count > 0),
        pack_price numeric(14,2),
        supplier_id uuid REFERENCES suppliers(id) ON DELETE SET NULL,
        supplier_name varchar(160),
        lead_time_days int,
        cost numeric(14,2)
      )`);
    await q.query(`CREATE INDEX estimate_packs_material_idx ON estimate_packs (estimate_material_id)`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE estimate_packs`);
    await q.query(`DROP TABLE estimate_materials`);
    await q.query(`DROP TABLE estimate_lines`);
    await q.query(`ALTER TABLE jobs DROP CONSTRAINT jobs_accepted_estimate_fkey`);
    await q.query(`DROP TABLE estimates`);
    await q.query(`DROP TABLE job_status_changes`);
    await q.query(`DROP TABLE jobs`);
    await q.query(`DROP TABLE build_ups`);
    await q.query(`DROP TABLE customers`);
    await q.query(`DROP TABLE company_settings`);
  }
}
