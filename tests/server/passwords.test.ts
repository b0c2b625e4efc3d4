import { createPasswords, PasswordsBusyError, PasswordTooLongError } from '@/server/services/passwords';
import { createSignInThrottle, SIGN_IN_RULES } from '@/server/services/sign-in-throttle';
import { utf8Length } from '@/shared/text/utf8';

/** A stand-in for bcrypt that counts how many hashes run at once and finishes when told to. */
function slowHasher() {
  let running = 0;
  let most = 0;
  const waiting: Array<() => void> = [];
  const work = async <T>(value: T): Promise<T> => {
    running += 1;
    most = Math.max(most, running);
    await new Promise<void>((resolve) => waiting.push(resolve));
    running -= 1;
    return value;
  };
  return {
    hasher: { hash: (password: string) => work(`hashed:${password}`), compare: () => work(true) } as never,
    most: () => most,
    finishAll: async () => {
      while (waiting.length > 0) {
        waiting.splice(0).forEach((resolve) => resolve());
        await new Promise((resolve) => setImmediate(resolve));
      }
    },
  };
}

describe('the cap on password hashes', () => {
  it('runs at most two hashes at once and lets the rest wait their turn', async () => {
    const slow = slowHasher();
    const passwords = createPasswords(4, { concurrent: 2, waiting: 10 }, slow.hasher);
    const all = Promise.all(Array.from({ length: 8 }, (_, i) => passwords.hash(`password number ${i}`)));
    await new Promise((resolve) => setImmediate(resolve));
    await slow.finishAll();
    expect(await all).toHaveLength(8);
    expect(slow.most()).toBe(2);
  });

  it('refuses a hash as busy when too many are waiting already, instead of queueing without end', async () => {
    const slow = slowHasher();
    const passwords = createPasswords(4, { concurrent: 1, waiting: 2 }, slow.hasher);
    const accepted = [passwords.hash('first password'), passwords.hash('second password'), passwords.hash('third password')];
    await expect(passwords.hash('fourth password')).rejects.toBeInstanceOf(PasswordsBusyError);
    await slow.finishAll();
    await expect(Promise.all(accepted)).resolves.toHaveLength(3);
  });

  it('refuses to hash more than 72 bytes, and never matches such a password', async () => {
    const passwords = createPasswords(4);
    // bcrypt uses only the first 72 bytes (Provos & Mazières 1999): the rest would be ignored silently.
    await expect(passwords.hash('x'.repeat(73))).rejects.toBeInstanceOf(PasswordTooLongError);
    const stored = await passwords.hash('x'.repeat(72));
    expect(await passwords.verify('x'.repeat(72), stored)).toBe(true);
    expect(await passwords.verify(`${'x'.repeat(72)}anything`, stored)).toBe(false);
  });
});

describe('UTF-8 length', () => {
  it('counts bytes per code point as RFC 3629 §3 encodes them', () => {
    expect(utf8Length('harbor')).toBe(6);
    expect(utf8Length('é')).toBe(2); // U+00E9: two bytes
    expect(utf8Length('€')).toBe(3); // U+20AC: three bytes
    expect(utf8Length('🧊')).toBe(4); // U+1F9CA: four bytes, one code point of two UTF-16 units
  });
});

describe('the sign-in throttle’s memory', () => {
  it('forgets counts after 15 quiet minutes and keeps its tables bounded under a flood of addresses', () => {
    let now = 0;
    const throttle = createSignInThrottle(() => now, { ...SIGN_IN_RULES, maxEntries: 100 });
    for (let i = 0; i < 6; i++) throttle.attempt('192.0.2.1', 'maya@tidewater.example');
    expect(throttle.attempt('192.0.2.1', 'maya@tidewater.example')).toBeGreaterThan(0);
    now += SIGN_IN_RULES.forgetMs + 1;
    expect(throttle.attempt('192.0.2.1', 'maya@tidewater.example')).toBe(0);
    // A flood of made-up addresses and accounts: the oldest entries go, the newest stay counted.
    for (let i = 0; i < 1000; i++) throttle.attempt(`flood-${i}`, `nobody-${i}@tidewater.example`);
    expect(throttle.size()).toBeLessThanOrEqual(100);
    for (let i = 0; i < 5; i++) throttle.attempt('flood-999', 'nobody-999@tidewater.example');
    expect(throttle.attempt('flood-999', 'nobody-999@tidewater.example')).toBeGreaterThan(0);
  });
});
