import bcrypt from 'bcryptjs';

export const DEFAULT_PASSWORD_COST = 10;

/** Hashes and checks passwords with bcrypt; `cost` is lowered only in tests to keep them fast. */
export function createPasswords(cost = DEFAULT_PASSWORD_COST) {
  let dummyHash: Promise<string> | undefined;
  return {
    cost,
    hash: (password: string) => bcrypt.hash(password, cost),
    verify: (password: string, hash: string) => bcrypt.compare(password, hash),
    /** A hash of nothing in particular, compared against when the account is unknown so timing matches. */
    dummyHash: () => (dummyHash ??= bcrypt.hash('no account has this password', cost)),
  };
}

export type Passwords = ReturnType<typeof createPasswords>;
