import { describe, expect, it } from 'vitest';
import { imageType } from './image-type';

// Signatures: ITU-T T.81 (1992) B.2.1 (JPEG SOI marker FF D8), W3C PNG Specification §5.2 (8-byte signature).
describe('imageType', () => {
  it('knows a JPEG and a PNG by their first bytes', () => {
    expect(imageType(Buffer.from([0xff, 0xd8, 0xff, 0xe0, 0x00, 0x10]))).toEqual({ contentType: 'image/jpeg', extension: 'jpg' });
    expect(imageType(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0x00]))).toEqual({ contentType: 'image/png', extension: 'png' });
  });

  it('refuses text, a truncated signature and an empty file', () => {
    expect(imageType(Buffer.from('plot label,drain time\n'))).toBeNull();
    expect(imageType(Buffer.from([0x89, 0x50, 0x4e, 0x47]))).toBeNull();
    expect(imageType(Buffer.alloc(0))).toBeNull();
  });
});
