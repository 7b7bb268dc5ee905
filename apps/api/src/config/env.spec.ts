import { validateEnv } from './env';

const good = { JWT_SECRET: 'x'.repeat(32) };

describe('validateEnv', () => {
  it('fills defaults for a bare environment with a secret', () => {
    const env = validateEnv(good);
    expect(env).toMatchObject({ PORT: 3000, HOST: '127.0.0.1', QUEUE_ROLE: 'all', UPLOAD_STORAGE: 'local', PUBLIC_URL: 'http://127.0.0.1:3000' });
  });

  it('lists every bad variable at once', () => {
    expect(() =>
      validateEnv({ PORT: 'eighty', DATABASE_URL: 'mysql://x', QUEUE_ROLE: 'both', JWT_SECRET: 'short', UPLOAD_STORAGE: 's3' }),
    ).toThrow(
      /PORT must be a whole number[\s\S]*JWT_SECRET must be set[\s\S]*UPLOAD_STORAGE=s3 needs S3_ENDPOINT[\s\S]*DATABASE_URL must start with postgres:[\s\S]*QUEUE_ROLE must be one of all, api, worker/,
    );
  });
});
