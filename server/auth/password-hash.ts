/**
 * Password hashing: argon2id with m = 19456 KiB, t = 2, p = 1 (ASVS 5.0 appendix C,
 * OWASP Password Storage Cheat Sheet). Every parameter is set explicitly so a change of
 * the library's defaults cannot weaken stored hashes.
 */
import { hash, parseOptions, verify, type Options } from '@node-rs/argon2';

// `Algorithm` and `Version` are const enums in the typings, which isolated modules cannot
// inline; the numbers are the enum values (Argon2id = 2, V0x13 = 1).
const argon2id = 2 as Options['algorithm'];
const version19 = 1 as Options['version'];

export const argon2Options = {
  algorithm: argon2id,
  version: version19,
  memoryCost: 19456,
  timeCost: 2,
  parallelism: 1,
  outputLen: 32,
} as const satisfies Options;

export function hashPassword(password: string): Promise<string> {
  return hash(password.normalize('NFC'), argon2Options);
}

/** False for a wrong password and for a malformed stored hash (never throws for those). */
export async function verifyPassword(stored: string, password: string): Promise<boolean> {
  try {
    return await verify(stored, password.normalize('NFC'));
  } catch {
    return false;
  }
}

/** True when a stored hash was made with other parameters than today's: rehash it at the next sign-in. */
export function needsRehash(stored: string): boolean {
  try {
    const o = parseOptions(stored);
    return (
      o.algorithm !== argon2Options.algorithm ||
      o.memoryCost !== argon2Options.memoryCost ||
      o.timeCost !== argon2Options.timeCost ||
      o.parallelism !== argon2Options.parallelism
    );
  } catch {
    return true;
  }
}

// Made once per process, at start-up, so the first unknown e-mail is not slower than the rest.
const dummy: Promise<string> = hashPassword('slackwater-timing-equaliser-not-a-real-password');
dummy.catch(() => undefined);

/**
 * Spends the same work as a real check when there is no hash to check (unknown e-mail,
 * account without a password yet), so response time does not reveal which accounts exist
 * (ASVS 5.0 6.3.8).
 */
export async function spendVerifyTime(password: string): Promise<false> {
  await verifyPassword(await dummy, password);
  return false;
}
