/**
 * A 0/1 grid mask packed one bit per point (most significant bit first) and base64-encoded, so a
 * matched area travels to the browser at an eighth of the size of one byte per point.
 */
export function encodeMaskBits(mask: Uint8Array): string {
  const bytes = new Uint8Array(Math.ceil(mask.length / 8));
  for (let i = 0; i < mask.length; i++) if (mask[i]) bytes[i >> 3]! |= 0x80 >> (i & 7);
  let binary = "";
  for (let i = 0; i < bytes.length; i += 0x8000) binary += String.fromCharCode(...bytes.subarray(i, i + 0x8000));
  return btoa(binary);
}

export function decodeMaskBits(encoded: string, length: number): Uint8Array {
  const binary = atob(encoded);
  const mask = new Uint8Array(length);
  for (let i = 0; i < length; i++) mask[i] = (binary.charCodeAt(i >> 3) >> (7 - (i & 7))) & 1;
  return mask;
}
