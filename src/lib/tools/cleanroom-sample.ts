/**
 * Sample data for the clean-room build: invented counts from a classroom clean box (0.5 m² floor) sampled at
 * three spots, two samples of one cubic foot (28.3 L) each, at 0.5, 1 and 5 µm — cumulative counts, the way
 * a handheld particle counter reports them.
 */

/** Floor area of the sample clean box, m². */
export const CLEANROOM_SAMPLE_AREA_M2 = 0.5;
/** Sizes the sample counter reports, µm. */
export const CLEANROOM_SAMPLE_SIZES_UM = [0.5, 1, 5] as const;
/** One cubic foot, L (28.316 846 592 L exactly; NIST SP 811 Appendix B.8). */
export const CLEANROOM_SAMPLE_VOLUME_L = 28.3;

/** The sample table: one row per sample, location label, volume (L) and cumulative counts per size. */
export function cleanroomSample(): { location: string; volumeL: number; counts: number[] }[] {
  const counts: [string, number[]][] = [
    ['centre', [5120, 1210, 31]],
    ['centre', [4870, 1165, 28]],
    ['near the door', [7390, 1830, 52]],
    ['near the door', [7010, 1744, 47]],
    ['back corner', [6020, 1402, 36]],
    ['back corner', [6275, 1488, 40]],
  ];
  return counts.map(([location, c]) => ({ location, volumeL: CLEANROOM_SAMPLE_VOLUME_L, counts: c }));
}
