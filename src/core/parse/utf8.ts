/**
 * The project's one UTF-8 decoder (RFC 3629; the WHATWG Encoding Standard's "UTF-8 decode" with
 * the fatal error mode, as `TextDecoder` implements it): bytes that are not UTF-8 are refused,
 * never replaced, and the first bad byte is found by offset and line so that every reader can
 * name the place. A leading byte-order mark (EF BB BF) is dropped.
 */

/** Bytes as text, or where they stop being UTF-8. */
export type Utf8Decoded =
  | { ok: true; text: string }
  | {
      ok: false;
      /** Byte offset of the first byte that starts no valid UTF-8 character. */
      offset: number;
      /** 1-based line of that byte (line feeds before it, plus one). */
      line: number;
    };

const strict = new TextDecoder('utf-8', { fatal: true, ignoreBOM: false });
const lenient = new TextDecoder('utf-8', { fatal: false, ignoreBOM: false });

/** `bytes` as text when they are UTF-8 throughout; otherwise the offset and line of the first fault. */
export function decodeUtf8(bytes: Uint8Array): Utf8Decoded {
  try {
    return { ok: true, text: strict.decode(bytes) };
  } catch {
    const offset = firstInvalidUtf8(bytes);
    return { ok: false, offset, line: lineAtByte(bytes, offset) };
  }
}

/**
 * `bytes` as text for display only: each sequence that is not UTF-8 becomes U+FFFD (the
 * replacement the Encoding Standard prescribes), a leading byte-order mark is dropped.
 */
export function decodeUtf8Lenient(bytes: Uint8Array): string {
  return lenient.decode(bytes);
}

/** Offset of the first byte that starts no well-formed UTF-8 sequence (RFC 3629, section 4). */
function firstInvalidUtf8(bytes: Uint8Array): number {
  // Binary search on prefixes would split characters; walk the encoding instead.
  let i = 0;
  while (i < bytes.length) {
    const b = bytes[i]!;
    const size =
      b < 0x80
        ? 1
        : b >= 0xc2 && b < 0xe0
          ? 2
          : b >= 0xe0 && b < 0xf0
            ? 3
            : b >= 0xf0 && b < 0xf5
              ? 4
              : 0;
    if (size === 0) return i;
    if (size > 1) {
      try {
        strict.decode(bytes.subarray(i, i + size));
      } catch {
        return i;
      }
    }
    i += size;
  }
  return i;
}

function lineAtByte(bytes: Uint8Array, at: number): number {
  let line = 1;
  for (let i = 0; i < at && i < bytes.length; i++) if (bytes[i] === 0x0a) line++;
  return line;
}
