import {
  Inject,
  Injectable,
  Logger,
  OnApplicationBootstrap,
  OnApplicationShutdown,
  Optional,
  UnprocessableEntityException,
} from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { createHash } from 'node:crypto';
import { DataSource, EntityManager } from 'typeorm';
import { ENV, Env } from '../config/env';

/**
 * How long a key is kept. A client retries within seconds or minutes; a week also covers a phone
 * that lost its signal in the store on a Friday and retries on Monday. Older keys are deleted.
 */
export const IDEMPOTENCY_KEEP_DAYS = 7;
const PURGE_MS = 60 * 60 * 1000;

export interface IdempotentRequest {
  companyId: string;
  userId: string;
  /** the `Idempotency-Key` header; without one the work simply runs */
  key: string | undefined;
  /** the route as OpenAPI prints it, e.g. `POST /api/stock-movements` */
  route: string;
  /** everything that makes the request what it is: path ids and body */
  request: unknown;
}

/** JSON with object keys sorted, so the same request always hashes the same. */
export function canonicalJson(value: unknown): string {
  if (value === null || typeof value !== 'object') {
    return JSON.stringify(value) ?? 'null';
  }
  if (Array.isArray(value)) {
    return `[${value.map(canonicalJson).join(',')}]`;
  }
  const entries = Object.entries(value as Record<string, unknown>)
    .filter(([, v]) => v !== undefined)
    .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
  return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonicalJson(v)}`).join(',')}}`;
}

export const requestHash = (route: string, request: unknown) => createHash('sha256').update(canonicalJson({ route, request })).digest('hex');

/**
 * Idempotent stock-changing requests. The key is claimed (company, key, route, request hash)
 * inside the request's own transaction, before anything else; the response is stored in the same
 * transaction. A retry with the same key answers the stored response and changes nothing; while
 * the first is still running, the retry waits on the key's row, then answers the same. The same
 * key with a different request (or route) answers 422. A request that fails rolls its key back,
 * so it can be retried. Keys are kept for IDEMPOTENCY_KEEP_DAYS.
 */
@Injectable()
export class IdempotencyService implements OnApplicationBootstrap, OnApplicationShutdown {
  private readonly logger = new Logger(IdempotencyService.name);
  private purger?: NodeJS.Timeout;

  constructor(
    @InjectDataSource() private readonly db: DataSource,
    @Optional() @Inject(ENV) private readonly env?: Env,
  ) {}

  /** Deletes keys older than `keepDays`; the number deleted. Runs hourly where the workers run. */
  async purge(keepDays = IDEMPOTENCY_KEEP_DAYS): Promise<number> {
    const [row] = (await this.db.query(
      `WITH gone AS (DELETE FROM idempotency_keys WHERE created_at < now() - make_interval(days => $1) RETURNING 1)
       SELECT count(*)::int AS n FROM gone`,
      [keepDays],
    )) as { n: number }[];
    return row?.n ?? 0;
  }

  onApplicationBootstrap(): void {
    if (!this.env || this.env.QUEUE_ROLE === 'api' || this.env.NODE_ENV === 'test') {
      return;
    }
    this.purger = setInterval(() => {
      this.purge().catch((err: unknown) => this.logger.warn(`idempotency key purge failed: ${String(err)}`));
    }, PURGE_MS);
    this.purger.unref();
  }

  onApplicationShutdown(): void {
    if (this.purger) {
      clearInterval(this.purger);
    }
  }

  /** Runs `work` in a new transaction, once per key. */
  run<T>(req: IdempotentRequest, work: (m: EntityManager) => Promise<T>): Promise<T> {
    return this.db.transaction((m) => this.runIn(m, req, work));
  }

  /** The same inside a transaction the caller already holds (claim the key before locking anything else). */
  async runIn<T>(m: EntityManager, req: IdempotentRequest, work: (m: EntityManager) => Promise<T>): Promise<T> {
    if (!req.key) {
      return work(m);
    }
    const hash = requestHash(req.route, req.request);
    const claimed: unknown[] = await m.query(
      `INSERT INTO idempotency_keys (company_id, key, route, request_hash, user_id) VALUES ($1, $2, $3, $4, $5)
       ON CONFLICT (company_id, key) DO NOTHING RETURNING key`,
      [req.companyId, req.key, req.route, hash, req.userId],
    );
    if (claimed.length === 0) {
      const [row] = (await m.query(`SELECT route, request_hash AS hash, response FROM idempotency_keys WHERE company_id = $1 AND key = $2`, [
        req.companyId,
        req.key,
      ])) as { route: string; hash: string; response: T }[];
      if (!row || row.route !== req.route || row.hash !== hash) {
        throw new UnprocessableEntityException({
          message: 'This Idempotency-Key was already used for a different request: send a new key with each new request, and the same key only to retry it',
          code: 'idempotency_key_reused',
        });
      }
      return row.response;
    }
    const result = await work(m);
    await m.query(`UPDATE idempotency_keys SET response = $3::jsonb WHERE company_id = $1 AND key = $2`, [
      req.companyId,
      req.key,
      JSON.stringify(result ?? null),
    ]);
    return result;
  }
}
