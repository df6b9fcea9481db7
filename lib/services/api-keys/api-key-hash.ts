// API keys are "blw_" + 32 random base64url characters (192 bits). Only their
// SHA-256 is stored: a fast hash is enough for a random secret of that length
// (no dictionary to guess from), and it makes look-up one indexed equality.
import { createHash, randomBytes } from "node:crypto";

export const API_KEY_PREFIX = "blw_";
/** Characters shown in lists so a person can tell keys apart. */
export const SHOWN_PREFIX_LENGTH = 8;

export function generateApiKey(): string {
  return API_KEY_PREFIX + randomBytes(24).toString("base64url");
}

export function hashApiKey(key: string): string {
  return createHash("sha256").update(key, "utf8").digest("hex");
}
