import bcrypt from "bcryptjs";

/** bcrypt cost 10: about 60 ms here, the library's default. */
const BCRYPT_COST = 10;
export const PASSWORD_MIN_LENGTH = 10;

export function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, BCRYPT_COST);
}

export function verifyPassword(password: string, hash: string): Promise<boolean> {
  return bcrypt.compare(password, hash);
}

let dummyHash: Promise<string> | undefined;

/**
 * Checks a sign-in's password against the person's hash, or, for an e-mail with no password (no
 * such person, or an invitation not yet accepted), against a hash of the same cost that matches
 * nothing typed: both answers take one bcrypt compare, so the time does not tell which e-mails
 * have a sign-in.
 */
export async function checkSignInPassword(
  password: string,
  hash: string | null | undefined,
): Promise<boolean> {
  if (hash) return verifyPassword(password, hash);
  dummyHash ??= bcrypt.hash(`no sign-in ${Math.random()}`, BCRYPT_COST);
  await verifyPassword(password, await dummyHash);
  return false;
}
