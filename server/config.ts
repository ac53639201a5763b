import path from 'node:path';
import * as yup from 'yup';

/** Configuration is read from the environment once, validated, and frozen. A bad value stops the start. */
const schema = yup.object({
  PORT: yup.number().integer('PORT must be a whole number.').min(0).max(65535).default(8080),
  HOST: yup.string().default('0.0.0.0'),
  DATA_DIR: yup.string().default(path.resolve(process.cwd(), 'data')),
  PUBLIC_URL: yup.string().url('PUBLIC_URL must be a full URL such as http://localhost:8080.'),
  JWT_SECRET: yup.string().min(32, 'JWT_SECRET must have at least 32 characters.'),
  JWT_TTL: yup.string().matches(/^\d+[smhd]$/, 'JWT_TTL looks like 12h, 30m or 7d.').default('12h'),
  SMTP_URL: yup.string().matches(/^smtps?:\/\//, 'SMTP_URL starts with smtp:// or smtps://.'),
  MAIL_FROM: yup.string().default('Probepath <no-reply@probepath.example>'),
  LOG_LEVEL: yup.string().oneOf(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
  SEED_DEMO: yup.string().oneOf(['0', '1']).default('1'),
  BUILD_WEB: yup.string().oneOf(['0', '1']).default('1'),
});

export interface Config {
  port: number;
  host: string;
  dataDir: string;
  publicUrl: string | null;
  jwtSecret: string | null;
  jwtTtl: string;
  smtpUrl: string | null;
  mailFrom: string;
  logLevel: string;
  seedDemo: boolean;
  buildWeb: boolean;
}

export class ConfigError extends Error {}

export function readConfig(env: Record<string, string | undefined> = process.env): Config {
  const picked = Object.fromEntries(
    Object.keys(schema.fields).map((k) => [k, env[k] === '' ? undefined : env[k]]),
  );
  let v: yup.InferType<typeof schema>;
  try {
    v = schema.validateSync(picked, { abortEarly: false });
  } catch (err) {
    if (err instanceof yup.ValidationError) {
      throw new ConfigError(`Probepath cannot start: ${err.errors.join(' ')}`);
    }
    throw err;
  }
  return Object.freeze({
    port: v.PORT,
    host: v.HOST,
    dataDir: path.resolve(v.DATA_DIR),
    publicUrl: v.PUBLIC_URL?.replace(/\/$/, '') ?? null,
    jwtSecret: v.JWT_SECRET ?? null,
    jwtTtl: v.JWT_TTL,
    smtpUrl: v.SMTP_URL ?? null,
    mailFrom: v.MAIL_FROM,
    logLevel: v.LOG_LEVEL,
    seedDemo: v.SEED_DEMO === '1',
    buildWeb: v.BUILD_WEB === '1',
  });
}
