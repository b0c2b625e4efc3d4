import { mkdtempSync, readFileSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { ConfigError, loadConfig } from '@/server/config';
import { generateSecret, open, resolveSecretsKey, seal, SECRET_ALPHABET } from '@/server/services/secrets/crypto';
import { PRODUCTION_ENV, TEST_ENV } from './helpers/app';

describe('CHAP secret generation', () => {
  it('draws 16 characters from a 64-character alphabet by default: 96 bits', () => {
    expect(new Set(SECRET_ALPHABET).size).toBe(64);
    expect(SECRET_ALPHABET).toMatch(/^[A-Za-z0-9_-]+$/);
    const secret = generateSecret();
    // RFC 7143 §9.2.1: at least 96 bits (12 bytes) of randomness without IPsec; 16 × log2(64) = 96.
    expect(secret).toHaveLength(16);
    expect(16 * Math.log2(SECRET_ALPHABET.length)).toBe(96);
    expect(generateSecret(40)).toMatch(/^[A-Za-z0-9_-]{40}$/);
  });

  it('uses every symbol about equally often (no modulo bias)', () => {
    const counts = new Map<string, number>();
    const text = Array.from({ length: 4000 }, () => generateSecret(16)).join('');
    for (const ch of text) counts.set(ch, (counts.get(ch) ?? 0) + 1);
    expect(counts.size).toBe(64);
    // 64,000 draws: 1,000 expected per symbol, standard deviation about 31; ±25 % is over 7 sigma.
    for (const n of counts.values()) expect(Math.abs(n - 1000)).toBeLessThan(250);
  });
});

describe('sealing', () => {
  const key = Buffer.alloc(32, 7);
  it('opens what it sealed, and only with the same key and context', () => {
    const sealed = seal(key, 'Abc-def_0123456789', 'ctx');
    expect(sealed).not.toContain('Abc-def');
    expect(open(key, sealed, 'ctx')).toBe('Abc-def_0123456789');
    expect(() => open(Buffer.alloc(32, 8), sealed, 'ctx')).toThrow();
    expect(() => open(key, sealed, 'another row')).toThrow();
    expect(seal(key, 'same', 'ctx')).not.toBe(seal(key, 'same', 'ctx')); // a fresh nonce each time
  });
});

describe('the secrets key', () => {
  it('is required in production and must be 32 bytes', () => {
    const { SECRETS_KEY: _given, ...withoutKey } = PRODUCTION_ENV;
    expect(() => loadConfig(withoutKey)).toThrow(ConfigError);
    expect(() => loadConfig(withoutKey)).toThrow(/SECRETS_KEY: required in production/);
    expect(() => loadConfig({ ...PRODUCTION_ENV, SECRETS_KEY: 'abc' })).toThrow(/SECRETS_KEY: use 32 random bytes/);
    expect(loadConfig(PRODUCTION_ENV).secretsKey).toEqual(Buffer.from('5e'.repeat(32), 'hex'));
    expect(loadConfig({ ...PRODUCTION_ENV, SECRETS_KEY: Buffer.alloc(32, 1).toString('base64') }).secretsKey).toEqual(Buffer.alloc(32, 1));
  });

  it('outside production is made once in a key file beside the database (mode 0600) and read back after', () => {
    const folder = mkdtempSync(path.join(tmpdir(), 'cw-key-'));
    try {
      const config = loadConfig({ ...TEST_ENV, DATABASE_PATH: path.join(folder, 'data', 'db.sqlite') });
      expect(config.secretsKey).toBeNull();
      expect(config.secretsKeyFile).toBe(path.join(folder, 'data', 'secrets.key'));
      const key = resolveSecretsKey(config);
      expect(key).toHaveLength(32);
      expect(statSync(config.secretsKeyFile!).mode & 0o777).toBe(0o600);
      expect(readFileSync(config.secretsKeyFile!, 'utf8').trim()).toBe(key.toString('hex'));
      expect(resolveSecretsKey(config)).toEqual(key);
    } finally {
      rmSync(folder, { recursive: true, force: true });
    }
  });

  it('with an in-memory database is random per process and writes no file', () => {
    const config = loadConfig(TEST_ENV);
    expect(config.secretsKeyFile).toBeNull();
    expect(resolveSecretsKey(config)).not.toEqual(resolveSecretsKey(config));
  });
});
