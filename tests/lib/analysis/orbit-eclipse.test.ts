import { describe, expect, it } from 'vitest';
import { OrbitEclipseInputSchema, orbitEclipse } from '../../../src/lib/analysis/orbit-eclipse';

describe('orbitEclipse', () => {
  it('gives a 92.56 min period and a 36.1 min eclipse at 400 km', () => {
    // Wertz & Larson, SMAD ch. 5 (T = 2π√(r³/GM), eclipse fraction asin(R/r)/π) with WGS 84 constants:
    // 92.56 min and 36.1 min at 400 km; tolerances are the last quoted digit.
    const r = orbitEclipse({ altitudeKm: 400 });
    expect(Math.abs(r.periodMin - 92.56)).toBeLessThan(0.005);
    expect(Math.abs(r.eclipseMin - 36.1)).toBeLessThan(0.05);
    expect(r.sunlitMin + r.eclipseMin).toBeCloseTo(r.periodMin, 9);
  });

  it('gives a sidereal-day period near geostationary radius', () => {
    // Geostationary radius 42 164 km, period one sidereal day 86 164.1 s (e.g. Vallado, Fundamentals of
    // Astrodynamics and Applications, ch. 1 — from memory); 10 s tolerance for the rounded radius.
    const r = orbitEclipse({ altitudeKm: 42_164 - 6378.137 });
    expect(Math.abs(r.periodS - 86_164.1)).toBeLessThan(10);
    expect(r.eclipseFraction).toBeLessThan(0.05);
  });

  it('refuses altitudes below 100 km', () => {
    expect(OrbitEclipseInputSchema.safeParse({ altitudeKm: 50 }).success).toBe(false);
  });
});
