// TextEncoder belongs to every runtime we run in (browsers, Node, workers) but not to the ECMAScript
// library that keeps shared/ platform-free, so it is declared here as far as it is used.
declare const TextEncoder: { new (): { encode(text: string): Uint8Array } };
const utf8 = new TextEncoder();

/** UTF-8 bytes of a text file. */
export function utf8Bytes(value: string): Uint8Array {
  return utf8.encode(value);
}
