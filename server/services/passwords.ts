import bcrypt from 'bcryptjs';

export type Passwords = {
  hash(password: string): Promise<string>;
  /** Compare against `hash`, or against a dummy hash when there is no account, so both cases take the same time. */
  verify(password: string, hash: string | null): Promise<boolean>;
};

export function createPasswords(cost: number): Passwords {
  let dummy: Promise<string> | null = null;
  const dummyHash = () => (dummy ??= bcrypt.hash('no account has this password', cost));
  return {
    hash: (password) => bcrypt.hash(password, cost),
    async verify(password, hash) {
      if (hash === null) {
        await bcrypt.compare(password, await dummyHash());
        return false;
      }
      return bcrypt.compare(password, hash);
    },
  };
}
