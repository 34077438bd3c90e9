/**
 * Orbit period and eclipse length of a circular orbit with a cylindrical Earth shadow at beta angle 0
 * (the Sun in the orbit plane: the longest eclipse), after Wertz & Larson, Space Mission Analysis and
 * Design (3rd ed.), ch. 5: period 2π√(r³/GM), eclipse fraction (1/π)·asin(R/r).
 */
import { z } from 'zod';

/** Largest JSON eclipse request, bytes. */
export const ORBIT_ECLIPSE_JSON_MAX_BYTES = 10_000;
/** WGS 84 equatorial radius, km (NIMA TR8350.2). */
export const EARTH_RADIUS_KM = 6378.137;
/** WGS 84 Earth gravitational parameter GM, km³/s² (NIMA TR8350.2). */
export const EARTH_GM_KM3_PER_S2 = 398600.4418;
/** Altitude bounds for the calculator, km (about to the Moon's distance). */
export const ORBIT_MIN_ALTITUDE_KM = 100;
export const ORBIT_MAX_ALTITUDE_KM = 400_000;

export const OrbitEclipseInputSchema = z
  .object({
    /** Height above the equatorial radius, km. */
    altitudeKm: z.number().finite().min(ORBIT_MIN_ALTITUDE_KM).max(ORBIT_MAX_ALTITUDE_KM),
  })
  .strict();
export type OrbitEclipseInput = z.infer<typeof OrbitEclipseInputSchema>;

export interface OrbitEclipseResult {
  radiusKm: number;
  periodS: number;
  periodMin: number;
  /** Share of each orbit in shadow, 0 … 0.5. */
  eclipseFraction: number;
  eclipseMin: number;
  sunlitMin: number;
  /** Orbits per day (86 400 s). */
  orbitsPerDay: number;
}

/** Period and eclipse of a circular orbit at `altitudeKm` (beta angle 0, cylindrical shadow); times in min. */
export function orbitEclipse(input: OrbitEclipseInput): OrbitEclipseResult {
  const r = EARTH_RADIUS_KM + input.altitudeKm;
  const periodS = 2 * Math.PI * Math.sqrt((r * r * r) / EARTH_GM_KM3_PER_S2);
  const eclipseFraction = Math.asin(EARTH_RADIUS_KM / r) / Math.PI;
  return {
    radiusKm: r,
    periodS,
    periodMin: periodS / 60,
    eclipseFraction,
    eclipseMin: (eclipseFraction * periodS) / 60,
    sunlitMin: ((1 - eclipseFraction) * periodS) / 60,
    orbitsPerDay: 86_400 / periodS,
  };
}
