/**
 * Strict UTF-8 decoding of a definition file. Node's readFile(path, 'utf8') silently turns bytes that
 * are not UTF-8 (a file saved as Latin-1 or Windows-1252) into U+FFFD, which would then print on
 * every sheet; here such a file is refused with the place of its first bad byte.
 */

export type Decoded = { ok: true; text: string } | { ok: false; line: number; column: number; byte: number };

/** Decode bytes as UTF-8, or give the 1-based line and column (in characters) of the first invalid byte. */
export function decodeUtf8(bytes: Uint8Array): Decoded {
  try {
    return { ok: true, text: new TextDecoder('utf-8', { fatal: true, ignoreBOM: true }).decode(bytes) };
  } catch {
    const bad = validPrefixLength(bytes);
    // A streaming decoder holds back an unfinished character, so `before` is the complete text before the bad byte.
    const before = new TextDecoder('utf-8', { fatal: true, ignoreBOM: true }).decode(bytes.subarray(0, bad), { stream: true });
    const lineStart = before.lastIndexOf('\n') + 1;
    const line = before.split('\n').length;
    return { ok: false, line, column: [...before.slice(lineStart)].length + 1, byte: bytes[bad] };
  }
}

/**
 * Length of the longest prefix that is valid UTF-8 so far (a character may be cut at its end):
 * validity of prefixes is monotone, so a binary search over streaming decodes finds it, O(n log n).
 */
function validPrefixLength(bytes: Uint8Array): number {
  const ok = (n: number): boolean => {
    try {
      new TextDecoder('utf-8', { fatal: true }).decode(bytes.subarray(0, n), { stream: true });
      return true;
    } catch {
      return false;
    }
  };
  let [lo, hi] = [0, bytes.length]; // ok(lo) holds; ok(hi) fails
  while (hi - lo > 1) {
    const mid = (lo + hi) >>> 1;
    if (ok(mid)) lo = mid;
    else hi = mid;
  }
  // lo bytes decode (possibly ending inside a character); the first bad byte starts at or after the last whole character.
  return lastCharStart(bytes, lo);
}

/** Start of the unfinished character at the end of bytes[0, n), or n when it ends on a whole character. */
function lastCharStart(bytes: Uint8Array, n: number): number {
  for (let i = n - 1; i >= Math.max(0, n - 3); i--) {
    const b = bytes[i];
    if ((b & 0xc0) !== 0x80) {
      const length = b >= 0xf0 ? 4 : b >= 0xe0 ? 3 : b >= 0xc0 ? 2 : 1;
      return i + length > n ? i : n;
    }
  }
  return n;
}
