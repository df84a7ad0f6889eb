import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { ConfigError, loadConfig } from '../../server/config';

describe('reading the environment', () => {
  const dir = mkdtempSync(join(tmpdir(), 'slotwise-config-'));
  afterAll(() => rmSync(dir, { recursive: true, force: true }));
  const quiet = () => undefined;

  it('fills in the defaults for development and creates the database folder', () => {
    const warnings: string[] = [];
    const config = loadConfig({ DATABASE_PATH: join(dir, 'made', 'here.sqlite') }, (message) => warnings.push(message));
    expect(config).toMatchObject({ nodeEnv: 'development', port: 3000, host: '127.0.0.1', trustProxy: false, logRequests: true, seedDemo: true });
    expect(config.sessionSecret).toMatch(/^[0-9a-f]{64}$/);
    expect(warnings.join(' ')).toMatch(/SESSION_SECRET is not set/);
    expect(existsSync(join(dir, 'made'))).toBe(true);
  });

  it('refuses to start in production without a session secret, naming the variable', () => {
    expect(() => loadConfig({ NODE_ENV: 'production', DATABASE_PATH: join(dir, 'p.sqlite') }, quiet)).toThrow(ConfigError);
    expect(() => loadConfig({ NODE_ENV: 'production', DATABASE_PATH: join(dir, 'p.sqlite') }, quiet)).toThrow(/SESSION_SECRET: Required in production/);
  });

  it('refuses a short session secret in production', () => {
    expect(() => loadConfig({ NODE_ENV: 'production', SESSION_SECRET: 'short', DATABASE_PATH: join(dir, 'p.sqlite') }, quiet)).toThrow(/at least 32 characters/);
  });

  it('lists every bad variable with a message a person can act on', () => {
    let message = '';
    try {
      loadConfig({ PORT: 'eighty', NODE_ENV: 'staging', LOG_REQUESTS: 'perhaps', DATABASE_PATH: join(dir, 'x.sqlite') }, quiet);
    } catch (error) {
      message = (error as Error).message;
    }
    expect(message).toMatch(/PORT: Use a whole number between 1 and 65535/);
    expect(message).toMatch(/NODE_ENV: Use development, production or test/);
    expect(message).toMatch(/LOG_REQUESTS: Use true or false/);
  });

  it('reads trust proxy as a flag, a hop count or a list of addresses', () => {
    const base = { DATABASE_PATH: join(dir, 't.sqlite'), SESSION_SECRET: 'x'.repeat(40) };
    expect(loadConfig({ ...base, TRUST_PROXY: 'true' }, quiet).trustProxy).toBe(true);
    expect(loadConfig({ ...base, TRUST_PROXY: '1' }, quiet).trustProxy).toBe(1);
    expect(loadConfig({ ...base, TRUST_PROXY: 'loopback' }, quiet).trustProxy).toBe('loopback');
    expect(loadConfig({ ...base, TRUST_PROXY: 'false' }, quiet).trustProxy).toBe(false);
  });

  it('turns request logging off by default in tests', () => {
    expect(loadConfig({ NODE_ENV: 'test', DATABASE_PATH: join(dir, 't.sqlite') }, quiet).logRequests).toBe(false);
  });

  it('reads the link rate limit per address per minute, 600 unless set', () => {
    const base = { DATABASE_PATH: join(dir, 'l.sqlite'), SESSION_SECRET: 'x'.repeat(40) };
    expect(loadConfig(base, quiet).linkRequestsPerMinute).toBe(600);
    expect(loadConfig({ ...base, LINK_RATE_LIMIT_PER_MINUTE: '200000' }, quiet).linkRequestsPerMinute).toBe(200_000);
    expect(() => loadConfig({ ...base, LINK_RATE_LIMIT_PER_MINUTE: '0' }, quiet)).toThrow(/LINK_RATE_LIMIT_PER_MINUTE: Use a whole number from 1/);
  });
});
