import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { ConfigError, readConfig } from '@server/config';

describe('configuration read once at boot', () => {
  it('has working defaults: port 8080, ./data, the local mail fake', () => {
    const c = readConfig({});
    expect(c.port).toBe(8080);
    expect(c.dataDir).toBe(path.resolve('data'));
    expect(c.smtpUrl).toBeNull();
    expect(c.seedDemo).toBe(true);
  });

  it('reads overrides and trims a trailing slash from PUBLIC_URL', () => {
    const c = readConfig({ PORT: '9000', PUBLIC_URL: 'https://shop.example/', SMTP_URL: 'smtp://mail.example:587', SEED_DEMO: '0' });
    expect(c).toMatchObject({ port: 9000, publicUrl: 'https://shop.example', smtpUrl: 'smtp://mail.example:587', seedDemo: false });
  });

  it.each([
    ['PORT', 'eighty', /PORT/],
    ['PORT', '70000', /PORT/],
    ['JWT_SECRET', 'short', /JWT_SECRET must have at least 32/],
    ['SMTP_URL', 'mail.example', /SMTP_URL starts with smtp/],
    ['PUBLIC_URL', 'not a url', /PUBLIC_URL must be a full URL/],
    ['JWT_TTL', 'forever', /JWT_TTL/],
  ])('stops the start with a clear message for a bad %s', (key, value, message) => {
    expect(() => readConfig({ [key]: value })).toThrow(ConfigError);
    expect(() => readConfig({ [key]: value })).toThrow(message);
  });
});
