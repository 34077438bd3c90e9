import { describe, expect, it } from 'vitest';
import skein from '../../../content/models/skein-probe.json';
import { ModelContentSchema } from '../../../src/lib/geometry/model-schema';
import { VENUES } from '../../../src/lib/layout/venues';
import { scaleExplain } from '../../../src/lib/tools/scale-explain';
import { scaleQueryParse } from '../../../src/lib/tools/scale-query';

describe('scaleQueryParse', () => {
  it('gives the worked example for an empty query', () => {
    expect(scaleQueryParse(new URLSearchParams()).query).toMatchObject({
      model: 'skein-probe',
      sheet: 'letter',
      gsm: 160,
      venue: 'classroom',
      units: 'metric',
    });
  });

  it('names the field of a paper weight that is not a number', () => {
    const r = scaleQueryParse(new URLSearchParams('gsm=heavy'));
    expect(r.query).toBeNull();
    expect(Object.keys(r.fields)).toEqual(['gsm']);
  });

  it('asks for both sizes of a custom venue', () => {
    const r = scaleQueryParse(new URLSearchParams('venue=custom&lengthM=20'));
    expect(r.fields).toEqual({ widthM: ['give the width in metres'] });
  });
});

describe('scaleExplain', () => {
  const model = ModelContentSchema.parse(skein).model;
  const e = scaleExplain(model, { sheetId: 'letter', paperGsm: 160 }, VENUES['gym-fiba'], 'metric');

  it('measures the hexagonal body corner to corner on paper', () => {
    // A regular hexagon 2.4 m across the flats is 2.4/cos 30° = 2.771 m across the corners (plane geometry).
    expect(e.bodyOnPaperMm.acrossMm * e.paperDenominator).toBeCloseTo(2400 / Math.cos(Math.PI / 6), 6);
    expect(e.bodyOnPaperMm.heightMm * e.paperDenominator).toBeCloseTo(900, 6);
  });

  it('gives each 35 m wire boom its length at the layout scale', () => {
    expect(e.threads).toHaveLength(4);
    for (const t of e.threads) expect(t.deployedLengthMm).toBeCloseTo(35_000 / e.threadsDenominator, 9);
  });

  it('lays the span out at the same scale as the threads, inside the venue', () => {
    expect(e.spanInVenueMm[0]).toBeCloseTo(e.spanFullMm[0] / e.threadsDenominator, 9);
    expect(e.spanInVenueMm[0]).toBeLessThanOrEqual(VENUES['gym-fiba'].lengthMm);
  });
});
