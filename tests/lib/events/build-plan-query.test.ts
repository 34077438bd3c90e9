import { describe, expect, it } from 'vitest';
import { BuildPlanQuerySchema } from '../../../src/lib/events/build-plan-query';

describe('big-build plan query', () => {
  it("reads the form's empty venue as the event's own venue, and a preset by its id", () => {
    expect(BuildPlanQuerySchema.parse({ venue: '', paper: 'a4' })).toEqual({ paper: 'a4' });
    expect(BuildPlanQuerySchema.parse({ venue: 'football-field' })).toEqual({
      venue: 'football-field',
      paper: 'letter',
    });
  });

  it('names the presets when the venue is unknown, and wants both sides of a typed size', () => {
    const unknown = BuildPlanQuerySchema.safeParse({ venue: 'moon' });
    expect(unknown.error?.issues[0]?.message).toMatch(/venue must be one of .*football-field/);
    const half = BuildPlanQuerySchema.safeParse({ lengthM: '40' });
    expect(half.error?.issues[0]?.message).toBe('give both lengthM and widthM, or neither');
  });
});
