import { createCipheriv, createDecipheriv, randomBytes } from 'node:crypto';
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { parseKeyText, type Config } from '@/server/config';

/**
 * CHAP secrets: made from node:crypto randomness, sealed with AES-256-GCM before they touch the
 * database, opened only to be shown to someone allowed to see them.
 *
 * A secret is `length` characters from a 64-character alphabet (letters, digits, "-" and "_"), each
 * character from 6 random bits (one random byte & 63: 256 is a multiple of 64, so no character is
 * likelier than another). 16 characters carry 96 bits, the least RFC 7143 §9.2.1 allows without
 * IPsec; the designer may ask for more. The alphabet has no quotes, spaces or shell characters, so a
 * secret can be typed into any array's or host's CHAP field as it is.
 */
export const SECRET_ALPHABET = 'ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789-_';
export const DEFAULT_SECRET_LENGTH = 16;

export function generateSecret(length: number = DEFAULT_SECRET_LENGTH): string {
  const bytes = randomBytes(length);
  let out = '';
  for (const byte of bytes) out += SECRET_ALPHABET[byte & 63];
  return out;
}

const IV_BYTES = 12; // the GCM nonce size NIST SP 800-38D recommends
const TAG_BYTES = 16;

/**
 * `iv ‖ tag ‖ ciphertext` in base64. `context` (design, host, direction) is bound in as additional
 * data, so a sealed secret copied onto another row fails to open instead of passing as that row's.
 */
export function seal(key: Buffer, plain: string, context: string): string {
  const iv = randomBytes(IV_BYTES);
  const cipher = createCipheriv('aes-256-gcm', key, iv, { authTagLength: TAG_BYTES });
  cipher.setAAD(Buffer.from(context, 'utf8'));
  const body = Buffer.concat([cipher.update(plain, 'utf8'), cipher.final()]);
  return Buffer.concat([iv, cipher.getAuthTag(), body]).toString('base64');
}

export function open(key: Buffer, sealed: string, context: string): string {
  const raw = Buffer.from(sealed, 'base64');
  const decipher = createDecipheriv('aes-256-gcm', key, raw.subarray(0, IV_BYTES), { authTagLength: TAG_BYTES });
  decipher.setAAD(Buffer.from(context, 'utf8'));
  decipher.setAuthTag(raw.subarray(IV_BYTES, IV_BYTES + TAG_BYTES));
  return Buffer.concat([decipher.update(raw.subarray(IV_BYTES + TAG_BYTES)), decipher.final()]).toString('utf8');
}

/**
 * The key: SECRETS_KEY when set; else the key file beside the database, made (mode 0600) the first
 * time the server starts; else, for an in-memory database, a random key for this process only.
 */
export function resolveSecretsKey(config: Pick<Config, 'secretsKey' | 'secretsKeyFile'>): Buffer {
  if (config.secretsKey) return config.secretsKey;
  if (!config.secretsKeyFile) return randomBytes(32);
  const file = config.secretsKeyFile;
  try {
    return keyFromFile(file);
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code !== 'ENOENT') throw error;
  }
  mkdirSync(path.dirname(file), { recursive: true });
  try {
    // `wx`: if another process made the file meanwhile, use that one rather than overwrite it.
    writeFileSync(file, `${randomBytes(32).toString('hex')}\n`, { mode: 0o600, flag: 'wx' });
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code !== 'EEXIST') throw error;
  }
  return keyFromFile(file);
}

function keyFromFile(file: string): Buffer {
  const key = parseKeyText(readFileSync(file, 'utf8'));
  if (!key) throw new Error(`${file} does not hold a secrets key (64 hex digits); restore it or set SECRETS_KEY`);
  return key;
}
