import path from 'node:path';

/** Every setting Potlife reads from the environment, validated once at start-up. */
export interface Env {
  NODE_ENV: 'development' | 'production' | 'test';
  HOST: string;
  PORT: number;
  PUBLIC_URL: string;
  DATABASE_URL: string;
  REDIS_URL: string;
  REDIS_PREFIX: string;
  SMTP_URL: string;
  MAIL_FROM: string;
  MAIL_ATTEMPTS: number;
  MAIL_RETRY_BASE_MS: number;
  JWT_SECRET: string;
  JWT_EXPIRES_IN: string;
  POTLIFE_DATA_DIR: string;
  UPLOAD_STORAGE: 'local' | 's3';
  S3_ENDPOINT?: string;
  S3_BUCKET?: string;
  S3_REGION: string;
  S3_ACCESS_KEY_ID?: string;
  S3_SECRET_ACCESS_KEY?: string;
  QUEUE_ROLE: 'all' | 'api' | 'worker';
  LOGIN_MAX_FAILURES: number;
  LOGIN_FAILURE_WINDOW_S: number;
  RATE_LIMIT_PER_MINUTE: number;
  WEB_DIST_DIR: string;
}

const int = (name: string, raw: string | undefined, fallback: number, errors: string[], min = 0): number => {
  if (raw === undefined || raw === '') {
    return fallback;
  }
  const n = Number(raw);
  if (!Number.isInteger(n) || n < min) {
    errors.push(`${name} must be a whole number ≥ ${min} (got "${raw}")`);
    return fallback;
  }
  return n;
};

const url = (name: string, raw: string | undefined, fallback: string, protocols: string[], errors: string[]): string => {
  const value = raw && raw !== '' ? raw : fallback;
  try {
    const u = new URL(value);
    if (!protocols.includes(u.protocol)) {
      errors.push(`${name} must start with ${protocols.join(' or ')} (got "${u.protocol}")`);
    }
  } catch {
    errors.push(`${name} is not a URL (got "${value}")`);
  }
  return value;
};

function oneOf<T extends string>(name: string, raw: string | undefined, allowed: readonly T[], fallback: T, errors: string[]): T {
  if (raw === undefined || raw === '') {
    return fallback;
  }
  if (!(allowed as readonly string[]).includes(raw)) {
    errors.push(`${name} must be one of ${allowed.join(', ')} (got "${raw}")`);
    return fallback;
  }
  return raw as T;
}

/** Validates process.env; throws one error listing every bad variable, so start-up fails at once. */
export function validateEnv(raw: Record<string, string | undefined>): Env {
  const errors: string[] = [];
  const NODE_ENV = oneOf('NODE_ENV', raw.NODE_ENV, ['development', 'production', 'test'] as const, 'development', errors);
  const PORT = int('PORT', raw.PORT, 3000, errors, 1);
  const HOST = raw.HOST || '127.0.0.1';
  const dataDir = path.resolve(raw.POTLIFE_DATA_DIR || path.join(__dirname, '../../../../.data'));
  const JWT_SECRET = raw.JWT_SECRET ?? '';
  if (JWT_SECRET.length < 32) {
    errors.push('JWT_SECRET must be set to at least 32 random characters');
  }
  const UPLOAD_STORAGE = oneOf('UPLOAD_STORAGE', raw.UPLOAD_STORAGE, ['local', 's3'] as const, 'local', errors);
  if (UPLOAD_STORAGE === 's3' && (!raw.S3_BUCKET || !raw.S3_ENDPOINT)) {
    errors.push('UPLOAD_STORAGE=s3 needs S3_ENDPOINT and S3_BUCKET');
  }
  const env: Env = {
    NODE_ENV,
    HOST,
    PORT,
    PUBLIC_URL: url('PUBLIC_URL', raw.PUBLIC_URL, `http://127.0.0.1:${PORT}`, ['http:', 'https:'], errors).replace(/\/$/, ''),
    DATABASE_URL: url('DATABASE_URL', raw.DATABASE_URL, 'postgres://potlife@127.0.0.1:54329/potlife', ['postgres:', 'postgresql:'], errors),
    REDIS_URL: url('REDIS_URL', raw.REDIS_URL, 'redis://127.0.0.1:6390', ['redis:', 'rediss:'], errors),
    REDIS_PREFIX: raw.REDIS_PREFIX || 'potlife',
    SMTP_URL: url('SMTP_URL', raw.SMTP_URL, 'smtp://127.0.0.1:2525', ['smtp:', 'smtps:'], errors),
    MAIL_FROM: raw.MAIL_FROM || 'Potlife <no-reply@potlife.local>',
    MAIL_ATTEMPTS: int('MAIL_ATTEMPTS', raw.MAIL_ATTEMPTS, 25, errors, 1),
    MAIL_RETRY_BASE_MS: int('MAIL_RETRY_BASE_MS', raw.MAIL_RETRY_BASE_MS, 2000, errors, 1),
    JWT_SECRET,
    JWT_EXPIRES_IN: raw.JWT_EXPIRES_IN || '10h',
    POTLIFE_DATA_DIR: dataDir,
    UPLOAD_STORAGE,
    S3_ENDPOINT: raw.S3_ENDPOINT,
    S3_BUCKET: raw.S3_BUCKET,
    S3_REGION: raw.S3_REGION || 'us-east-1',
    S3_ACCESS_KEY_ID: raw.S3_ACCESS_KEY_ID,
    S3_SECRET_ACCESS_KEY: raw.S3_SECRET_ACCESS_KEY,
    QUEUE_ROLE: oneOf('QUEUE_ROLE', raw.QUEUE_ROLE, ['all', 'api', 'worker'] as const, 'all', errors),
    LOGIN_MAX_FAILURES: int('LOGIN_MAX_FAILURES', raw.LOGIN_MAX_FAILURES, 5, errors, 1),
    LOGIN_FAILURE_WINDOW_S: int('LOGIN_FAILURE_WINDOW_S', raw.LOGIN_FAILURE_WINDOW_S, 900, errors, 1),
    RATE_LIMIT_PER_MINUTE: int('RATE_LIMIT_PER_MINUTE', raw.RATE_LIMIT_PER_MINUTE, 1200, errors, 1),
    WEB_DIST_DIR: path.resolve(raw.WEB_DIST_DIR || path.join(__dirname, '../../../web/dist')),
  };
  if (errors.length > 0) {
    throw new Error(`Potlife cannot start; fix these settings:\n  - ${errors.join('\n  - ')}`);
  }
  return env;
}

/** The validated settings, typed, for services: inject with `@Inject(ENV)`. */
export const ENV = Symbol('ENV');
