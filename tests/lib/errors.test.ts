import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { InputError } from '../../src/lib/errors';
import { parseInput } from '../../src/lib/validation';

describe('parseInput', () => {
  it('returns the parsed value for valid input', () => {
    expect(parseInput(z.object({ n: z.number() }), { n: 3 })).toEqual({ n: 3 });
  });

  it('throws one InputError listing every problem by path', () => {
    const schema = z.object({ n: z.number(), name: z.string() }).strict();
    try {
      parseInput(schema, { n: 'x', extra: 1 });
      expect.unreachable();
    } catch (err) {
      expect(err).toBeInstanceOf(InputError);
      const fields = (err as InputError).fields ?? {};
      expect(Object.keys(fields).sort()).toEqual(['', 'n', 'name']);
    }
  });
});
