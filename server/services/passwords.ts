import bcrypt from 'bcryptjs';
import { PASSWORD_MAX_BYTES } from '@/shared/api/auth';
import { utf8Length } from '@/shared/text/utf8';

export type Passwords = {
  /** Throws PasswordTooLongError past 72 bytes (the schemas refuse those first) and PasswordsBusyError when the queue is full. */
  hash(password: string): Promise<string>;
  /**
   * Compare against `hash`, or against a dummy hash when there is no account, so both cases take the
   * same time. A password over 72 bytes never matches: no stored password is that long, and bcrypt
   * would otherwise compare only its first 72 bytes.
   */
  verify(password: string, hash: string | null): Promise<boolean>;
};

/** Too many password hashes are waiting already: the caller answers "busy" instead of queueing without end. */
export class PasswordsBusyError extends Error {
  constructor() {
    super('too many password checks are waiting');
    this.name = 'PasswordsBusyError';
  }
}

export class PasswordTooLongError extends Error {
  constructor() {
    super(`a password longer than ${PASSWORD_MAX_BYTES} bytes cannot be hashed with bcrypt`);
    this.name = 'PasswordTooLongError';
  }
}

export type PasswordLimits = {
  /** Hashes computed at once. bcryptjs runs on this thread in slices of up to 100 ms, so each one in flight delays every other request. */
  concurrent: number;
  /** Hashes allowed to wait for a turn; beyond that, PasswordsBusyError. */
  waiting: number;
};

const DEFAULT_LIMITS: PasswordLimits = { concurrent: 2, waiting: 32 };

type Hasher = Pick<typeof bcrypt, 'hash' | 'compare'>;

/**
 * bcrypt behind a small semaphore: at most `concurrent` hashes run at once and at most `waiting`
 * wait, so a flood of anonymous sign-ins or invitation accepts cannot take the event loop from
 * signed-in people, nor queue up without bound.
 */
export function createPasswords(cost: number, limits: PasswordLimits = DEFAULT_LIMITS, hasher: Hasher = bcrypt): Passwords {
  const gate = semaphore(limits);
  let dummy: Promise<string> | null = null;
  const dummyHash = () => (dummy ??= bcrypt.hash('no account has this password', cost));
  return {
    async hash(password) {
      if (utf8Length(password) > PASSWORD_MAX_BYTES) throw new PasswordTooLongError();
      return gate(() => hasher.hash(password, cost));
    },
    async verify(password, hash) {
      const tooLong = utf8Length(password) > PASSWORD_MAX_BYTES;
      if (hash === null || tooLong) {
        const against = await dummyHash();
        await gate(() => hasher.compare(password, against));
        return false;
      }
      return gate(() => hasher.compare(password, hash));
    },
  };
}

/** Run at most `concurrent` tasks at once, with at most `waiting` in line. */
function semaphore({ concurrent, waiting }: PasswordLimits) {
  let running = 0;
  const queue: Array<() => void> = [];
  const release = () => {
    running -= 1;
    const next = queue.shift();
    if (next) {
      running += 1;
      next();
    }
  };
  return async function run<T>(task: () => Promise<T>): Promise<T> {
    if (running >= concurrent) {
      if (queue.length >= waiting) throw new PasswordsBusyError();
      await new Promise<void>((resolve) => queue.push(resolve));
    } else {
      running += 1;
    }
    try {
      return await task();
    } finally {
      release();
    }
  };
}
