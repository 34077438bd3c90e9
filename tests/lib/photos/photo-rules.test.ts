import { describe, expect, it } from 'vitest';
import { PHOTO_REQUEST_BYTES_MAX, photoReleaseRequired, photoUploadBatches } from '../../../src/lib/photos/photo-rules';

describe('photoUploadBatches', () => {
  it('sends six 8 MB photos in two requests under the 40 MB request limit, in order', () => {
    const batches = photoUploadBatches(Array(6).fill(8_000_000));
    expect(batches).toEqual([
      [0, 1, 2, 3],
      [4, 5],
    ]);
  });

  it('keeps every request under the request limit for mixed sizes, and loses no photo', () => {
    const sizes = [9_900_000, 100_000, 9_000_000, 9_500_000, 9_999_999, 2_000_000];
    const batches = photoUploadBatches(sizes);
    expect(batches.flat()).toEqual([0, 1, 2, 3, 4, 5]);
    for (const b of batches) expect(b.reduce((s, i) => s + sizes[i]!, 0)).toBeLessThan(PHOTO_REQUEST_BYTES_MAX);
  });

  it('gives a photo over the limits a request of its own, and an empty list none', () => {
    expect(photoUploadBatches([50_000_000, 1_000])).toEqual([[0], [1]]);
    expect(photoUploadBatches([])).toEqual([]);
  });
});

describe('photoReleaseRequired', () => {
  it('asks for the confirmation only when the entry has photos', () => {
    expect(photoReleaseRequired(0)).toBe(false);
    expect(photoReleaseRequired(1)).toBe(true);
  });
});
