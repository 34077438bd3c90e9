/**
 * Sunlit equilibrium temperature of a body that absorbs sunlight on one area and radiates from another:
 * α·S·A_abs = ε·σ·A_emit·T⁴, so T = (α·S·(A_abs/A_emit)/(ε·σ))^¼, with S falling as 1/d² (Wertz & Larson,
 * Space Mission Analysis and Design, 3rd ed.; from memory: §11.5, thermal balance). A sphere has A_abs/A_emit = 1/4, a flat
 * plate facing the Sun and radiating from both faces 1/2.
 */
import { z } from 'zod';
import { readingBetween } from './reading-range';

/** Largest JSON equilibrium-temperature request, bytes. */
export const EQUILIBRIUM_JSON_MAX_BYTES = 10_000;
/** Stefan–Boltzmann constant, W m⁻² K⁻⁴ (CODATA 2018, exact). */
export const STEFAN_BOLTZMANN_W_PER_M2_K4 = 5.670374419e-8;
/** Total solar irradiance at 1 AU, W/m² (Kopp & Lean, Geophys. Res. Lett. 38, L01706, 2011). */
export const SOLAR_CONSTANT_W_PER_M2 = 1360.8;
/** Distance bounds from the Sun, AU (inside Mercury's orbit to beyond Neptune's). */
export const EQUILIBRIUM_MIN_DISTANCE_AU = 0.1;
export const EQUILIBRIUM_MAX_DISTANCE_AU = 100;

/**
 * Smallest absorptivity or emissivity accepted: polished metals go down to about 0.02 (from memory: polished gold
 * and silver, ε ≈ 0.02–0.03), and α/ε of 5e-324 would overflow the temperature to Infinity.
 */
export const EQUILIBRIUM_MIN_COEFFICIENT = 0.01;

export const EquilibriumTemperatureInputSchema = z
  .object({
    /** Solar absorptivity α, 0.01 … 1. */
    absorptivity: readingBetween(EQUILIBRIUM_MIN_COEFFICIENT, 1, ''),
    /** Infrared emissivity ε, 0.01 … 1. */
    emissivity: readingBetween(EQUILIBRIUM_MIN_COEFFICIENT, 1, ''),
    /** Sunlit (absorbing) area over radiating area; 0.25 for a sphere. */
    areaRatio: z.number().finite().gt(0).max(1).default(0.25),
    /** Distance from the Sun, AU. */
    distanceAu: z.number().finite().min(EQUILIBRIUM_MIN_DISTANCE_AU).max(EQUILIBRIUM_MAX_DISTANCE_AU).default(1),
  })
  .strict();
export type EquilibriumTemperatureInput = z.infer<typeof EquilibriumTemperatureInputSchema>;

export interface EquilibriumTemperatureResult {
  irradianceWPerM2: number;
  temperatureK: number;
  temperatureC: number;
}

/** Equilibrium temperature (K and °C) of a body in sunlight, no internal heat and no planet nearby. */
export function equilibriumTemperature(input: EquilibriumTemperatureInput): EquilibriumTemperatureResult {
  const irradianceWPerM2 = SOLAR_CONSTANT_W_PER_M2 / (input.distanceAu * input.distanceAu);
  const t4 =
    (input.absorptivity * irradianceWPerM2 * input.areaRatio) / (input.emissivity * STEFAN_BOLTZMANN_W_PER_M2_K4);
  const temperatureK = Math.sqrt(Math.sqrt(t4));
  return { irradianceWPerM2, temperatureK, temperatureC: temperatureK - 273.15 };
}
