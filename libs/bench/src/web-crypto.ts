/** SHA-256 through the Web Crypto standard (browsers and Node 20), typed without DOM libraries. */

type Subtle = { digest(algorithm: 'SHA-256', data: Uint8Array): Promise<ArrayBuffer> };
type Encoder = { encode(text: string): Uint8Array };
type WebGlobals = { crypto?: { subtle?: Subtle }; TextEncoder?: new () => Encoder };

/** Lower-case hex SHA-256 of the UTF-8 bytes of `text` (W3C Web Cryptography API, `digest`). */
export async function sha256Hex(text: string): Promise<string> {
  const g = globalThis as unknown as WebGlobals;
  const subtle = g.crypto?.subtle;
  if (!subtle || !g.TextEncoder) throw new Error('bench: Web Crypto (crypto.subtle) and TextEncoder are needed for the checksum');
  const digest = await subtle.digest('SHA-256', new g.TextEncoder().encode(text));
  return [...new Uint8Array(digest)].map((b) => b.toString(16).padStart(2, '0')).join('');
}
