import { createHash } from "node:crypto";

/**
 * A short fingerprint of the user's password hash, carried in the session token. Changing the
 * password changes it, so every session issued before the change stops working; the session of the
 * person who changed it is re-issued with the new value.
 */
export function passwordFingerprint(passwordHash: string | null | undefined): string {
  return createHash("sha256").update(`caryatid-session:${passwordHash ?? ""}`).digest("base64url").slice(0, 22);
}
