import { UnprocessableEntityException } from '@nestjs/common';
import { EntityManager } from 'typeorm';
import { canonicalJson, IdempotencyService, requestHash } from './idempotency.service';

/** A manager whose idempotency_keys table lives in a Map. */
function fakeManager(rows = new Map<string, { route: string; hash: string; response: unknown }>()) {
  const query = jest.fn(async (sql: string, params: unknown[]) => {
    const k = `${params[0]}:${params[1]}`;
    if (sql.startsWith('INSERT INTO idempotency_keys')) {
      if (rows.has(k)) {
        return [];
      }
      rows.set(k, { route: params[2] as string, hash: params[3] as string, response: null });
      return [{ key: params[1] }];
    }
    if (sql.startsWith('SELECT route')) {
      const r = rows.get(k);
      return r ? [r] : [];
    }
    if (sql.startsWith('UPDATE idempotency_keys')) {
      rows.get(k)!.response = JSON.parse(params[2] as string);
      return [];
    }
    throw new Error(`unexpected ${sql}`);
  });
  return { m: { query } as unknown as EntityManager, rows, query };
}

describe('IdempotencyService', () => {
  const svc = new IdempotencyService({} as never);
  const req = (key: string | undefined, request: unknown) => ({ companyId: 'c', userId: 'u', key, route: 'POST /api/stock-movements', request });

  it('runs once per key and answers the stored response to a retry', async () => {
    const { m } = fakeManager();
    const work = jest.fn(async () => ({ ok: 1 }));
    expect(await svc.runIn(m, req('k1', { a: 1, b: 2 }), work)).toEqual({ ok: 1 });
    expect(await svc.runIn(m, req('k1', { b: 2, a: 1 }), work)).toEqual({ ok: 1 });
    expect(work).toHaveBeenCalledTimes(1);
  });

  it('refuses the same key with a different request with 422', async () => {
    const { m } = fakeManager();
    await svc.runIn(m, req('k1', { a: 1 }), async () => 'first');
    await expect(svc.runIn(m, req('k1', { a: 2 }), async () => 'second')).rejects.toBeInstanceOf(UnprocessableEntityException);
  });

  it('without a key simply runs', async () => {
    const { m, query } = fakeManager();
    const work = jest.fn(async () => 1);
    await svc.runIn(m, req(undefined, {}), work);
    await svc.runIn(m, req(undefined, {}), work);
    expect(work).toHaveBeenCalledTimes(2);
    expect(query).not.toHaveBeenCalled();
  });

  it('hashes requests canonically: key order and undefined fields do not matter', () => {
    expect(canonicalJson({ b: [1, { d: 1, c: undefined }], a: 'x' })).toBe('{"a":"x","b":[1,{"d":1}]}');
    expect(requestHash('r', { a: 1, b: 2 })).toBe(requestHash('r', { b: 2, a: 1 }));
    expect(requestHash('r', { a: 1 })).not.toBe(requestHash('other', { a: 1 }));
  });
});
