import bcrypt from "bcryptjs";

export { PASSWORD_MIN_LENGTH } from "./password-policy";
const BCRYPT_ROUNDS = 10;

export function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, BCRYPT_ROUNDS);
}

export function verifyPassword(password: string, hash: string | null | undefined): Promise<boolean> {
  // Compare against a fixed hash when the user is unknown, so timing does not reveal which
  // addresses have accounts.
  return bcrypt.compare(password, hash ?? UNKNOWN_USER_HASH).then((ok) => ok && Boolean(hash));
}

// bcrypt of a random string nobody knows; only its cost matters.
const UNKNOWN_USER_HASH = "$2b$10$vPeTtne6.7X1g54oXSXYLe6UW8JPrCsKqWEMpq4WsRNPHDVYbBXbu";
