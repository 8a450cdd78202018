import { hash, verify, type Algorithm } from '@node-rs/argon2';
import { dictionary } from '@zxcvbn-ts/language-common';

// Argon2id with the second recommended option of RFC 9106 §4 ("if much less memory is available"):
// t=3 passes, p=4 lanes, m=2^16 KiB (64 MiB), 128-bit salt, 256-bit tag. This is above the OWASP
// Password Storage Cheat Sheet minimum (m=19 MiB, t=2, p=1). About 0.1–0.2 s per hash here.
const ARGON2ID = {
  // Algorithm.Argon2id; the enum is a `const enum`, which isolated modules cannot read.
  algorithm: 2 as Algorithm,
  timeCost: 3,
  parallelism: 4,
  memoryCost: 65_536,
  outputLen: 32,
} as const;

/** Hashes a password into a self-describing PHC string (algorithm, parameters and salt included). */
export function hashPassword(password: string): Promise<string> {
  return hash(password, ARGON2ID);
}

/** True when the password matches the stored hash; a malformed hash counts as a mismatch. */
export async function verifyPassword(storedHash: string, password: string): Promise<boolean> {
  try {
    return await verify(storedHash, password);
  } catch {
    return false;
  }
}

// A hash of a random string, verified when the e-mail is unknown so that a wrong address takes as
// long as a wrong password: the answer's timing must not reveal which accounts exist.
let decoyHash: Promise<string> | undefined;
/** Spends the same time as a real verification, for unknown accounts. */
export async function verifyDecoy(password: string): Promise<void> {
  decoyHash ??= hashPassword(`decoy-${Math.random()}`);
  await verifyPassword(await decoyHash, password);
}

// The zxcvbn project's list of the ~49,000 most common passwords (from published breach corpora),
// shipped inside the npm package; compared case-insensitively.
const COMMON = new Set(dictionary['passwords-common'].map((p) => p.toLowerCase()));

/** True when the password is on the common-passwords list. */
export function isCommonPassword(password: string): boolean {
  return COMMON.has(password.toLowerCase());
}
