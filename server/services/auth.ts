import type { User } from '@/shared/api/auth';
import type { SignInBody } from '@/shared/api/auth';
import type { ServiceDeps } from './deps';
import { toUser } from './dto';
import { fail, ok, type Result } from './result';

/** One sentence for an unknown e-mail and a wrong password, so the answer does not reveal which accounts exist. */
export const WRONG_CREDENTIALS = 'That e-mail and password do not match an account.';

export function createAuthService({ models, passwords }: Pick<ServiceDeps, 'models' | 'passwords'>) {
  return {
    async signIn({ email, password }: SignInBody): Promise<Result<User>> {
      // A removed member's row stays (they remain named on versions) but no longer signs in.
      const user = await models.User.findOne({ where: { email, removedAt: null } });
      const matches = await passwords.verify(password, user?.passwordHash ?? null);
      if (!user || !matches) return fail('unauthorized', WRONG_CREDENTIALS);
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
