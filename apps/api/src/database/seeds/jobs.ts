import { EntityManager } from 'typeorm';
import type { SeedContext } from './demo-company';

/** Demo data for jobs: safe to run twice (each step looks for what it would create). */
export async function seedJobs(_m: EntityManager, _ctx: SeedContext): Promise<void> {
  // filled in by the jobs work
}
