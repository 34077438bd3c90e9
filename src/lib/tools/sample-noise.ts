/**
 * Repeatable "measurement noise" for the tools' sample data: the same table every time a teacher loads it.
 * An integer hash (the 32-bit finaliser of MurmurHash3, Austin Appleby) of the reading's index and a seed.
 */

/** A repeatable value in [−1, 1) for reading `index` of the series `seed`; flat (uniform) in distribution. */
export function sampleNoise(index: number, seed: number): number {
  let h = (Math.imul(index + 1, 0x9e3779b1) ^ Math.imul(seed + 1, 0x85ebca6b)) >>> 0;
  h = Math.imul(h ^ (h >>> 16), 0x85ebca6b) >>> 0;
  h = Math.imul(h ^ (h >>> 13), 0xc2b2ae35) >>> 0;
  h = (h ^ (h >>> 16)) >>> 0;
  return (h / 2 ** 32) * 2 - 1;
}
