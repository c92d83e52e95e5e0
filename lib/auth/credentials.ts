import "server-only";
import { getCredentialsByEmail, type UserDto } from "@/db/queries/users";
import { AppError } from "@/lib/errors";
import { trustedDeviceId } from "./device-cookie";
import { burnVerifyTime, verifyPassword } from "./password";
import { clientAddress, consumeLimits, limits, returnHits } from "./throttle";

export const BAD_CREDENTIALS_MESSAGE = "That e-mail and password do not match an account.";

const SIGN_IN_REFUSAL = {
  code: "rate_limited:sign_in" as const,
  message: "Too many failed sign-ins.",
};

/**
 * Checks an e-mail and password. Unknown e-mail and wrong password give the same
 * message and cost the same argon2 verify, so neither words nor timing tell
 * which addresses have accounts. A guess is counted before the password is checked
 * and given back only when it was right, so parallel guesses cannot overrun a limit.
 */
export async function verifyCredentials(
  email: string,
  password: string,
  request: Request,
): Promise<UserDto> {
  const device = trustedDeviceId(request, email);
  // A browser holding this account's device cookie is limited on its own; everyone else
  // shares the address limit and the account's "untrusted clients" limit.
  const counted = device
    ? [limits.signInDevice(device)]
    : [limits.signInAddress(clientAddress(request)), limits.signInAccount(email)];
  await consumeLimits(counted, SIGN_IN_REFUSAL);
  const found = await getCredentialsByEmail({ email });
  let ok = false;
  if (found) ok = await verifyPassword(found.passwordHash, password);
  else await burnVerifyTime(password);
  if (!found || !ok) throw new AppError("unauthorized:credentials", BAD_CREDENTIALS_MESSAGE);
  await returnHits(counted);
  const { passwordHash: _hash, ...user } = found;
  return user;
}
