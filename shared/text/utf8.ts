/**
 * The length of `text` in bytes of UTF-8 (RFC 3629 §3), counted by code point: 1 byte up to
 * U+007F, 2 up to U+07FF, 3 up to U+FFFF (a lone surrogate counts 3, as encoders replace it with
 * U+FFFD), 4 above. Counted here rather than with TextEncoder, which not every JavaScript engine
 * the app runs on provides.
 */
export function utf8Length(text: string): number {
  let bytes = 0;
  for (const char of text) {
    const code = char.codePointAt(0)!;
    bytes += code <= 0x7f ? 1 : code <= 0x7ff ? 2 : code <= 0xffff ? 3 : 4;
  }
  return bytes;
}
