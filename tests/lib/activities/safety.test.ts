import { describe, expect, test } from 'vitest';
import {
  HAZARDS,
  HAZARD_CAUTIONS,
  HazardSchema,
  SAFETY_GENERAL_NOTE,
  TRAINED_STAFF_HAZARDS,
  hazardsInText,
} from '../../../src/lib/activities/safety';

describe('HAZARD_CAUTIONS', () => {
  test('gives every hazard a label and a caution of at least one full sentence', () => {
    expect(Object.keys(HAZARD_CAUTIONS).sort()).toEqual([...HAZARDS].sort());
    for (const h of HAZARDS) {
      expect(HAZARD_CAUTIONS[h].label.length).toBeGreaterThan(3);
      expect(HAZARD_CAUTIONS[h].caution).toMatch(/^[A-Z].{40,}\.$/s);
    }
  });

  test('keeps dry ice and cryogens to trained staff', () => {
    expect([...TRAINED_STAFF_HAZARDS].sort()).toEqual(['cryogen', 'dry-ice']);
    for (const h of TRAINED_STAFF_HAZARDS) expect(HAZARD_CAUTIONS[h].caution).toMatch(/trained staff/i);
  });

  test('prints the published temperatures', () => {
    // Moritz & Henriques 1947 (burn-prevention tables): 60 °C water burns adult skin within seconds.
    expect(HAZARD_CAUTIONS['hot-water'].caution).toContain('60 °C');
    expect(HAZARD_CAUTIONS['hot-water'].caution).toMatch(/child/);
    // CRC Handbook: CO₂ sublimes at −78.5 °C (1 atm); N₂ boils at −196 °C (77 K).
    expect(HAZARD_CAUTIONS['dry-ice'].caution).toContain('−78.5 °C');
    expect(HAZARD_CAUTIONS['dry-ice'].caution).toMatch(/sealed/);
    expect(HAZARD_CAUTIONS['dry-ice'].caution).toMatch(/ventilat/);
    expect(HAZARD_CAUTIONS['dry-ice'].caution).toMatch(/gloves or tongs/);
    expect(HAZARD_CAUTIONS.cryogen.caution).toContain('−196 °C');
  });

  test('warns about pacemakers and pinching for strong magnets', () => {
    expect(HAZARD_CAUTIONS['strong-magnet'].caution).toMatch(/pacemaker/);
    expect(HAZARD_CAUTIONS['strong-magnet'].caution).toMatch(/implanted/);
    expect(HAZARD_CAUTIONS['strong-magnet'].caution).toMatch(/pinch/);
  });

  test('puts safety glasses on for springs and elastic, and mains devices in the teacher’s hands', () => {
    // common practice, no source: eye protection around stored elastic energy; mains devices teacher-operated.
    expect(HAZARD_CAUTIONS['spring-elastic'].caution).toMatch(/safety glasses/);
    expect(HAZARD_CAUTIONS['spring-elastic'].caution).toMatch(/eye level/);
    expect(HAZARD_CAUTIONS['mains-power'].caution).toMatch(/Only the teacher/);
    expect(HAZARD_CAUTIONS['mains-power'].caution).toMatch(/Never open a device's case/);
  });

  test('sends readers to their school rules and local codes', () => {
    expect(SAFETY_GENERAL_NOTE).toMatch(/school's safety rules and local codes/);
  });
});

describe('HazardSchema', () => {
  test('rejects a hazard outside the fixed set', () => {
    expect(HazardSchema.safeParse('chainsaw').success).toBe(false);
    for (const h of HAZARDS) expect(HazardSchema.parse(h)).toBe(h);
  });
});

describe('hazardsInText', () => {
  test.each([
    ['Ceramic disc magnet', ['strong-magnet']],
    ['Magnetic compass', []],
    ['Picnic cooler with frozen ice packs', ['ice']],
    ['Dry ice in a foam chest', ['dry-ice']],
    ['Dewar of liquid nitrogen', ['cryogen']],
    ['Desk lamp with a halogen bulb', ['lamp']],
    ['Craft knife and cutting mat', ['craft-knife']],
    ['Step stool', ['ladder']],
    ['Cordless drill', ['power-tools']],
    ['Price list', []],
    ['Small spring or elastic cord to drive the boom', ['spring-elastic']],
    ['Rubber bands', []],
    ['Phone charger that plugs into a wall socket', ['mains-power']],
    ['Small USB or battery desk fan with a finger guard', []],
  ])('finds the hazards in "%s"', (text, expected) => {
    expect(hazardsInText(text)).toEqual(expected);
  });
});
