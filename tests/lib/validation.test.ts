import { describe, expect, test } from 'vitest';
import { z } from 'zod';
import { refineValid } from '../../src/lib/validation';

const Counted = z.object({ count: z.number().int().max(10) });

describe('refineValid', () => {
  test('zod 3 runs a plain superRefine after a bound failed (why refineValid exists)', () => {
    const seen: number[] = [];
    const plain = Counted.superRefine((v) => void seen.push(v.count));
    expect(plain.safeParse({ count: 1e308 }).success).toBe(false);
    expect(seen).toEqual([1e308]);
  });

  test('never calls the check when a bound failed, and calls it once the input is bounded', () => {
    const seen: number[] = [];
    const schema = refineValid(Counted, (v, ctx) => {
      seen.push(v.count);
      if (v.count === 3) ctx.addIssue({ code: 'custom', message: 'three is refused' });
    });
    const tooMany = schema.safeParse({ count: 1e308 });
    expect(tooMany.success).toBe(false);
    expect(seen).toEqual([]);
    expect(schema.safeParse({ count: 2 })).toEqual({ success: true, data: { count: 2 } });
    const three = schema.safeParse({ count: 3 });
    expect(three.success ? [] : three.error.issues.map((i) => i.message)).toEqual(['three is refused']);
    expect(seen).toEqual([2, 3]);
  });
});
