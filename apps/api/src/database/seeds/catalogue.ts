import { EntityManager } from 'typeorm';
import type { SeedContext } from './demo-company';

/** Demo data for catalogue: safe to run twice (each step looks for what it would create). */
export async function seedCatalogue(_m: EntityManager, _ctx: SeedContext): Promise<void> {
  // filled in by the catalogue work
}
