import path from 'node:path';
import { ConfigError, EXPO_DEV_ORIGIN, loadConfig } from '@/server/config';

const PROD = { NODE_ENV: 'production', SESSION_SECRET: 'k'.repeat(32) };

function problems(env: Record<string, string>): string[] {
  try {
    loadConfig(env);
  } catch (error) {
    if (error instanceof ConfigError) return error.problems;
    throw error;
  }
  throw new Error('expected a ConfigError');
}

describe('server configuration from the environment', () => {
  it('uses the api.md defaults outside production', () => {
    const config = loadConfig({});
    expect(config.port).toBe(8080);
    expect(config.databasePath).toBe('data/cablewright.sqlite');
    expect(config.seed).toBe('demo');
    expect(config.mail).toEqual({ kind: 'fake' });
    expect(config.appUrl).toBe('http://localhost:8080');
    expect(config.isProduction).toBe(false);
    expect(config.sessionSecretGenerated).toBe(true);
    expect(config.sessionSecret).toMatch(/^[0-9a-f]{64}$/);
    expect(config.trustedOrigins).toEqual(['http://localhost:8080', EXPO_DEV_ORIGIN]);
    expect(config.webDir).toBe(path.resolve('dist/web'));
  });

  it('refuses the dev-server proxy in production', () => {
    expect(problems({ ...PROD, WEB_DEV_SERVER: 'http://localhost:8081' }).join(' ')).toMatch(/WEB_DEV_SERVER/);
    expect(loadConfig({ WEB_DEV_SERVER: 'http://localhost:8081' }).webDevServer).toBe('http://localhost:8081');
  });

  it('makes a different random session secret per process start', () => {
    expect(loadConfig({}).sessionSecret).not.toBe(loadConfig({}).sessionSecret);
  });

  it('derives APP_URL from PORT and accepts an explicit one without its trailing slash', () => {
    expect(loadConfig({ PORT: '8093' }).appUrl).toBe('http://localhost:8093');
    const config = loadConfig({ APP_URL: 'https://cablewright.example/' });
    expect(config.appUrl).toBe('https://cablewright.example');
    expect(config.trustedOrigins[0]).toBe('https://cablewright.example');
  });

  it('accepts :memory:, SEED=none and an smtp:// relay', () => {
    const config = loadConfig({ DATABASE_PATH: ':memory:', SEED: 'none', MAIL: 'smtp://relay.example:2525' });
    expect(config.databasePath).toBe(':memory:');
    expect(config.seed).toBe('none');
    expect(config.mail).toEqual({ kind: 'smtp', url: 'smtp://relay.example:2525' });
  });

  it('treats an empty variable as unset', () => {
    expect(loadConfig({ PORT: '', SEED: '' }).port).toBe(8080);
  });

  it('lists every bad value with its variable name', () => {
    const found = problems({ PORT: 'eighty', SEED: 'lots', MAIL: 'pigeon', APP_URL: 'ftp://x.example' });
    expect(found.map((p) => p.split(':')[0]).sort()).toEqual(['APP_URL', 'MAIL', 'PORT', 'SEED']);
  });

  it('refuses a port outside 0–65535', () => {
    // RFC 6335 §6: port numbers are 16-bit.
    expect(problems({ PORT: '70000' })[0]).toMatch(/^PORT/);
  });

  it('requires a SESSION_SECRET of at least 32 characters in production', () => {
    expect(problems({ NODE_ENV: 'production' })[0]).toMatch(/^SESSION_SECRET: required in production/);
    expect(problems({ NODE_ENV: 'production', SESSION_SECRET: 'short' })[0]).toMatch(/^SESSION_SECRET/);
    expect(loadConfig(PROD).sessionSecretGenerated).toBe(false);
  });

  it('never seeds the demo in production: SEED=demo is refused, and the default is none', () => {
    expect(problems({ ...PROD, SEED: 'demo' })[0]).toMatch(/^SEED: the demo seed never runs in production/);
    expect(loadConfig(PROD).seed).toBe('none');
  });

  it('keeps bcrypt at cost 10 or more in production', () => {
    expect(problems({ ...PROD, BCRYPT_COST: '4' })[0]).toMatch(/^BCRYPT_COST/);
    expect(loadConfig(PROD).bcryptCost).toBeGreaterThanOrEqual(10);
  });

  it('does not trust the Expo dev server origin in production', () => {
    expect(loadConfig(PROD).trustedOrigins).toEqual(['http://localhost:8080']);
  });
});
