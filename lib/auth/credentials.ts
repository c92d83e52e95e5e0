import "server-only";
import { getCredentialsByEmail, type UserDto } from "@/db/queries/users";
import { AppError } from "@/lib/errors";
import { burnVerifyTime, verifyPassword } from "./password";
import { assertNotThrottled, recordSignInAttempt } from "./throttle";

export const BAD_CREDENTIALS_MESSAGE = "That e-mail and password do not match an account.";

/**
 * Checks an e-mail and password. Unknown e-mail and wrong password give the same
 * message and cost the same argon2 verify, so neither words nor timing tell
 * which addresses have accounts.
 */
export async function verifyCredentials(
  email: string,
  password: string,
  address: string,
): Promise<UserDto> {
  await assertNotThrottled(email, address);
  const found = await getCredentialsByEmail({ email });
  let ok = false;
  if (found) ok = await verifyPassword(found.passwordHash, password);
  else await burnVerifyTime(password);
  await recordSignInAttempt(email, address, ok);
  if (!found || !ok) throw new AppError("unauthorized:credentials", BAD_CREDENTIALS_MESSAGE);
  const { passwordHash: _hash, ...user } = found;
  return user;
}
