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
