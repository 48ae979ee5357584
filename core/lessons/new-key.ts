/** A fresh checkpoint, chapter or option key: 12 base-36 characters from the platform's CSPRNG. */
export function newKey(length = 12): string {
  const bytes = new Uint8Array(length);
  globalThis.crypto.getRandomValues(bytes);
  let key = '';
  for (const byte of bytes) key += (byte % 36).toString(36);
  return key;
}
