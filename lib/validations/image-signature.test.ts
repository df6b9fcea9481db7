// Signatures from the format specifications named in image-signature.ts
// (PNG ISO/IEC 15948, JPEG ITU-T T.81, WebP RFC 9649).
import { describe, expect, it } from "vitest";
import { detectImageType } from "./image-signature";

const b = (...x: number[]) => Uint8Array.from(x);

describe("detectImageType", () => {
  it.each([
    ["png", b(0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0), "image/png"],
    ["jpeg", b(0xff, 0xd8, 0xff, 0xe0, 0, 0x10), "image/jpeg"],
    ["webp", b(0x52, 0x49, 0x46, 0x46, 1, 2, 3, 4, 0x57, 0x45, 0x42, 0x50, 0x56), "image/webp"],
    ["riff but wave", b(0x52, 0x49, 0x46, 0x46, 1, 2, 3, 4, 0x57, 0x41, 0x56, 0x45), null],
    ["html", new TextEncoder().encode("<html><script>"), null],
    ["short", b(0x89, 0x50), null],
    ["empty", b(), null],
  ])("%s", (_n, bytes, expected) => {
    expect(detectImageType(bytes)).toBe(expected);
  });
});
