/**
 * Job ids: random version-4 UUIDs. `crypto.randomUUID` exists only in secure contexts (https or
 * localhost); a shop network often serves the app over plain http from a LAN address, where only
 * `crypto.getRandomValues` is there. Both draw from the same cryptographic source.
 */

/** A version-4 UUID from 16 random bytes (RFC 9562 §5.4: version 4, variant 10). */
export function uuidFromBytes(bytes: Uint8Array): string {
  const b = Uint8Array.from(bytes.subarray(0, 16));
  b[6] = (b[6]! & 0x0f) | 0x40;
  b[8] = (b[8]! & 0x3f) | 0x80;
  const hex = [...b].map((byte) => byte.toString(16).padStart(2, '0')).join('');
  return `${hex.slice(0, 8)}-${hex.slice(8, 12)}-${hex.slice(12, 16)}-${hex.slice(16, 20)}-${hex.slice(20)}`;
}

export function newJobId(
  source: Pick<Crypto, 'getRandomValues'> & Partial<Pick<Crypto, 'randomUUID'>> = crypto,
): string {
  if (typeof source.randomUUID === 'function') return source.randomUUID();
  return uuidFromBytes(source.getRandomValues(new Uint8Array(16)));
}
