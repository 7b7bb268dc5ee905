import { DeleteObjectCommand, GetObjectCommand, PutObjectCommand, S3Client } from '@aws-sdk/client-s3';
import { mkdir, readFile, rename, rm, writeFile } from 'node:fs/promises';
import path from 'node:path';
import type { Env } from '../config/env';

/** Where uploaded bytes live. Keys are relative paths like `<companyId>/delivery-notes/<id>.pdf`. */
export interface FileStorage {
  readonly kind: 'local' | 's3';
  put(key: string, body: Buffer, contentType: string): Promise<void>;
  get(key: string): Promise<Buffer>;
  delete(key: string): Promise<void>;
}

export const FILE_STORAGE = Symbol('FILE_STORAGE');

/** Refuses keys that could leave the storage root. */
export function checkKey(key: string): string {
  if (!/^[\w-]+(\/[\w.-]+)+$/.test(key) || key.split('/').some((p) => p === '.' || p === '..')) {
    throw new Error(`Unsafe storage key: ${key}`);
  }
  return key;
}

/** Files under `${POTLIFE_DATA_DIR}/uploads/<key>`; written to a temporary name, then renamed. */
export class LocalFileStorage implements FileStorage {
  readonly kind = 'local' as const;

  constructor(private readonly root: string) {}

  private file(key: string): string {
    return path.join(this.root, checkKey(key));
  }

  async put(key: string, body: Buffer): Promise<void> {
    const target = this.file(key);
    await mkdir(path.dirname(target), { recursive: true });
    const tmp = `${target}.${process.pid}.${Date.now()}.part`;
    await writeFile(tmp, body);
    await rename(tmp, target);
  }

  get(key: string): Promise<Buffer> {
    return readFile(this.file(key));
  }

  async delete(key: string): Promise<void> {
    await rm(this.file(key), { force: true });
  }
}

/** S3-compatible object storage (path-style addressing, so MinIO and the like work), objects under `uploads/`. */
export class S3FileStorage implements FileStorage {
  readonly kind = 's3' as const;

  constructor(
    private readonly client: S3Client,
    private readonly bucket: string,
  ) {}

  private objectKey(key: string): string {
    return `uploads/${checkKey(key)}`;
  }

  async put(key: string, body: Buffer, contentType: string): Promise<void> {
    await this.client.send(new PutObjectCommand({ Bucket: this.bucket, Key: this.objectKey(key), Body: body, ContentType: contentType }));
  }

  async get(key: string): Promise<Buffer> {
    const res = await this.client.send(new GetObjectCommand({ Bucket: this.bucket, Key: this.objectKey(key) }));
    if (!res.Body) {
      throw new Error(`Object ${key} has no body`);
    }
    return Buffer.from(await res.Body.transformToByteArray());
  }

  async delete(key: string): Promise<void> {
    await this.client.send(new DeleteObjectCommand({ Bucket: this.bucket, Key: this.objectKey(key) }));
  }
}

/** The storage the settings ask for: the data dir by default, S3 when UPLOAD_STORAGE=s3. */
export function createFileStorage(env: Env): FileStorage {
  if (env.UPLOAD_STORAGE === 's3') {
    const client = new S3Client({
      endpoint: env.S3_ENDPOINT,
      region: env.S3_REGION,
      forcePathStyle: true,
      credentials:
        env.S3_ACCESS_KEY_ID && env.S3_SECRET_ACCESS_KEY
          ? { accessKeyId: env.S3_ACCESS_KEY_ID, secretAccessKey: env.S3_SECRET_ACCESS_KEY }
          : undefined,
    });
    return new S3FileStorage(client, env.S3_BUCKET ?? '');
  }
  return new LocalFileStorage(path.join(env.POTLIFE_DATA_DIR, 'uploads'));
}
