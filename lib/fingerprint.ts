import { createHash } from "node:crypto";

/** JSON with object keys sorted, so equal data always serializes the same way. */
export function stableStringify(value: unknown): string {
  if (value === null || typeof value !== "object") return JSON.stringify(value) ?? "null";
  if (Array.isArray(value)) return `[${value.map(stableStringify).join(",")}]`;
  const entries = Object.entries(value as Record<string, unknown>)
    .filter(([, v]) => v !== undefined)
    .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
  return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${stableStringify(v)}`).join(",")}}`;
}

/**
 * Fingerprint of the inputs a result was computed from (member data, load combinations, price book
 * revision). A stored search or adopted alternative whose fingerprint differs from the mark's
 * current one is stale.
 */
export function fingerprintInputs(inputs: unknown): string {
  return createHash("sha256").update(stableStringify(inputs)).digest("hex");
}
