/**
 * Sample profile for the PSD calculator: the generalized random-vibration test levels for components of
 * GSFC-STD-7000A (GEVS), Table 2.4-3, qualification level, overall 14.1 Grms — a published standard, so a
 * class can check the calculator against the number printed in it.
 */

/** Breakpoints: frequency (Hz) and level (g²/Hz), or a slope (dB/octave) from the previous point. */
export const PSD_PROFILE_SAMPLE = [
  { frequencyHz: 20, psdG2PerHz: 0.026 },
  { frequencyHz: 50, psdG2PerHz: 0.16 },
  { frequencyHz: 800, psdG2PerHz: 0.16 },
  { frequencyHz: 2000, slopeDbPerOctave: -6 },
] as const;

/** The overall level Table 2.4-3 prints for this profile, Grms. */
export const PSD_PROFILE_SAMPLE_GRMS = 14.1;
