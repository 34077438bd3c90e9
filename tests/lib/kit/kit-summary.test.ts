import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { ModelContentSchema, ModelSchema } from '../../../src/lib/geometry/model-schema';
import { kitSummary, kitSummaryBody } from '../../../src/lib/kit/kit-summary';
import { VENUES, venueCustom } from '../../../src/lib/layout/venues';

const demo = (id: string) =>
  ModelContentSchema.parse(JSON.parse(readFileSync(`content/models/${id}.json`, 'utf8'))).model;

describe('kitSummary', () => {
  it('reads the Skein probe at 1:20 on Letter: its body and booms divided by 20', () => {
    const s = kitSummary({
      model: demo('skein-probe'),
      scaleDenominator: 20,
      sheetLabel: 'US Letter',
      venue: VENUES.classroom,
      units: 'metric',
    });
    // content/models/skein-probe.json: 2.4 m across the flats, 0.9 m tall, 35 m wire booms — 2400 mm / 20,
    // 900 mm / 20 and 35 m / 20.
    expect(s.clauses[0]).toBe('body 12 cm across the flats, 4.5 cm tall on US Letter at 1:20');
    expect(s.clauses[1]).toMatch(/^each wire boom 1\.75 m long \(cut 1\.85 m of thread\)$/);
    expect(s.text).toContain('fits the classroom (9 × 7 m)');
    expect(s.spanFitsVenue).toBe(true);
  });

  it('says the span is too big when the footprint exceeds the venue inside its 5 % border', () => {
    // At 1:5 a 35 m boom alone is 7 m: with the hub the span is over 14 m, past a 9 × 7 m room.
    const s = kitSummary({
      model: demo('skein-probe'),
      scaleDenominator: 5,
      sheetLabel: 'A4',
      venue: VENUES.classroom,
      units: 'metric',
    });
    expect(s.spanFitsVenue).toBe(false);
    expect(s.spanMm[0]).toBeGreaterThan(14_000);
    expect(s.text).toMatch(/too big for the classroom/);
  });

  it('decides the fit at the border exactly: a span equal to 90 % of a custom floor fits, 1 % more does not', () => {
    const model = ModelSchema.parse({
      schemaVersion: 1,
      name: 'Slab',
      body: { kind: 'box', widthM: 9, depthM: 9, heightM: 1 },
    });
    const fits = kitSummary({
      model,
      scaleDenominator: 1,
      sheetLabel: 'Panel',
      venue: venueCustom({ lengthM: 10, widthM: 10 }),
      units: 'metric',
    });
    expect(fits.spanFitsVenue).toBe(true);
    const tight = kitSummary({
      model,
      scaleDenominator: 1,
      sheetLabel: 'Panel',
      venue: venueCustom({ lengthM: 9.9, widthM: 9.9 }),
      units: 'metric',
    });
    expect(tight.spanFitsVenue).toBe(false);
  });

  it('gives no thread clause for a model without wire booms', () => {
    const s = kitSummary({
      model: demo('thermal-puck'),
      scaleDenominator: 1,
      sheetLabel: 'A4',
      venue: VENUES.classroom,
      units: 'metric',
    });
    expect(s.clauses).toHaveLength(2);
    expect(s.text).not.toMatch(/thread/);
  });

  it('writes US customary lengths with the exact inch', () => {
    // 2400 mm / 20 = 120 mm = 4.72 in (1 in = 25.4 mm exactly, NIST SP 811 appendix B).
    const s = kitSummary({
      model: demo('skein-probe'),
      scaleDenominator: 20,
      sheetLabel: 'US Letter',
      venue: VENUES.classroom,
      units: 'us',
    });
    expect(s.clauses[0]).toMatch(/^body 4\.72 in across the flats/);
    // 1750 mm = 5.74 ft (1 ft = 304.8 mm exactly).
    expect(s.clauses[1]).toMatch(/5\.7 ft long/);
  });
});

describe('kitSummaryBody', () => {
  it('gives a 3U small satellite at 1:2 as 5 cm × 5 cm × 17 cm', () => {
    // from memory: the CubeSat design specification's 3U is 100 × 100 × 340.5 mm, which body-shape.ts rounds to
    // 10 × 10 × 34 cm; halved.
    const model = ModelSchema.parse({ schemaVersion: 1, name: 'Wren', body: { kind: 'box', smallsat: '3U' } });
    expect(kitSummaryBody(model, 2, 'metric')).toBe('5 cm × 5 cm × 17 cm');
  });
});
