import { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Stock: locations, lots, the append-only stock ledger with its cached balances, receipts (with
 * their delivery-note files), counts, temperature readings, and idempotency keys for every
 * stock-changing request.
 */
export class Stock1764603000000 implements MigrationInterface {
  name = 'Stock1764603000000';

  async up(q: QueryRunner): Promise<void> {
    // Uploaded files (delivery notes); the bytes live in FileStorage (data dir or S3), the row says where.
    await q.query(`
      CREATE TABLE stored_files (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        company_id uuid NOT NULL REFERENCES companies(id) ON DELETE CASCADE,
        storage varchar(8) NOT NULL CHECK (storage IN ('local', 's3')),
        storage_key varchar(400) NOT NULL,
        content_type varchar(100) NOT NULL,
        size_bytes int NOT NULL CHECK (size_bytes >= 0),
        original_name varchar(255) NOT NULL,
        sha256 char(64) NOT NULL,
        created_by uuid REFERENCES users(id),
        created_at timestamptz NOT NULL DEFAULT now()
      )`);
    await q.query(`CREATE INDEX stored_files_company_idx ON stored_files (company_id)`);

    await q.query(`
      CREATE TABLE locations (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        company_id uuid NOT NULL REFERENCES companies(id) ON DELETE CASCADE,
        name varchar(120) NOT NULL,
        kind varchar(24) NOT NULL CHECK (kind IN ('store','bay','shelf','flammables-cabinet','peroxide-store','van','outdoor')),
        parent_id uuid REFERENCES locations(id),
        capacity_litres numeric(10,3) CHECK (capacity_litres > 0),
        allowed_hazard_classes text[] NOT NULL DEFAULT '{none}',
        active boolean NOT NULL DEFAULT true,
        notes text,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now(),
        CHECK (kind <> 'flammables-cabinet' OR capacity_litres IS NOT NULL),
        CHECK (parent_id IS NULL OR parent_id <> id)
      )`);
    await q.query(`CREATE UNIQUE INDEX locations_company_name_key ON locations (company_id, lower(name))`);
    await q.query(`CREATE INDEX locations_parent_idx ON locations (parent_id)`);

    await q.query(`
      CREATE TABLE receipts (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        company_id uuid NOT NULL REFERENCES companies(id) ON DELETE CASCADE,
        number int NOT NULL,
        supplier_id uuid REFERENCES suppliers(id),
        supplier_name varchar(160),
        delivery_note_number varchar(60),
        received_on date NOT NULL,
        note text,
        delivery_note_file_id uuid REFERENCES stored_files(id),
        received_by uuid NOT NULL REFERENCES users(id),
        created_at timestamptz NOT NULL DEFAULT now(),
        UNIQUE (company_id, number),
        CHECK (supplier_id IS NOT NULL OR supplier_name IS NOT NULL)
      )`);
    await q.query(`CREATE INDEX receipts_company_received_idx ON receipts (company_id, received_on DESC)`);

    await q.query(`
      CREATE TABLE lots (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        company_id uuid NOT NULL REFERENCES companies(id) ON DELETE CASCADE,
        material_id uuid NOT NULL REFERENCES materials(id),
        batch_number varchar(60),
        received_on date NOT NULL,
        expires_on date,
        location_id uuid NOT NULL REFERENCES locations(id),
        status varchar(12) NOT NULL DEFAULT 'available' CHECK (status IN ('available','quarantined','expired','written-off')),
        unit_cost numeric(14,4) NOT NULL CHECK (unit_cost >= 0),
        quantity numeric(14,3) NOT NULL DEFAULT 0 CHECK (quantity >= 0),
        receipt_id uuid REFERENCES receipts(id),
        exposure_flagged boolean NOT NULL DEFAULT false,
        exposure_reason text,
        exposure_flagged_at timestamptz,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now()
      )`);
    await q.query(`CREATE INDEX lots_company_material_idx ON lots (company_id, material_id)`);
    await q.query(`CREATE INDEX lots_company_expiry_idx ON lots (company_id, expires_on)`);
    await q.query(`CREATE INDEX lots_receipt_idx ON lots (receipt_id)`);

    // purchase_order_line_id points at an order line once purchasing exists (add the FK then).
    await q.query(`
      CREATE TABLE receipt_lines (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        company_id uuid NOT NULL REFERENCES companies(id) ON DELETE CASCADE,
        receipt_id uuid NOT NULL REFERENCES receipts(id),
        line_no int NOT NULL CHECK (line_no > 0),
        material_id uuid NOT NULL REFERENCES materials(id),
        purchase_order_line_id uuid,
        batch_number varchar(60),
        expires_on date,
        expiry_computed boolean NOT NULL DEFAULT false,
        packs_received int NOT NULL CHECK (packs_received >= 0),
        pack_size numeric(14,3) NOT NULL CHECK (pack_size > 0),
        packs_refused int NOT NULL DEFAULT 0 CHECK (packs_refused >= 0),
        refused_reason text,
        quantity numeric(14,3) NOT NULL CHECK (quantity >= 0),
        unit_cost numeric(14,4) NOT NULL CHECK (unit_cost >= 0),
        location_id uuid REFERENCES locations(id),
        lot_id uuid REFERENCES lots(id),
        over_delivery_allowed_by uuid REFERENCES users(id),
        UNIQUE (receipt_id, line_no),
        CHECK (packs_received + packs_refused > 0),
        CHECK (packs_received = 0 OR (location_id IS NOT NULL AND lot_id IS NOT NULL))
      )`);
    await q.query(`CREATE INDEX receipt_lines_order_line_idx ON receipt_lines (company_id, purchase_order_line_id) WHERE purchase_order_line_id IS NOT NULL`);

    await q.query(`
      CREATE TABLE stock_counts (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        company_id uuid NOT NULL REFERENCES companies(id) ON DELETE CASCADE,
        number int NOT NULL,
        location_id uuid REFERENCES locations(id),
        status varchar(10) NOT NULL DEFAULT 'open' CHECK (status IN ('open','submitted','approved','cancelled')),
        note text,
        opened_by uuid NOT NULL REFERENCES users(id),
        opened_at timestamptz NOT NULL DEFAULT now(),
        submitted_by uuid REFERENCES users(id),
        submitted_at timestamptz,
        decided_by uuid REFERENCES users(id),
        decided_at timestamptz,
        decision_note text,
        UNIQUE (company_id, number)
      )`);
    // The locations a count covers, fixed when it opens (a location and everything inside it, or all).
    await q.query(`
      CREATE TABLE stock_count_locations (
        count_id uuid NOT NULL REFERENCES stock_counts(id) ON DELETE CASCADE,
        location_id uuid NOT NULL REFERENCES locations(id),
        PRIMARY KEY (count_id, location_id)
      )`);
    await q.query(`CREATE INDEX stock_count_locations_location_idx ON stock_count_locations (location_id)`);
    await q.query(`
      CREATE TABLE stock_count_lines (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        company_id uuid NOT NULL REFERENCES companies(id) ON DELETE CASCADE,
        count_id uuid NOT NULL REFERENCES stock_counts(id) ON DELETE CASCADE,
        lot_id uuid NOT NULL REFERENCES lots(id),
        location_id uuid NOT NULL REFERENCES locations(id),
        expected_quantity numeric(14,3) NOT NULL CHECK (expected_quantity >= 0),
        counted_quantity numeric(14,3) CHECK (counted_quantity >= 0),
        unit_cost numeric(14,4) NOT NULL,
        found_during_count boolean NOT NULL DEFAULT false,
        counted_by uuid REFERENCES users(id),
        counted_at timestamptz,
        UNIQUE (count_id, lot_id, location_id)
      )`);

    // The ledger. One row changes one lot's balance at one location (location_id) by a signed
    // quantity; a transfer is two rows (out of one location, into another) sharing operation_id.
    await q.query(`
      CREATE TABLE stock_movements (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        company_id uuid NOT NULL REFERENCES companies(id),
        operation_id uuid NOT NULL,
        kind varchar(12) NOT NULL CHECK (kind IN ('receipt','transfer','issue','return','adjustment','write-off')),
        lot_id uuid NOT NULL REFERENCES lots(id),
        material_id uuid NOT NULL REFERENCES materials(id),
        location_id uuid NOT NULL REFERENCES locations(id),
        from_location_id uuid REFERENCES locations(id),
        to_location_id uuid REFERENCES locations(id),
        quantity numeric(14,3) NOT NULL CHECK (quantity <> 0),
        unit_cost numeric(14,4) NOT NULL,
        reason varchar(120),
        note text,
        user_id uuid NOT NULL REFERENCES users(id),
        created_at timestamptz NOT NULL DEFAULT now(),
        job_id uuid,
        receipt_line_id uuid REFERENCES receipt_lines(id),
        count_id uuid REFERENCES stock_counts(id),
        reverses_movement_id uuid REFERENCES stock_movements(id),
        CHECK ((kind IN ('receipt','return') AND quantity > 0) OR (kind IN ('issue','write-off') AND quantity < 0) OR kind IN ('transfer','adjustment')),
        CHECK (kind <> 'write-off' OR reason IS NOT NULL),
        CHECK (kind NOT IN ('issue','return') OR job_id IS NOT NULL)
      )`);
    await q.query(`CREATE UNIQUE INDEX stock_movements_reverses_key ON stock_movements (reverses_movement_id) WHERE reverses_movement_id IS NOT NULL`);
    await q.query(`CREATE INDEX stock_movements_lot_idx ON stock_movements (company_id, lot_id, created_at)`);
    await q.query(`CREATE INDEX stock_movements_location_idx ON stock_movements (company_id, location_id, created_at)`);
    await q.query(`CREATE INDEX stock_movements_created_idx ON stock_movements (company_id, created_at DESC)`);
    await q.query(`CREATE INDEX stock_movements_operation_idx ON stock_movements (operation_id)`);
    await q.query(`CREATE INDEX stock_movements_job_idx ON stock_movements (company_id, job_id) WHERE job_id IS NOT NULL`);
    // Append-only: a mistake is put right by a reversing movement, never by editing the ledger.
    await q.query(`
      CREATE FUNCTION stock_movements_append_only() RETURNS trigger LANGUAGE plpgsql AS $$
      BEGIN
        RAISE EXCEPTION 'stock_movements is append-only: % refused; post a reversing movement instead', TG_OP
          USING ERRCODE = 'restrict_violation';
      END
      $$`);
    await q.query(`
      CREATE TRIGGER stock_movements_no_change BEFORE UPDATE OR DELETE ON stock_movements
      FOR EACH ROW EXECUTE FUNCTION stock_movements_append_only()`);
    await q.query(`
      CREATE TRIGGER stock_movements_no_truncate BEFORE TRUNCATE ON stock_movements
      FOR EACH STATEMENT EXECUTE FUNCTION stock_movements_append_only()`);

    // Balances cached from the ledger, written in the same transaction as each movement.
    await q.query(`
      CREATE TABLE lot_balances (
        company_id uuid NOT NULL REFERENCES companies(id) ON DELETE CASCADE,
        lot_id uuid NOT NULL REFERENCES lots(id),
        location_id uuid NOT NULL REFERENCES locations(id),
        quantity numeric(14,3) NOT NULL CHECK (quantity >= 0),
        updated_at timestamptz NOT NULL DEFAULT now(),
        PRIMARY KEY (lot_id, location_id)
      )`);
    await q.query(`CREATE INDEX lot_balances_location_idx ON lot_balances (company_id, location_id) WHERE quantity > 0`);

    await q.query(`
      CREATE TABLE temperature_readings (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        company_id uuid NOT NULL REFERENCES companies(id) ON DELETE CASCADE,
        location_id uuid NOT NULL REFERENCES locations(id),
        taken_at timestamptz NOT NULL,
        temperature_c numeric(5,2) NOT NULL,
        source varchar(8) NOT NULL CHECK (source IN ('manual','import')),
        note text,
        user_id uuid REFERENCES users(id),
        created_at timestamptz NOT NULL DEFAULT now(),
        UNIQUE (location_id, taken_at)
      )`);
    await q.query(`CREATE INDEX temperature_readings_company_idx ON temperature_readings (company_id, location_id, taken_at)`);

    // Who did what to a lot besides moving it: quarantine, release, exposure flag and its clearing.
    await q.query(`
      CREATE TABLE lot_events (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        company_id uuid NOT NULL REFERENCES companies(id) ON DELETE CASCADE,
        lot_id uuid NOT NULL REFERENCES lots(id),
        kind varchar(16) NOT NULL CHECK (kind IN ('quarantined','released','flagged','flag-cleared','written-off')),
        note text,
        reading_id uuid REFERENCES temperature_readings(id),
        user_id uuid REFERENCES users(id),
        created_at timestamptz NOT NULL DEFAULT now()
      )`);
    await q.query(`CREATE INDEX lot_events_lot_idx ON lot_events (lot_id, created_at)`);

    // A retried request with the same key answers the stored response instead of running again.
    await q.query(`
      CREATE TABLE idempotency_keys (
        company_id uuid NOT NULL REFERENCES companies(id) ON DELETE CASCADE,
        key varchar(200) NOT NULL,
        route varchar(200) NOT NULL,
        request_hash char(64) NOT NULL,
        response jsonb,
        user_id uuid REFERENCES users(id),
        created_at timestamptz NOT NULL DEFAULT now(),
        PRIMARY KEY (company_id, key)
      )`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE idempotency_keys`);
    await q.query(`DROP TABLE lot_events`);
    await q.query(`DROP TABLE temperature_readings`);
    await q.query(`DROP TABLE lot_balances`);
    await q.query(`DROP TABLE stock_movements`);
    await q.query(`DROP FUNCTION stock_movements_append_only()`);
    await q.query(`DROP TABLE stock_count_lines`);
    await q.query(`DROP TABLE stock_count_locations`);
    await q.query(`DROP TABLE stock_counts`);
    await q.query(`DROP TABLE receipt_lines`);
    await q.query(`DROP TABLE lots`);
    await q.query(`DROP TABLE receipts`);
    await q.query(`DROP TABLE locations`);
    await q.query(`DROP TABLE stored_files`);
  }
}
