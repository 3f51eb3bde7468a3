import { createHash, randomBytes } from "node:crypto";

/** A random URL-safe token; only its SHA-256 is stored, so a database leak reveals no live link. */
export function createToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString("base64url");
  return { token, hash: hashToken(token) };
}

export function hashToken(token: string): string {
  return createHash("sha256").update(token).digest("hex");
}
