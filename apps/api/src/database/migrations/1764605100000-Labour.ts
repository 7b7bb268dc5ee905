import { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Labour: the hours a crew actually worked on a job, one entry per person per day (or part of a
 * day). A mistaken entry is struck out (removed_at, removed_by, remove_reason), never deleted, so
 * the job's time sheet keeps its history; only entries not struck out count.
 */
export class Labour1764605100000 implements MigrationInterface {
  name = 'Labour1764605100000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE TABLE job_labour_entries (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        company_id uuid NOT NULL REFERENCES companies(id) ON DELETE CASCADE,
        job_id uuid NOT NULL REFERENCES jobs(id) ON DELETE CASCADE,
        worked_on date NOT NULL,
        hours numeric(5,2) NOT NULL CHECK (hours > 0 AND hours <= 24),
        crew_member varchar(120) NOT NULL CHECK (length(btrim(crew_member)) > 0),
        note text,
        created_by uuid REFERENCES users(id),
        created_at timestamptz NOT NULL DEFAULT now(),
        removed_at timestamptz,
        removed_by uuid REFERENCES users(id),
        remove_reason text,
        CHECK ((removed_at IS NULL) = (removed_by IS NULL))
      )`);
    await q.query(
      `CREATE INDEX job_labour_entries_job_idx ON job_labour_entries (company_id, job_id, worked_on)`,
    );
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE job_labour_entries`);
  }
}
