import { scryptSync } from 'node:crypto';
import { hashPassword, hashToken, newToken, verifyPassword } from './password';

describe('password hashing (scrypt, node:crypto)', () => {
  it('verifies the right password and refuses a wrong one', async () => {
    const stored = await hashPassword('correct horse battery');
    expect(stored).toMatch(/^scrypt\$32768\$8\$1\$[\w-]{22}\$[\w-]{43}$/);
    expect(await verifyPassword('correct horse battery', stored)).toBe(true);
    expect(await verifyPassword('correct horse batterY', stored)).toBe(false);
  });

  it('salts: the same password never hashes the same twice', async () => {
    expect(await hashPassword('same-password')).not.toBe(await hashPassword('same-password'));
  });

  it('agrees with a direct scryptSync computation (node:crypto, RFC 7914 parameters)', async () => {
    const stored = await hashPassword('check-against-sync');
    const [, n, r, p, salt, hash] = stored.split('$');
    const again = scryptSync('check-against-sync', Buffer.from(salt!, 'base64url'), 32, { N: Number(n), r: Number(r), p: Number(p), maxmem: 64 * 1024 * 1024 });
    expect(again.toString('base64url')).toBe(hash);
  });

  it.each([null, undefined, '', 'plain', 'bcrypt$1$2$3$4$5'])('refuses a malformed stored value %p', async (stored) => {
    expect(await verifyPassword('anything', stored)).toBe(false);
  });

  it('one-time tokens are random and stored only as their SHA-256', () => {
    const a = newToken();
    const b = newToken();
    expect(a.token).not.toBe(b.token);
    expect(a.hash).toBe(hashToken(a.token));
    expect(a.hash).toMatch(/^[0-9a-f]{64}$/);
    // SHA-256 of "abc": FIPS 180-2 appendix B.1 test vector.
    expect(hashToken('abc')).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad');
  });
});
