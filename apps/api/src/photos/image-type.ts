export type ImageType = { readonly contentType: 'image/jpeg'; readonly extension: 'jpg' } | { readonly contentType: 'image/png'; readonly extension: 'png' };

const JPEG_START = [0xff, 0xd8, 0xff];
const PNG_SIGNATURE = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];

const startsWith = (bytes: Uint8Array, signature: readonly number[]) => bytes.length >= signature.length && signature.every((byte, index) => bytes[index] === byte);

/**
 * Image type — tells a JPEG or PNG image from its first bytes (its magic number), whatever its
 * name or the type the browser claimed.
 *
 * Purpose: photos are checked by content, so a text file named .jpg is refused and a JPEG named
 * .png is stored as the JPEG it is.
 * Reference: JPEG starts with the SOI marker FF D8 followed by a marker (FF), ITU-T T.81 (1992) B.2.1;
 * PNG with its 8-byte signature 89 50 4E 47 0D 0A 1A 0A, W3C PNG Specification (Third Edition) §5.2.
 * Throws: nothing; anything else gives null.
 * Example: `imageType(Buffer.from([0xff, 0xd8, 0xff, 0xe0]))` → `{ contentType: 'image/jpeg', extension: 'jpg' }`
 */
export function imageType(bytes: Uint8Array): ImageType | null {
  if (startsWith(bytes, JPEG_START)) return Object.freeze({ contentType: 'image/jpeg', extension: 'jpg' });
  if (startsWith(bytes, PNG_SIGNATURE)) return Object.freeze({ contentType: 'image/png', extension: 'png' });
  return null;
}
