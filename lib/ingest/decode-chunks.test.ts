// UTF-8 (RFC 3629): "é" is C3 A9, "°" is C2 B0; a BOM is EF BB BF.
import { describe, expect, it } from "vitest";
import { decodeChunks } from "./decode-chunks";

async function decode(chunks: Uint8Array[]): Promise<string> {
  let out = "";
  for await (const s of decodeChunks((async function* () { yield* chunks; })())) out += s;
  return out;
}

const bytes = (...b: number[]) => Uint8Array.from(b);
const ascii = (s: string) => new TextEncoder().encode(s);

describe("decodeChunks", () => {
  it("drops a BOM and joins a character split between chunks, before and after ASCII chunks", async () => {
    expect(await decode([bytes(0xef, 0xbb, 0xbf, 0x61), ascii("bc"), bytes(0x31, 0xc3), bytes(0xa9, 0x32), ascii("xyz")])).toBe("abc1é2xyz");
  });

  it("finishes a character split between chunks, or marks a broken one", async () => {
    // C2 followed by "b" is a broken sequence: reported as U+FFFD, the "b" kept.
    expect(await decode([ascii("a,"), bytes(0x35, 0xc2), ascii("b\n")])).toBe("a,5\ufffdb\n");
    expect(await decode([ascii("t,"), bytes(0xc2), bytes(0xb0), ascii("F\n")])).toBe("t,°F\n");
  });

  it("passes strings through", async () => {
    let out = "";
    for await (const s of decodeChunks((async function* () { yield "\ufeffa"; yield "b"; })())) out += s;
    expect(out).toBe("ab");
  });
});

it("decodes a chunk larger than its 64 KiB slices, with a character across a slice edge", async () => {
  const big = new Uint8Array(70_000).fill(0x61);
  big[65_535] = 0xc3;
  big[65_536] = 0xa9;
  const out = await decode([ascii("x"), big]);
  expect(out.length).toBe(1 + 70_000 - 1);
  expect(out.indexOf("é")).toBe(1 + 65_535);
});
