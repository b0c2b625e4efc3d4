import type { User, SignInBody } from '@/shared/api/auth';
import type { ServiceDeps } from './deps';
import { toUser } from './dto';
import { PasswordsBusyError } from './passwords';
import { fail, ok, type Result } from './result';
import type { SignInThrottle } from './sign-in-throttle';

/** One sentence for an unknown e-mail and a wrong password, so the answer does not reveal which accounts exist. */
export const WRONG_CREDENTIALS = 'That e-mail and password do not match an account.';
export const PASSWORDS_BUSY = 'The server is busy checking other sign-ins. Try again in a moment.';

export function tooManyAttempts(waitMs: number): ReturnType<typeof fail> {
  const seconds = Math.max(1, Math.ceil(waitMs / 1000));
  return fail('too-many', `Too many sign-in attempts. Wait ${seconds} second${seconds === 1 ? '' : 's'} and try again.`, {
    details: { retryAfterSeconds: seconds },
  });
}

export function createAuthService({ models, passwords, throttle }: Pick<ServiceDeps, 'models' | 'passwords'> & { throttle: SignInThrottle }) {
  return {
    /** `address` is the client's address as the app sees it (only configured proxies may say otherwise). */
    async signIn({ email, password }: SignInBody, address: string): Promise<Result<User>> {
      const wait = throttle.attempt(address, email);
      if (wait > 0) return tooManyAttempts(wait);
      // A removed member's row stays (they remain named on versions) but no longer signs in.
      const user = await models.User.findOne({ where: { email, removedAt: null } });
      let matches: boolean;
      try {
        matches = await passwords.verify(password, user?.passwordHash ?? null);
      } catch (error) {
        if (error instanceof PasswordsBusyError) return fail('busy', PASSWORDS_BUSY);
        throw error;
      }
      if (!user || !matches) return fail('unauthorized', WRONG_CREDENTIALS);
      throttle.succeeded(address, email);
      return ok(toUser(user));
    },

    /** The user a session points at, or null when that account is gone (removed members lose their sessions). */
    async findUser(id: number): Promise<User | null> {
      const user = await models.User.findByPk(id);
      return user && !user.removedAt ? toUser(user) : null;
    },
  };
}

export type AuthService = ReturnType<typeof createAuthService>;
