import argon2 from 'argon2';

/**
 * argon2id with OWASP's recommended floor (m = 19 MiB, t = 2, p = 1): about 30–60 ms here,
 * which keeps sign-in responsive on a 2-core instance while making offline guessing costly.
 */
export const ARGON2_OPTIONS = { type: argon2.argon2id, memoryCost: 19_456, timeCost: 2, parallelism: 1 } as const;

export const hashPassword = (password: string) => argon2.hash(password, ARGON2_OPTIONS);

export async function verifyPassword(hash: string | null, password: string): Promise<boolean> {
  // Verify against a fixed hash when there is none, so a missing account costs the same time.
  const target = hash ?? (await dummyHash);
  try {
    const ok = await argon2.verify(target, password);
    return ok && hash !== null;
  } catch {
    return false;
  }
}

const dummyHash = argon2.hash('no account has this password', ARGON2_OPTIONS);
