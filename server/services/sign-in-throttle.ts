/**
 * How often sign-in may be tried, so that guessing is slow and nobody is locked out for long.
 *
 * Every attempt counts as a failure until it succeeds (so parallel guesses are counted too); a
 * success clears its account's counts. After the free failures, the next attempt must wait, and
 * each further failure doubles the wait up to a cap — never a long wall, so the right password
 * always works again within a minute, and guessing slows to about one try per cap:
 *
 * | counted per | free failures | first wait | longest wait |
 * | --- | --- | --- | --- |
 * | address and account | 5 | 1 s | 30 s |
 * | account, from any address (guessing one account from many addresses) | 20 | 1 s | 60 s |
 * | address, by distinct accounts failed (one address trying many accounts) | 10 accounts | 2 s | 60 s |
 *
 * The per-address count is by distinct accounts, so a whole office behind one address is not
 * slowed by one person mistyping their own password. Counts are forgotten 15 minutes after their
 * last failure. They live in this process (one server process; several would each count their own).
 * Addresses and e-mails are user input: every table is a Map, never a plain object.
 */
type Rule = { free: number; firstMs: number; maxMs: number };
export type ThrottleRules = { addressAccount: Rule; account: Rule; address: Rule; forgetMs: number; maxEntries: number };

export const SIGN_IN_RULES: ThrottleRules = {
  addressAccount: { free: 5, firstMs: 1000, maxMs: 30_000 },
  account: { free: 20, firstMs: 1000, maxMs: 60_000 },
  address: { free: 10, firstMs: 2000, maxMs: 60_000 },
  forgetMs: 15 * 60 * 1000,
  maxEntries: 50_000,
};

type Count = { failures: number; blockedUntil: number; lastAt: number };
type AddressCount = { accounts: Set<string>; blockedUntil: number; lastAt: number };

export type SignInThrottle = {
  /** Milliseconds to wait before this attempt may be made (0: go ahead); a go-ahead is counted as a failure until `succeeded`. */
  attempt(address: string, account: string): number;
  /** The attempt was right: clear the account's counts. */
  succeeded(address: string, account: string): void;
  /** Entries in the largest table (for tests and diagnostics). */
  size(): number;
};

export function createSignInThrottle(now: () => number = Date.now, rules: ThrottleRules = SIGN_IN_RULES): SignInThrottle {
  const pairs = new Map<string, Count>();
  const accounts = new Map<string, Count>();
  const addresses = new Map<string, AddressCount>();
  const pairKey = (address: string, account: string) => JSON.stringify([address, account]);

  function fresh<T extends { lastAt: number }>(table: Map<string, T>, key: string, t: number): T | undefined {
    const entry = table.get(key);
    if (entry && t - entry.lastAt > rules.forgetMs) {
      table.delete(key);
      return undefined;
    }
    return entry;
  }

  /** The wait after `failures` failures: none before the last free one, then first, twice that, … up to the cap. */
  function wait(rule: Rule, failures: number): number {
    const over = failures - rule.free;
    return over < 0 ? 0 : Math.min(rule.maxMs, rule.firstMs * 2 ** over);
  }

  function count(table: Map<string, Count>, key: string, rule: Rule, t: number): void {
    const entry = fresh(table, key, t) ?? { failures: 0, blockedUntil: 0, lastAt: t };
    entry.failures += 1;
    entry.lastAt = t;
    entry.blockedUntil = t + wait(rule, entry.failures);
    table.set(key, entry);
  }

  /**
   * Keep each table at most `maxEntries` long (a flood of made-up addresses or e-mails): the entries
   * first inserted go first, which Maps keep in front. Stale ones also go as they are looked up.
   */
  function prune(): void {
    for (const table of [pairs, accounts, addresses] as Array<Map<string, unknown>>) {
      for (const key of table.keys()) {
        if (table.size <= rules.maxEntries) break;
        table.delete(key);
      }
    }
  }

  return {
    attempt(address, account) {
      const t = now();
      const byAddress = fresh(addresses, address, t);
      const blockedUntil = Math.max(
        fresh(pairs, pairKey(address, account), t)?.blockedUntil ?? 0,
        fresh(accounts, account, t)?.blockedUntil ?? 0,
        byAddress?.blockedUntil ?? 0,
      );
      if (blockedUntil > t) return blockedUntil - t;
      count(pairs, pairKey(address, account), rules.addressAccount, t);
      count(accounts, account, rules.account, t);
      const entry = byAddress ?? { accounts: new Set<string>(), blockedUntil: 0, lastAt: t };
      entry.accounts.add(account);
      entry.lastAt = t;
      entry.blockedUntil = t + wait(rules.address, entry.accounts.size);
      addresses.set(address, entry);
      prune();
      return 0;
    },
    size: () => Math.max(pairs.size, accounts.size, addresses.size),
    succeeded(address, account) {
      pairs.delete(pairKey(address, account));
      accounts.delete(account);
      const byAddress = addresses.get(address);
      if (byAddress) {
        byAddress.accounts.delete(account);
        byAddress.blockedUntil = 0;
        if (byAddress.accounts.size === 0) addresses.delete(address);
      }
    },
  };
}
