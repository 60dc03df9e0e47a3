/**
 * Turns uploaded bytes into text for parseProfileCsv. Invalid UTF-8 becomes
 * U+FFFD (the WHATWG Encoding standard's replacement), which the parser then
 * rejects as "not a CSV text file" with its line, instead of this throwing.
 * TextDecoder exists in browsers and in Node, so both sides share this.
 */
export function decodeProfileBytes(bytes: Uint8Array): string {
  // ignoreBOM keeps a leading byte order mark in the text so the parser can note it.
  return new TextDecoder('utf-8', { fatal: false, ignoreBOM: true }).decode(bytes);
}
