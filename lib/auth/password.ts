import "server-only";
import { hash, verify } from "@node-rs/argon2";

// OWASP ASVS 5.0 appendix C / OWASP Password Storage Cheat Sheet minimum for
// argon2id: m = 19 MiB, t = 2, p = 1.
const ARGON2ID = 2; // Algorithm.Argon2id; the package's const enum cannot be imported under isolatedModules
export const passwordHashOptions = {
  algorithm: ARGON2ID,
  memoryCost: 19_456, // KiB = 19 MiB
  timeCost: 2,
  parallelism: 1,
} as const;

export function hashPassword(password: string): Promise<string> {
  return hash(password, passwordHashOptions);
}

export async function verifyPassword(passwordHash: string, password: string): Promise<boolean> {
  try {
    return await verify(passwordHash, password);
  } catch {
    return false;
  }
}

// Verifying against this when the e-mail is unknown makes a miss cost the same
// time as a wrong password, so timing does not reveal which addresses exist.
let dummyHash: Promise<string> | undefined;
export async function burnVerifyTime(password: string): Promise<void> {
  dummyHash ??= hashPassword("castline-timing-equaliser");
  await verifyPassword(await dummyHash, password);
}
