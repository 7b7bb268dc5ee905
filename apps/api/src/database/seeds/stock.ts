import { EntityManager } from 'typeorm';
import type { SeedContext } from './demo-company';

/** Demo data for stock: safe to run twice (each step looks for what it would create). */
export async function seedStock(_m: EntityManager, _ctx: SeedContext): Promise<void> {
  // filled in by the stock work
}
