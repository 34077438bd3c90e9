import { describe, expect, it } from 'vitest';
import {
  LaunchStackInputSchema,
  fairingRadiusAtM,
  launchStackAnalyse,
  type LaunchStackInput,
} from '../../../src/lib/analysis/launch-stack';
import { launchStackSavedResult } from '../../../src/lib/analysis/saved-result-tools';
import { SavedResultSchema } from '../../../src/lib/analysis/saved-result';
import { LAUNCH_STACK_SAMPLE } from '../../../src/lib/tools/launch-stack-sample';
import { demoModel } from '../geometry/fixtures';

// The sample (invented demo figures): three hexagonal probes 2.4 m across the flats and 0.9 m tall, 450 kg
// each, on an adapter 0.8 m tall (120 kg) with 0.2 m separation rings (20 kg); fairing 3.2 m × 4.2 m + 3 m cone.
const base = LAUNCH_STACK_SAMPLE;
const parse = (over: Record<string, unknown> = {}): LaunchStackInput =>
  LaunchStackInputSchema.parse({ ...base, ...over });
// A regular hexagon's circumradius is its apothem / cos 30°, i.e. 2.4 m across flats → 2.4/√3 m
// (CRC Standard Mathematical Tables, regular polygons).
const PROBE_RADIUS = 2.4 / Math.sqrt(3);

describe('launchStackAnalyse', () => {
  it('samples the same stack as the demo model', () => {
    const m = demoModel('skein-stack');
    expect(LAUNCH_STACK_SAMPLE.body).toEqual(m.body);
    expect(LAUNCH_STACK_SAMPLE.stack).toEqual(m.stack);
  });

  it('gives the height and centre of mass of the Skein stack as a hand calculation does', () => {
    const r = launchStackAnalyse(parse());
    // Hand calculation, parts bottom to top: adapter 0–0.8, ring 0.8–1.0, probe 1.0–1.9, ring 1.9–2.1,
    // probe 2.1–3.0, ring 3.0–3.2, probe 3.2–4.1 m. First moment (Meriam & Kraige, Statics, ch. 5):
    // 120·0.4 + 20·(0.9 + 2.0 + 3.1) + 450·(1.45 + 2.55 + 3.65) = 48 + 120 + 3442.5 = 3610.5 kg·m over 1530 kg.
    expect(r.heightM).toBeCloseTo(4.1, 12);
    expect(r.totalMassKg).toBeCloseTo(1530, 9);
    expect(r.centreOfMassM).toBeCloseTo(3610.5 / 1530, 12);
    expect(r.centreOfMassM).toBeCloseTo(2.3598, 4);
    expect(r.parts.map((p) => p.label)).toEqual([
      'Launch adapter',
      'Separation ring 1',
      'Probe 1',
      'Separation ring 2',
      'Probe 2',
      'Separation ring 3',
      'Probe 3',
    ]);
    expect(r.maxRadiusM).toBeCloseTo(PROBE_RADIUS, 12);
    expect(r.fits).toBe(true);
    expect(r.minMarginM).toBeCloseTo(1.6 - PROBE_RADIUS, 12);
    expect(r.advice).toEqual([]);
  });

  it('uses a probe centre of mass given above its base', () => {
    // Hand calculation: probes' centres at 1.3, 2.4, 3.5 m → 120·0.4 + 120 + 450·7.2 = 3408 kg·m.
    const r = launchStackAnalyse(parse({ probeCentreOfMassM: 0.3 }));
    expect(r.centreOfMassM).toBeCloseTo(3408 / 1530, 12);
    expect(LaunchStackInputSchema.safeParse({ ...base, probeCentreOfMassM: 1.2 }).success).toBe(false);
  });

  it('says how much longer the cylinder must be, and how many probes fit, when the stack is too tall', () => {
    const r = launchStackAnalyse(parse({ fairing: { diameterM: 3, cylinderHeightM: 3.5, coneHeightM: 2.5 } }));
    // Cone envelope by similar triangles: at 4.1 m, 0.6 m into a 2.5 m cone of radius 1.5 m → 1.5·(1 − 0.6/2.5) = 1.14 m.
    expect(fairingRadiusAtM({ diameterM: 3, cylinderHeightM: 3.5, coneHeightM: 2.5, clearanceM: 0 }, 4.1)).toBeCloseTo(
      1.14,
      12,
    );
    expect(r.fits).toBe(false);
    expect(r.parts.at(-1)!.fits).toBe(false);
    expect(r.parts.at(-1)!.marginM).toBeCloseTo(1.14 - PROBE_RADIUS, 12);
    // The top probe's corner may reach 2.5·(1.5 − r)/1.5 m into the cone: cylinder ≥ 4.1 − that.
    const need = 4.1 - (2.5 * (1.5 - PROBE_RADIUS)) / 1.5;
    expect(r.cylinderHeightNeededM).toBeCloseTo(need, 12);
    expect(r.maxProbesThatFit).toBe(2);
    expect(r.advice.join(' ')).toMatch(/too tall.*0\.41 m longer/);
    expect(r.advice.join(' ')).toMatch(/2 probes would fit/);
    expect(r.advice.join(' ')).toMatch(/adapter 0\.41 m shorter/);
    // With the cylinder the advice asks for, it fits with nothing to spare.
    const fixed = launchStackAnalyse(
      parse({ fairing: { diameterM: 3, cylinderHeightM: need + 1e-9, coneHeightM: 2.5 } }),
    );
    expect(fixed.fits).toBe(true);
    expect(fixed.minMarginM).toBeCloseTo(0, 8);
  });

  it('says how wide the fairing must be when a probe is too wide, clearance included', () => {
    const r = launchStackAnalyse(
      parse({ fairing: { diameterM: 2.8, cylinderHeightM: 6, coneHeightM: 2, clearanceM: 0.05 } }),
    );
    expect(r.fits).toBe(false);
    expect(r.diameterNeededM).toBeCloseTo(2 * (PROBE_RADIUS + 0.05), 12);
    expect(r.cylinderHeightNeededM).toBeNull();
    expect(r.maxProbesThatFit).toBe(0);
    expect(r.advice[0]).toMatch(/Probe 1 is too wide: it needs a fairing at least 2\.87 m across/);
  });

  it('takes any body of the engine: a 3U small satellite, a cylinder', () => {
    const cube = launchStackAnalyse(
      parse({ body: { kind: 'box', smallsat: '3U' }, stack: { ...base.stack, count: 4 }, probeMassKg: 4 }),
    );
    // 3U: 0.34 m tall (body-shape's table); 0.8 + 4·(0.2 + 0.34) = 2.96 m.
    expect(cube.heightM).toBeCloseTo(2.96, 12);
    const drum = launchStackAnalyse(parse({ body: { kind: 'cylinder', diameterM: 2, heightM: 1, facets: 32 } }));
    expect(drum.maxRadiusM).toBeCloseTo(1, 12);
  });

  it('answers facets: 1e308 with the facet bound, never walking the facets (the fuzz suite found it hanging)', () => {
    const r = LaunchStackInputSchema.safeParse({
      ...base,
      body: { kind: 'cylinder', diameterM: 1, heightM: 1, facets: 1e308 },
      probeCentreOfMassM: 0.5,
    });
    expect(r.error?.issues.map((i) => i.message)).toEqual(['a cylinder has at most 256 facets']);
  });

  it('refuses bad numbers and keeps the saved result in the shared shape', () => {
    expect(LaunchStackInputSchema.safeParse({ ...base, probeMassKg: -1 }).success).toBe(false);
    expect(LaunchStackInputSchema.safeParse({ ...base, stack: { ...base.stack, count: 0 } }).success).toBe(false);
    expect(() => launchStackAnalyse(parse({ probeMassKg: 0, ringMassKg: 0, adapterMassKg: 0 }))).toThrow(
      /mass above 0/,
    );
    const input = parse();
    const saved = launchStackSavedResult(input, launchStackAnalyse(input));
    expect(SavedResultSchema.safeParse(saved).success).toBe(true);
    expect(saved.plot.series[1]!.points).toEqual([
      [0, 1.6],
      [4.2, 1.6],
      [7.2, 0],
    ]);
  });
});
