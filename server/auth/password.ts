/** Password hashing with argon2id (OWASP minimum: 19 MiB, 2 passes, 1 lane). */
import { hash, verify, type Algorithm } from '@node-rs/argon2';

const ARGON2ID = 2 as Algorithm; // Algorithm.Argon2id (a const enum, which isolated modules cannot read)
const OPTIONS = { algorithm: ARGON2ID, memoryCost: 19456, timeCost: 2, parallelism: 1 };

export function hashPassword(password: string): Promise<string> {
  return hash(password, OPTIONS);
}

export async function verifyPassword(passwordHash: string, password: string): Promise<boolean> {
  try {
    return await verify(passwordHash, password);
  } catch {
    return false;
  }
}

// A real hash to verify against when the e-mail is unknown, so a miss takes as long as a wrong password.
let decoy: Promise<string> | undefined;
export async function spendPasswordTime(password: string): Promise<void> {
  decoy ??= hashPassword('decoy-password-for-timing');
  await verifyPassword(await decoy, password);
}
