import { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Reservations: packs of lots held for a job's date, and the shortfalls a reservation could not
 * find; the ledger's job_id now points at jobs.
 */
export class Reservations1764604500000 implements MigrationInterface {
  name = 'Reservations1764604500000';

  async up(q: QueryRunner): Promise<void> {
    // A hold on part of a lot for a job. What is still held is quantity − issued_quantity while
    // status is 'held'; issuing against it raises issued_quantity, releasing ends it.
    await q.query(`
      CREATE TABLE reservations (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        company_id uuid NOT NULL REFERENCES companies(id) ON DELETE CASCADE,
        job_id uuid NOT NULL REFERENCES jobs(id) ON DELETE CASCADE,
        estimate_id uuid NOT NULL REFERENCES estimates(id),
        material_id uuid NOT NULL REFERENCES materials(id),
        lot_id uuid NOT NULL REFERENCES lots(id),
        quantity numeric(14,3) NOT NULL CHECK (quantity > 0),
        issued_quantity numeric(14,3) NOT NULL DEFAULT 0 CHECK (issued_quantity >= 0 AND issued_quantity <= quantity),
        status varchar(10) NOT NULL DEFAULT 'held' CHECK (status IN ('held','issued','released')),
        job_date date NOT NULL,
        use_by date NOT NULL,
        created_by uuid REFERENCES users(id),
        created_at timestamptz NOT NULL DEFAULT now(),
        released_at timestamptz,
        released_by uuid REFERENCES users(id),
        release_reason text,
        CHECK (status <> 'released' OR released_at IS NOT NULL)
      )`);
    await q.query(`CREATE INDEX reservations_lot_held_idx ON reservations (lot_id) WHERE status = 'held'`);
    await q.query(`CREATE INDEX reservations_job_idx ON reservations (company_id, job_id, status)`);
    // What the last reservation run of a job could not find, ready to become purchase orders.
    await q.query(`
      CREATE TABLE reservation_shortfalls (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        company_id uuid NOT NULL REFERENCES companies(id) ON DELETE CASCADE,
        job_id uuid NOT NULL REFERENCES jobs(id) ON DELETE CASCADE,
        estimate_id uuid NOT NULL REFERENCES estimates(id),
        material_id uuid NOT NULL REFERENCES materials(id),
        quantity numeric(14,3) NOT NULL CHECK (quantity > 0),
        job_date date NOT NULL,
        needed_by date NOT NULL,
        lead_time_days int,
        supplier_id uuid REFERENCES suppliers(id) ON DELETE SET NULL,
        supplier_name varchar(160),
        created_at timestamptz NOT NULL DEFAULT now(),
        UNIQUE (job_id, material_id)
      )`);
    await q.query(
      `CREATE INDEX reservation_shortfalls_company_idx ON reservation_shortfalls (company_id, needed_by)`,
    );
    await q.query(
      `ALTER TABLE stock_movements ADD CONSTRAINT stock_movements_job_fkey FOREIGN KEY (job_id) REFERENCES jobs(id)`,
    );
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE stock_movements DROP CONSTRAINT stock_movements_job_fkey`);
    await q.query(`DROP TABLE reservation_shortfalls`);
    await q.query(`DROP TABLE reservations`);
  }
}
