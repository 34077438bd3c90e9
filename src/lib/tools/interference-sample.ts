/**
 * Sample data for the interference hunt: a phone magnetometer's readings near three invented classroom
 * devices, each modelled as a small dipole (on-axis field, Griffiths §5.4.3) over Earth's field, with
 * reading noise; and an AM radio's listening distances for the same devices.
 */
import { dipoleFieldAxialT } from '../analysis/magnetic';
import { sampleNoise } from './sample-noise';

/** Background with every device off, µT (inside Earth's 25–65 µT; invented). */
export const INTERFERENCE_SAMPLE_BACKGROUND_UT = 48;
/** Level the sample receiver tolerates, µT. */
export const INTERFERENCE_SAMPLE_THRESHOLD_UT = 1;
/** Distances of the magnetometer readings, cm. */
export const INTERFERENCE_SAMPLE_DISTANCES_CM = [5, 10, 15, 20, 30, 40, 60] as const;
/** The invented devices: dipole moment (A·m²) and where an AM radio stopped hearing them (cm, three tries). */
export const INTERFERENCE_SAMPLE_DEVICES = [
  { label: 'Toy motor', momentAm2: 0.06, noiseGoneCm: [25, 30, 28] },
  { label: 'Phone charger', momentAm2: 0.25, noiseGoneCm: [60, 55, 65] },
  { label: 'Desk fan', momentAm2: 0.12, noiseGoneCm: [40, 45, 35] },
] as const;

/** Magnetometer rows: device, distance (cm) and field (µT, one decimal, background included). */
export function interferenceSampleReadings(): { device: string; distanceCm: number; fieldUT: number }[] {
  return INTERFERENCE_SAMPLE_DEVICES.flatMap((d, k) =>
    INTERFERENCE_SAMPLE_DISTANCES_CM.map((distanceCm, i) => {
      const field = dipoleFieldAxialT(d.momentAm2, distanceCm / 100) * 1e6;
      const reading = INTERFERENCE_SAMPLE_BACKGROUND_UT + field + 0.1 * sampleNoise(i, 60 + k);
      return { device: d.label, distanceCm, fieldUT: Math.round(reading * 10) / 10 };
    }),
  );
}

/** AM radio rows: device and the distance (cm) where its noise could no longer be heard. */
export function interferenceSampleListening(): { device: string; noiseGoneCm: number }[] {
  return INTERFERENCE_SAMPLE_DEVICES.flatMap((d) =>
    d.noiseGoneCm.map((noiseGoneCm) => ({ device: d.label, noiseGoneCm })),
  );
}
