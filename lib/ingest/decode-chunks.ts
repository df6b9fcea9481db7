// Bytes or strings in, strings out: UTF-8 decoded across chunk boundaries (a
// multi-byte character split between two chunks is joined), BOM dropped.
export async function* decodeChunks(input: AsyncIterable<string | Uint8Array>): AsyncGenerator<string> {
  const decoder = new TextDecoder("utf-8"); // strips a UTF-8 BOM from bytes by default
  let isFirst = true;
  for await (const chunk of input) {
    let s = typeof chunk === "string" ? chunk : decoder.decode(chunk, { stream: true });
    if (isFirst && s.length > 0) {
      if (s.charCodeAt(0) === 0xfeff) s = s.slice(1);
      isFirst = false;
    }
    if (s.length > 0) yield s;
  }
  const tail = decoder.decode();
  if (tail.length > 0) yield tail;
}
