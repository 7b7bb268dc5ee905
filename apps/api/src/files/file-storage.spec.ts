import { GetObjectCommand, PutObjectCommand, S3Client } from '@aws-sdk/client-s3';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { validateEnv } from '../config/env';
import { checkKey, createFileStorage, LocalFileStorage, S3FileStorage } from './file-storage';

const env = (extra: Record<string, string>) => validateEnv({ JWT_SECRET: 'x'.repeat(40), ...extra });

describe('FileStorage', () => {
  it('keeps files under the data dir by default', async () => {
    const dir = mkdtempSync(path.join(tmpdir(), 'potlife-files-'));
    try {
      const storage = createFileStorage(env({ POTLIFE_DATA_DIR: dir }));
      expect(storage).toBeInstanceOf(LocalFileStorage);
      await storage.put('c1/delivery-notes/a.pdf', Buffer.from('%PDF-1.4'), 'application/pdf');
      expect(readFileSync(path.join(dir, 'uploads', 'c1', 'delivery-notes', 'a.pdf'), 'utf8')).toBe('%PDF-1.4');
      expect((await storage.get('c1/delivery-notes/a.pdf')).toString()).toBe('%PDF-1.4');
      await storage.delete('c1/delivery-notes/a.pdf');
      await expect(storage.get('c1/delivery-notes/a.pdf')).rejects.toThrow();
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });

  it('uses S3-compatible storage with path-style addressing when UPLOAD_STORAGE=s3', async () => {
    const storage = createFileStorage(env({ UPLOAD_STORAGE: 's3', S3_ENDPOINT: 'http://127.0.0.1:9000', S3_BUCKET: 'potlife', S3_ACCESS_KEY_ID: 'k', S3_SECRET_ACCESS_KEY: 's' }));
    expect(storage).toBeInstanceOf(S3FileStorage);
    const client = (storage as unknown as { client: S3Client }).client;
    expect(client.config.forcePathStyle).toBe(true);
    const send = jest.spyOn(client, 'send').mockImplementation((cmd: unknown) =>
      Promise.resolve(cmd instanceof GetObjectCommand ? { Body: { transformToByteArray: () => Promise.resolve(new Uint8Array(Buffer.from('png bytes'))) } } : {}) as never,
    );
    await storage.put('c1/delivery-notes/a.png', Buffer.from('png bytes'), 'image/png');
    const put = send.mock.calls[0]![0] as PutObjectCommand;
    expect(put).toBeInstanceOf(PutObjectCommand);
    expect(put.input).toMatchObject({ Bucket: 'potlife', Key: 'uploads/c1/delivery-notes/a.png', ContentType: 'image/png' });
    expect((await storage.get('c1/delivery-notes/a.png')).toString()).toBe('png bytes');
  });

  it.each(['../etc/passwd', 'c1/../../x', '/abs/path', 'c1//x', 'c1/x y'])('refuses the key %j', (key) => {
    expect(() => checkKey(key)).toThrow(/Unsafe storage key/);
  });
});
