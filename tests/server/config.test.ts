import path from 'node:path';
import { ConfigError, EXPO_DEV_ORIGIN, loadConfig } from '@/server/config';

const PROD = { NODE_ENV: 'production', SESSION_SECRET: 'k'.repeat(32), APP_URL: 'https://cablewright.example', SECRETS_KEY: 'ab'.repeat(32) };

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
  it('uses the docs/api.md defaults outside production', () => {
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
    expect(loadConfig(PROD).trustedOrigins).toEqual(['https://cablewright.example']);
  });

  it('refuses to start in production without an https APP_URL, and says why', () => {
    const { APP_URL: _unused, ...withoutUrl } = PROD;
    for (const env of [withoutUrl, { ...PROD, APP_URL: 'http://cablewright.example' }]) {
      const found = problems(env).find((p) => p.startsWith('APP_URL'));
      // RFC 6265 §4.1.2.5: a Secure cookie is only sent over secure channels.
      expect(found).toMatch(/https:\/\/.*session cookie is sent over HTTPS only/);
    }
    expect(loadConfig({ APP_URL: 'http://localhost:8093' }).appUrl).toBe('http://localhost:8093');
  });

  it('trusts forwarding headers from loopback outside production and from nobody in production, unless TRUST_PROXY says', () => {
    expect(loadConfig({}).trustProxy).toEqual(['loopback']);
    expect(loadConfig(PROD).trustProxy).toEqual([]);
    // RFC 5737 documentation addresses and RFC 1918 ranges stand in for a real proxy.
    expect(loadConfig({ ...PROD, TRUST_PROXY: '192.0.2.10, 10.0.0.0/8, loopback' }).trustProxy).toEqual(['192.0.2.10', '10.0.0.0/8', 'loopback']);
    expect(loadConfig({ TRUST_PROXY: 'none' }).trustProxy).toEqual([]);
    expect(problems({ TRUST_PROXY: '1' })[0]).toMatch(/^TRUST_PROXY: 1 is not an address/);
    expect(problems({ TRUST_PROXY: '192.0.2.300' })[0]).toMatch(/^TRUST_PROXY/);
  });

  it('adds TRUSTED_ORIGINS to the origins whose changes are accepted', () => {
    const config = loadConfig({ ...PROD, TRUSTED_ORIGINS: 'https://admin.cablewright.example, https://cablewright.example/' });
    expect(config.trustedOrigins).toEqual(['https://cablewright.example', 'https://admin.cablewright.example']);
    expect(problems({ TRUSTED_ORIGINS: 'cablewright.example' })[0]).toMatch(/^TRUSTED_ORIGINS/);
  });

  it('limits each analysis to 15 s and 512 MB by default, with one process per core but one', () => {
    const { analysis } = loadConfig({});
    expect(analysis.timeoutMs).toBe(15_000);
    expect(analysis.maxOldMb).toBe(512);
    expect(analysis.workers).toBeGreaterThanOrEqual(1);
    expect(loadConfig({ ANALYSIS_TIMEOUT_MS: '2500', ANALYSIS_MAX_OLD_MB: '256', ANALYSIS_WORKERS: '3' }).analysis).toEqual({ timeoutMs: 2500, maxOldMb: 256, workers: 3 });
    const bad = problems({ ANALYSIS_TIMEOUT_MS: 'soon', ANALYSIS_MAX_OLD_MB: '8', ANALYSIS_WORKERS: '0' });
    expect(bad.map((p) => p.split(':')[0]).sort()).toEqual(['ANALYSIS_MAX_OLD_MB', 'ANALYSIS_TIMEOUT_MS', 'ANALYSIS_WORKERS']);
  });
});
