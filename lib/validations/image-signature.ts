// Which image a byte buffer really is, from its first bytes ("magic numbers"),
// so a photo's declared type is checked against its content, not trusted.
// Signatures: PNG spec (ISO/IEC 15948, 8-byte signature 89 50 4E 47 0D 0A 1A 0A);
// JPEG/JFIF SOI marker FF D8 FF (ITU-T T.81); WebP = RIFF....WEBP (RFC 9649).
export const PHOTO_TYPES = ["image/jpeg", "image/png", "image/webp"] as const;
export type PhotoType = (typeof PHOTO_TYPES)[number];
export const MAX_PHOTO_BYTES = 5 * 1024 * 1024;

const PNG = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];

function startsWith(b: Uint8Array, sig: number[], at = 0): boolean {
  if (b.length < at + sig.length) return false;
  return sig.every((x, i) => b[at + i] === x);
}

/** The image type the bytes carry, or null when they are none of the three. */
export function detectImageType(bytes: Uint8Array): PhotoType | null {
  if (startsWith(bytes, PNG)) return "image/png";
  if (startsWith(bytes, [0xff, 0xd8, 0xff])) return "image/jpeg";
  if (startsWith(bytes, [0x52, 0x49, 0x46, 0x46]) && startsWith(bytes, [0x57, 0x45, 0x42, 0x50], 8)) return "image/webp";
  return null;
}

export function photoExtension(t: PhotoType): string {
  return t === "image/jpeg" ? "jpg" : t === "image/png" ? "png" : "webp";
}
